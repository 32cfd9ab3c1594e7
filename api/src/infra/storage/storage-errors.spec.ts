import { S3ServiceException } from '@aws-sdk/client-s3';
import { isStorageUnavailable, multipartRefusal } from './storage-errors';

function s3Error(name: string, status: number | undefined, fields: Record<string, string> = {}): S3ServiceException {
  const error = new S3ServiceException({ name, $fault: 'client', $metadata: { httpStatusCode: status } });
  return Object.assign(error, fields);
}

function nodeError(code: string): NodeJS.ErrnoException {
  return Object.assign(new Error(`connect ${code} 127.0.0.1:4569`), { code });
}

describe('isStorageUnavailable', () => {
  it('is true for a connection that could not be made or was cut (Node error codes)', () => {
    for (const code of ['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENOTFOUND']) {
      expect(isStorageUnavailable(nodeError(code))).toBe(true);
    }
    // Node 20 connecting to every address of "localhost" (::1 and 127.0.0.1).
    expect(isStorageUnavailable(new AggregateError([nodeError('ECONNREFUSED'), nodeError('ECONNREFUSED')], ''))).toBe(true);
    // The SDK's retry layer keeps only the text of an error from another realm (Node core seen from a VM context).
    expect(isStorageUnavailable(new Error('AWS SDK error wrapper for Error: connect ECONNREFUSED 127.0.0.1:4569'))).toBe(true);
    expect(isStorageUnavailable(new Error('AWS SDK error wrapper for Error: something else'))).toBe(false);
  });

  it('is true for a timeout and for storage server errors (S3: 500 InternalError, 503 SlowDown are "retry later")', () => {
    expect(isStorageUnavailable(Object.assign(new Error('timed out'), { name: 'TimeoutError' }))).toBe(true);
    expect(isStorageUnavailable(s3Error('SlowDown', 503))).toBe(true);
    expect(isStorageUnavailable(s3Error('InternalError', 500))).toBe(true);
  });

  it('is false when storage answered "no" (4xx) and for errors of our own', () => {
    expect(isStorageUnavailable(s3Error('NoSuchKey', 404))).toBe(false);
    expect(isStorageUnavailable(s3Error('InvalidPart', 400))).toBe(false);
    expect(isStorageUnavailable(s3Error('AccessDenied', 403))).toBe(false);
    expect(isStorageUnavailable(new TypeError('undefined is not a function'))).toBe(false);
    expect(isStorageUnavailable(nodeError('ENOENT'))).toBe(false);
    expect(isStorageUnavailable('ECONNREFUSED')).toBe(false);
  });
});

describe('multipartRefusal', () => {
  it("reads S3's InvalidPart error body: code and PartNumber (AWS S3 API reference, CompleteMultipartUpload errors)", () => {
    const refusal = multipartRefusal(s3Error('InvalidPart', 400, { PartNumber: '2', ETag: 'abc' }));
    expect(refusal).toMatchObject({ refusal: 'InvalidPart', partNumber: 2 });
  });

  it('keeps the refusal without a part number when storage names none, and knows NoSuchUpload', () => {
    expect(multipartRefusal(s3Error('InvalidPart', 400))).toMatchObject({ refusal: 'InvalidPart', partNumber: undefined });
    expect(multipartRefusal(s3Error('InvalidPart', 400, { PartNumber: 'x' }))?.partNumber).toBeUndefined();
    expect(multipartRefusal(s3Error('NoSuchUpload', 404))).toMatchObject({ refusal: 'NoSuchUpload' });
  });

  it('is null for any other error', () => {
    expect(multipartRefusal(s3Error('EntityTooSmall', 400))).toBeNull();
    expect(multipartRefusal(nodeError('ECONNREFUSED'))).toBeNull();
  });
});

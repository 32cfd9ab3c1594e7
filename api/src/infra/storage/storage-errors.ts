import { ServiceUnavailableException } from '@nestjs/common';
import { S3ServiceException } from '@aws-sdk/client-s3';

/**
 * Storage did not answer (refused, reset, timed out) or answered with a server error. It is an
 * HTTP 503 so every route that needs storage says so plainly, and callers can wait and try again.
 */
export class StorageUnavailableError extends ServiceUnavailableException {
  constructor(readonly detail: string) {
    super({
      message: 'Storage is not answering right now. Nothing was lost; try again in a moment.',
      code: 'storage_unavailable',
    });
  }
}

/** Why storage refused to assemble a multipart upload, in S3's own error codes. */
export type MultipartRefusal = 'InvalidPart' | 'InvalidPartOrder' | 'NoSuchUpload';

/** Storage refused to assemble the listed parts; `partNumber` when storage named the part. */
export class MultipartRefusedError extends Error {
  constructor(
    readonly refusal: MultipartRefusal,
    readonly partNumber: number | undefined,
    message: string,
  ) {
    super(message);
    this.name = 'MultipartRefusedError';
  }
}

/** Node's codes for a connection that could not be made or was cut. */
const NETWORK_ERROR_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ECONNABORTED',
  'EPIPE',
  'ETIMEDOUT',
  'EHOSTUNREACH',
  'ENETUNREACH',
  'ENOTFOUND',
  'EAI_AGAIN',
  'UND_ERR_SOCKET',
]);

/** The SDK's names for a request that ran out of time. */
const TIMEOUT_ERROR_NAMES = new Set(['TimeoutError', 'RequestTimeout', 'RequestTimeoutException']);

/** The text of a network error code inside a message ("connect ECONNREFUSED 127.0.0.1:4569"). */
const NETWORK_CODE_IN_TEXT = new RegExp(`\\b(?:${[...NETWORK_ERROR_CODES].join('|')})\\b`, 'u');

/** True when the error means "storage is not there or not well", as opposed to "storage said no". */
export function isStorageUnavailable(error: unknown): boolean {
  if (error instanceof S3ServiceException) {
    const status = error.$metadata.httpStatusCode;
    // No status at all: the SDK got no HTTP answer to read.
    return status === undefined || status >= 500;
  }
  // Duck-typed: an error made in another realm (Node core's, seen from a VM context) is no `instanceof Error` here.
  if (typeof error !== 'object' || error === null) return false;
  const { name, code, message, errors } = error as { name?: unknown; code?: unknown; message?: unknown; errors?: unknown };
  if (typeof name === 'string' && TIMEOUT_ERROR_NAMES.has(name)) return true;
  if (typeof code === 'string' && NETWORK_ERROR_CODES.has(code)) return true;
  // Node 20 tries every address of a host name and reports an AggregateError of the refusals.
  if (Array.isArray(errors) && errors.some((inner) => isStorageUnavailable(inner))) return true;
  // The SDK's retry layer wraps an error it does not recognise as one and keeps only its text.
  return typeof message === 'string' && message.startsWith('AWS SDK error wrapper for ') && NETWORK_CODE_IN_TEXT.test(message);
}

const REFUSALS: readonly MultipartRefusal[] = ['InvalidPart', 'InvalidPartOrder', 'NoSuchUpload'];

/** Reads S3's refusal to assemble parts (the error body names the part, as S3 and the local fake do). */
export function multipartRefusal(error: unknown): MultipartRefusedError | null {
  if (!(error instanceof S3ServiceException)) return null;
  const refusal = REFUSALS.find((name) => name === error.name);
  if (!refusal) return null;
  // The SDK copies unmodelled fields of the XML error body onto the exception.
  const named = Number((error as S3ServiceException & { PartNumber?: unknown }).PartNumber);
  const partNumber = Number.isInteger(named) && named > 0 ? named : undefined;
  return new MultipartRefusedError(refusal, partNumber, error.message);
}

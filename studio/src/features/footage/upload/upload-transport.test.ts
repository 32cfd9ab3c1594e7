import { afterEach, describe, expect, it, vi } from 'vitest';
import { stubApi } from '@/testing/api-stub';
import { FatalUploadError, PartsRejectedError, StorageUnavailableError } from './multipart-upload';
import { storageAvailable, uploadTransport } from './upload-transport';

const COMPLETE = /^\/workshops\/w1\/footage\/f1\/upload\/complete$/;
const HEALTH = /^\/health$/;
const storageDown = { status: 'down', checks: { database: 'up', storage: 'down', mail: 'up', queue: 'up' } };
const allUp = { status: 'ok', checks: { database: 'up', storage: 'up', mail: 'up', queue: 'up' } };

afterEach(() => {
  vi.restoreAllMocks();
});

describe('uploadTransport: what the API answers means for the upload', () => {
  it('503 from the API is storage down (wait), 422 with invalidParts names the parts to send again, 409 is final', async () => {
    const transport = uploadTransport('w1', 'f1');
    stubApi([{ method: 'POST', path: COMPLETE, status: 503, body: { statusCode: 503, code: 'storage_unavailable', message: 'Storage is not answering right now.' } }]);
    await expect(transport.complete()).rejects.toBeInstanceOf(StorageUnavailableError);

    vi.restoreAllMocks();
    stubApi([{ method: 'POST', path: COMPLETE, status: 422, body: { statusCode: 422, code: 'part_invalid', invalidParts: [2], message: 'Storage does not hold part 2' } }]);
    const rejected = await transport.complete().catch((error: unknown) => error);
    expect(rejected).toBeInstanceOf(PartsRejectedError);
    expect((rejected as PartsRejectedError).partNumbers).toEqual([2]);

    vi.restoreAllMocks();
    stubApi([{ method: 'POST', path: COMPLETE, status: 409, body: { statusCode: 409, message: 'The upload of this footage is finished' } }]);
    await expect(transport.complete()).rejects.toBeInstanceOf(FatalUploadError);
  });

  it("reads storage's state from the health check, whose 503 still carries the report", async () => {
    stubApi([{ path: HEALTH, status: 503, body: storageDown }]);
    expect(await storageAvailable()).toBe(false);
    vi.restoreAllMocks();
    stubApi([{ path: HEALTH, body: allUp }]);
    expect(await storageAvailable()).toBe(true);
  });

  it('a part PUT that reaches nobody while health says storage is down becomes "waiting for storage"', async () => {
    const transport = uploadTransport('w1', 'f1');
    stubApi([{ path: HEALTH, status: 503, body: storageDown }]);
    // Port 9 (discard) has no listener here: the browser's request fails without an HTTP answer.
    const failure = await transport
      .putPart('http://127.0.0.1:9/bucket/key?partNumber=1', new Blob(['x']), () => undefined, new AbortController().signal)
      .catch((error: unknown) => error);
    expect(failure).toBeInstanceOf(StorageUnavailableError);
  });
});

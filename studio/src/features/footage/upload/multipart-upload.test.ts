import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { FatalUploadError, MultipartUpload, PartsRejectedError, StorageUnavailableError, type UploadTransport } from './multipart-upload';

const PART = 8;

/** A file of `size` bytes whose byte i is i % 251, so parts can be told apart. */
function file(size: number): File {
  return new File([Uint8Array.from({ length: size }, (_, index) => index % 251)], 'coupler.mp4', { type: 'video/mp4' });
}

interface FakeStorage extends UploadTransport {
  stored: Map<number, number>;
  recorded: Map<number, string>;
  puts: number[];
  completed: number;
  aborted: number;
  /** Parts whose next PUT fails (number of failures left). */
  failures: Map<number, number>;
  /** Parts whose PUT waits until released. */
  hold: Set<number>;
  release: () => void;
  /** Storage stopped: part PUTs and completion answer as the real transport does then. */
  down: boolean;
  /** How often the upload asked whether storage is back. */
  storageChecks: number;
  /** Every recordPart call, in order (to prove no part is recorded twice). */
  recordCalls: number[];
}

function fakeStorage(): FakeStorage {
  const waiting: (() => void)[] = [];
  const storage: FakeStorage = {
    stored: new Map(),
    recorded: new Map(),
    puts: [],
    completed: 0,
    aborted: 0,
    failures: new Map(),
    hold: new Set(),
    release: () => waiting.splice(0).forEach((resume) => resume()),
    down: false,
    storageChecks: 0,
    recordCalls: [],
    signParts: async (partNumbers) => ({
      urls: partNumbers.map((partNumber) => ({ partNumber, url: `https://storage.test/part/${partNumber}` })),
      expiresAt: new Date(Date.now() + 15 * 60_000).toISOString(),
    }),
    putPart: async (url, body, onProgress, signal) => {
      const partNumber = Number(url.split('/').pop());
      storage.puts.push(partNumber);
      onProgress(body.size / 2);
      if (storage.hold.has(partNumber)) await new Promise<void>((resume) => waiting.push(resume));
      if (signal.aborted) throw new DOMException('aborted', 'AbortError');
      if (storage.down) throw new StorageUnavailableError('the connection to storage failed');
      const left = storage.failures.get(partNumber) ?? 0;
      if (left > 0) {
        storage.failures.set(partNumber, left - 1);
        throw new Error('the connection to storage failed');
      }
      onProgress(body.size);
      storage.stored.set(partNumber, body.size);
      return `"etag-${partNumber}"`;
    },
    recordPart: async (partNumber, etag) => {
      storage.recordCalls.push(partNumber);
      storage.recorded.set(partNumber, etag);
    },
    complete: async () => {
      if (storage.down) throw new StorageUnavailableError('Storage is not answering right now.');
      storage.completed += 1;
    },
    abort: async () => {
      storage.aborted += 1;
    },
    storageAvailable: async () => {
      storage.storageChecks += 1;
      return !storage.down;
    },
  };
  return storage;
}

const settle = () => vi.advanceTimersByTimeAsync(0);

describe('MultipartUpload', () => {
  beforeEach(() => {
    vi.useFakeTimers();
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('sends every part, records each ETag, completes, and reports all bytes', async () => {
    const storage = fakeStorage();
    const upload = new MultipartUpload(file(30), { footageId: 'f1', partSizeBytes: PART, partCount: 4, completedParts: [] }, storage);
    upload.start();
    await settle();
    expect([...storage.recorded.keys()].sort()).toEqual([1, 2, 3, 4]);
    expect(storage.stored.get(4)).toBe(6);
    expect(storage.completed).toBe(1);
    expect(upload.getSnapshot()).toMatchObject({ phase: 'done', uploadedBytes: 30, totalBytes: 30 });
  });

  it('never has more parts in flight than its concurrency', async () => {
    const storage = fakeStorage();
    for (const part of [1, 2, 3, 4, 5, 6]) storage.hold.add(part);
    const upload = new MultipartUpload(file(48), { footageId: 'f1', partSizeBytes: PART, partCount: 6, completedParts: [] }, storage, {
      concurrency: 3,
    });
    upload.start();
    await settle();
    expect(storage.puts).toEqual([1, 2, 3]);
    // Half of each part in flight counts as sent.
    expect(upload.getSnapshot().uploadedBytes).toBe(12);
    storage.hold.clear();
    storage.release();
    await settle();
    expect(upload.getSnapshot().phase).toBe('done');
  });

  it('signs each part once, one request at a time, and asks for the next batch before the parts in flight run out', async () => {
    const storage = fakeStorage();
    const events: string[] = [];
    const calls: number[][] = [];
    let signing = 0;
    let overlapped = false;
    const sign = storage.signParts;
    storage.signParts = async (partNumbers) => {
      events.push(`sign ${partNumbers[0]}`);
      calls.push(partNumbers);
      signing += 1;
      if (signing > 1) overlapped = true;
      const answer = await sign(partNumbers);
      signing -= 1;
      return answer;
    };
    const put = storage.putPart;
    storage.putPart = async (url, body, onProgress, signal) => {
      events.push(`put ${url.split('/').pop()}`);
      return put(url, body, onProgress, signal);
    };
    const upload = new MultipartUpload(file(40 * PART), { footageId: 'f1', partSizeBytes: PART, partCount: 40, completedParts: [] }, storage);
    upload.start();
    await settle();
    expect(upload.getSnapshot().phase).toBe('done');
    // Every part signed exactly once (four slots starting together used to send four overlapping batches).
    expect(calls.flat().sort((a, b) => a - b)).toEqual(Array.from({ length: 40 }, (_, index) => index + 1));
    expect(overlapped).toBe(false);
    // The batch from part 17 on was asked for while the first batch's last parts were still to be sent.
    expect(events.indexOf('sign 17')).toBeGreaterThan(-1);
    expect(events.indexOf('sign 17')).toBeLessThan(events.indexOf('put 16'));
  });

  it('resumes from the parts the server already has (after a reload)', async () => {
    const storage = fakeStorage();
    const upload = new MultipartUpload(file(30), { footageId: 'f1', partSizeBytes: PART, partCount: 4, completedParts: [1, 3] }, storage);
    expect(upload.getSnapshot().uploadedBytes).toBe(16);
    upload.start();
    await settle();
    expect(storage.puts.sort()).toEqual([2, 4]);
    expect(storage.completed).toBe(1);
  });

  it('pauses (abandoning parts in flight) and resumes where it stopped', async () => {
    const storage = fakeStorage();
    storage.hold.add(2);
    const upload = new MultipartUpload(file(16), { footageId: 'f1', partSizeBytes: PART, partCount: 2, completedParts: [] }, storage, {
      concurrency: 2,
    });
    upload.start();
    await settle();
    expect(storage.recorded.has(1)).toBe(true);
    upload.pause();
    storage.release();
    await settle();
    expect(upload.getSnapshot().phase).toBe('paused');
    expect(storage.recorded.has(2)).toBe(false);
    expect(storage.completed).toBe(0);
    storage.hold.clear();
    upload.resume();
    await settle();
    expect(storage.puts.filter((part) => part === 2)).toHaveLength(2);
    expect(upload.getSnapshot().phase).toBe('done');
  });

  it('retries a failed part with growing delays, then succeeds', async () => {
    const storage = fakeStorage();
    storage.failures.set(1, 2);
    const upload = new MultipartUpload(file(8), { footageId: 'f1', partSizeBytes: PART, partCount: 1, completedParts: [] }, storage, {
      retryDelayMs: 1000,
    });
    upload.start();
    await settle();
    expect(upload.getSnapshot()).toMatchObject({ phase: 'retrying', retryInSeconds: 1, error: 'A part failed to upload (the connection to storage failed).' });
    await vi.advanceTimersByTimeAsync(1000);
    expect(upload.getSnapshot()).toMatchObject({ phase: 'retrying', retryInSeconds: 2 });
    await vi.advanceTimersByTimeAsync(1999);
    expect(storage.puts).toHaveLength(2);
    await vi.advanceTimersByTimeAsync(1);
    expect(upload.getSnapshot().phase).toBe('done');
    expect(storage.puts).toHaveLength(3);
  });

  it('stops after too many failures in a row and waits for the person', async () => {
    const storage = fakeStorage();
    storage.failures.set(1, 99);
    const upload = new MultipartUpload(file(8), { footageId: 'f1', partSizeBytes: PART, partCount: 1, completedParts: [] }, storage, {
      retryDelayMs: 10,
      maxConsecutiveFailures: 3,
    });
    upload.start();
    await vi.advanceTimersByTimeAsync(1000);
    expect(upload.getSnapshot()).toMatchObject({ phase: 'paused' });
    expect(upload.getSnapshot().error).toMatch(/stopped after 3 failed tries/);
    expect(storage.puts).toHaveLength(3);
  });

  it('waits while the browser is offline and carries on when it is back', async () => {
    const storage = fakeStorage();
    storage.hold.add(1);
    const upload = new MultipartUpload(file(8), { footageId: 'f1', partSizeBytes: PART, partCount: 1, completedParts: [] }, storage);
    upload.start();
    await settle();
    upload.offline();
    expect(upload.getSnapshot()).toMatchObject({ phase: 'retrying', error: 'The connection is lost. The upload continues when it is back.' });
    storage.hold.clear();
    storage.release();
    upload.online();
    await settle();
    expect(upload.getSnapshot().phase).toBe('done');
  });

  it('gives up at once when the footage is gone, and cancels by aborting on the server', async () => {
    const storage = fakeStorage();
    storage.recordPart = async () => {
      throw new FatalUploadError('Footage not found');
    };
    const upload = new MultipartUpload(file(8), { footageId: 'f1', partSizeBytes: PART, partCount: 1, completedParts: [] }, storage);
    upload.start();
    await settle();
    expect(upload.getSnapshot()).toMatchObject({ phase: 'failed', error: 'Footage not found' });

    const other = new MultipartUpload(file(8), { footageId: 'f2', partSizeBytes: PART, partCount: 1, completedParts: [] }, fakeStorage());
    const otherStorage = fakeStorage();
    const cancelled = new MultipartUpload(file(8), { footageId: 'f3', partSizeBytes: PART, partCount: 1, completedParts: [] }, otherStorage);
    cancelled.start();
    await cancelled.cancel();
    expect(cancelled.getSnapshot().phase).toBe('cancelled');
    expect(otherStorage.aborted).toBe(1);
    expect(other.getSnapshot().phase).toBe('paused');
  });

  it('measures speed and time left from the last seconds of progress', async () => {
    const storage = fakeStorage();
    for (const part of [1, 2, 3, 4]) storage.hold.add(part);
    const upload = new MultipartUpload(file(32), { footageId: 'f1', partSizeBytes: PART, partCount: 4, completedParts: [] }, storage, {
      concurrency: 1,
    });
    upload.start();
    await settle();
    expect(upload.getSnapshot().bytesPerSecond).toBeNull();
    await vi.advanceTimersByTimeAsync(2000);
    storage.hold.delete(1);
    storage.release();
    await settle();
    const snapshot = upload.getSnapshot();
    expect(snapshot.uploadedBytes).toBe(12);
    expect(snapshot.bytesPerSecond).toBeGreaterThan(0);
    expect(snapshot.secondsLeft).toBe(Math.ceil((32 - 12) / (snapshot.bytesPerSecond ?? 1)));
  });

  describe('when storage stops answering', () => {
    const CHECK = 5_000;

    it('waits for storage (no try counted), checks now and then, and carries on by itself without losing or doubling parts', async () => {
      const storage = fakeStorage();
      storage.hold.add(2);
      const upload = new MultipartUpload(file(32), { footageId: 'f1', partSizeBytes: PART, partCount: 4, completedParts: [] }, storage, {
        concurrency: 1,
        maxConsecutiveFailures: 2,
        storageCheckMs: CHECK,
      });
      upload.start();
      await settle();
      expect(storage.recordCalls).toEqual([1]);

      storage.down = true;
      storage.release();
      await settle();
      expect(upload.getSnapshot()).toMatchObject({ phase: 'waiting-for-storage', uploadedBytes: 8, retryInSeconds: null });
      expect(upload.getSnapshot().error).toMatch(/Storage is not answering/);

      // Far longer than maxConsecutiveFailures tries would last: still waiting, nothing sent meanwhile.
      const putsWhileDown = storage.puts.length;
      await vi.advanceTimersByTimeAsync(CHECK * 5);
      expect(storage.storageChecks).toBe(5);
      expect(storage.puts).toHaveLength(putsWhileDown);
      expect(upload.getSnapshot().phase).toBe('waiting-for-storage');

      storage.down = false;
      storage.hold.clear();
      await vi.advanceTimersByTimeAsync(CHECK);
      expect(upload.getSnapshot()).toMatchObject({ phase: 'done', uploadedBytes: 32 });
      // Each part recorded once; only the part cut off by the outage was sent twice; one completion.
      expect(storage.recordCalls).toEqual([1, 2, 3, 4]);
      expect(storage.puts).toEqual([1, 2, 2, 3, 4]);
      expect(storage.completed).toBe(1);
    });

    it('a completion refused with 503 waits for storage, then completes once', async () => {
      const storage = fakeStorage();
      storage.down = true;
      const upload = new MultipartUpload(file(8), { footageId: 'f1', partSizeBytes: PART, partCount: 1, completedParts: [1] }, storage, {
        storageCheckMs: CHECK,
      });
      upload.start();
      await settle();
      expect(upload.getSnapshot().phase).toBe('waiting-for-storage');
      expect(storage.completed).toBe(0);
      storage.down = false;
      await vi.advanceTimersByTimeAsync(CHECK);
      expect(upload.getSnapshot().phase).toBe('done');
      expect(storage.completed).toBe(1);
      expect(storage.puts).toEqual([]);
    });

    it('keeps an ETag the API could not take and records it later, without sending the part again', async () => {
      const storage = fakeStorage();
      const record = storage.recordPart;
      let refusals = 1;
      storage.recordPart = async (partNumber, etag) => {
        if (refusals-- > 0) throw new StorageUnavailableError('Storage is not answering right now.');
        await record(partNumber, etag);
      };
      const upload = new MultipartUpload(file(8), { footageId: 'f1', partSizeBytes: PART, partCount: 1, completedParts: [] }, storage, {
        storageCheckMs: CHECK,
      });
      upload.start();
      await settle();
      // Storage holds the bytes: they count as sent while the record waits.
      expect(upload.getSnapshot()).toMatchObject({ phase: 'waiting-for-storage', uploadedBytes: 8 });
      await vi.advanceTimersByTimeAsync(CHECK);
      expect(upload.getSnapshot().phase).toBe('done');
      expect(storage.puts).toEqual([1]);
      expect(storage.recorded.get(1)).toBe('"etag-1"');
    });

    it('stops checking when paused, and resumes by hand', async () => {
      const storage = fakeStorage();
      storage.down = true;
      const upload = new MultipartUpload(file(8), { footageId: 'f1', partSizeBytes: PART, partCount: 1, completedParts: [] }, storage, {
        storageCheckMs: CHECK,
      });
      upload.start();
      await settle();
      upload.pause();
      await vi.advanceTimersByTimeAsync(CHECK * 3);
      expect(storage.storageChecks).toBe(0);
      expect(upload.getSnapshot().phase).toBe('paused');
      storage.down = false;
      upload.resume();
      await settle();
      expect(upload.getSnapshot().phase).toBe('done');
    });
  });

  it('sends again the parts storage does not hold as recorded (422 on completion), then completes', async () => {
    const storage = fakeStorage();
    let refusedOnce = false;
    storage.complete = async () => {
      if (!refusedOnce) {
        refusedOnce = true;
        throw new PartsRejectedError([2], 'Storage does not hold part 2 as recorded');
      }
      storage.completed += 1;
    };
    const upload = new MultipartUpload(file(16), { footageId: 'f1', partSizeBytes: PART, partCount: 2, completedParts: [1, 2] }, storage, {
      retryDelayMs: 100,
    });
    upload.start();
    await settle();
    expect(upload.getSnapshot()).toMatchObject({ phase: 'retrying', uploadedBytes: 8 });
    await vi.advanceTimersByTimeAsync(100);
    expect(storage.puts).toEqual([2]);
    expect(upload.getSnapshot().phase).toBe('done');
    expect(storage.completed).toBe(1);
  });
});

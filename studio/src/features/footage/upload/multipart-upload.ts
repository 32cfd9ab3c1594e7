/**
 * One footage file going from the browser straight to storage in parts: a few parts at a time,
 * each PUT to a presigned URL, each finished part recorded with the API (number + ETag) so a
 * reload or another browser can resume; failed parts retried with backoff; pause, resume, cancel.
 * No React and no fetch here: the transport is handed in, so tests drive it with fakes.
 */

export interface SignedPart {
  partNumber: number;
  url: string;
}

export interface UploadTransport {
  signParts(partNumbers: number[]): Promise<{ urls: SignedPart[]; expiresAt: string }>;
  /** PUTs the bytes; reports bytes sent so far; resolves with the ETag storage answered. */
  putPart(url: string, body: Blob, onProgress: (sentBytes: number) => void, signal: AbortSignal): Promise<string>;
  recordPart(partNumber: number, etag: string): Promise<void>;
  complete(): Promise<void>;
  abort(): Promise<void>;
  /** Whether storage answers again (the API's health check); asked while the upload waits for it. */
  storageAvailable(): Promise<boolean>;
}

export interface UploadPlan {
  footageId: string;
  partSizeBytes: number;
  partCount: number;
  /** Parts storage already has (from the API's upload state). */
  completedParts: number[];
}

export type UploadPhase =
  | 'uploading'
  | 'paused'
  /** The browser is offline, or parts keep failing: waiting before the next try. */
  | 'retrying'
  /** Storage does not answer: checking now and then, and carrying on by itself when it does. */
  | 'waiting-for-storage'
  | 'completing'
  | 'done'
  | 'failed'
  | 'cancelled';

export interface UploadSnapshot {
  footageId: string;
  fileName: string;
  phase: UploadPhase;
  totalBytes: number;
  uploadedBytes: number;
  /** Average over the last few seconds; null until there is enough to tell. */
  bytesPerSecond: number | null;
  secondsLeft: number | null;
  /** When phase is "retrying": seconds until the next try. */
  retryInSeconds: number | null;
  /** When phase is "failed" (or a retry is pending): what went wrong, in words. */
  error: string | null;
}

export interface UploadOptions {
  /** Parts in flight at once (3–4 keeps a home connection busy without starving the page). */
  concurrency?: number;
  /** Failures in a row before the upload stops and waits for the person to press resume. */
  maxConsecutiveFailures?: number;
  /** First retry delay; doubles each failure, up to `maxRetryDelayMs`. */
  retryDelayMs?: number;
  maxRetryDelayMs?: number;
  /** How often to ask whether storage is back while waiting for it. */
  storageCheckMs?: number;
  now?: () => number;
}

/** A failure the upload must not retry (the footage is gone, the upload finished elsewhere). */
export class FatalUploadError extends Error {}

/** Storage is down (the API answered 503, or a part could not reach storage while health says so). */
export class StorageUnavailableError extends Error {}

/** Storage does not hold these parts as recorded (the API forgot them): they are sent again. */
export class PartsRejectedError extends Error {
  constructor(
    readonly partNumbers: number[],
    message: string,
  ) {
    super(message);
  }
}

const WAITING_FOR_STORAGE =
  'Storage is not answering. Finished parts are kept; the upload carries on by itself when storage is back.';

const SPEED_WINDOW_MS = 5_000;
/** Re-sign a part URL when it has less than this left. */
const URL_MARGIN_MS = 60_000;
const SIGN_BATCH = 16;

export class MultipartUpload {
  private phase: UploadPhase = 'paused';
  private readonly done = new Set<number>();
  private readonly inFlight = new Map<number, { loaded: number; controller: AbortController }>();
  /** Parts storage has, whose ETag is being recorded with the API. */
  private readonly recording = new Set<number>();
  /** Parts storage has whose ETag the API has not taken yet: recorded again, never sent again. */
  private readonly unrecorded = new Map<number, string>();
  private readonly signed = new Map<number, { url: string; expiresAt: number }>();
  /** The signing request on its way, if any. */
  private signing: Promise<void> | null = null;
  private readonly listeners = new Set<() => void>();
  private readonly samples: { at: number; bytes: number }[] = [];
  private consecutiveFailures = 0;
  private retryTimer: ReturnType<typeof setTimeout> | undefined;
  private retryAt: number | null = null;
  private error: string | null = null;
  private snapshot: UploadSnapshot;
  private readonly options: Required<UploadOptions>;

  constructor(
    readonly file: Blob & { name: string },
    readonly plan: UploadPlan,
    private readonly transport: UploadTransport,
    options: UploadOptions = {},
  ) {
    this.options = {
      concurrency: options.concurrency ?? 4,
      maxConsecutiveFailures: options.maxConsecutiveFailures ?? 8,
      retryDelayMs: options.retryDelayMs ?? 1_000,
      maxRetryDelayMs: options.maxRetryDelayMs ?? 30_000,
      storageCheckMs: options.storageCheckMs ?? 5_000,
      now: options.now ?? (() => Date.now()),
    };
    for (const partNumber of plan.completedParts) this.done.add(partNumber);
    this.snapshot = this.takeSnapshot();
  }

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  getSnapshot = (): UploadSnapshot => this.snapshot;

  start(): void {
    if (this.phase === 'uploading' || this.isFinished()) return;
    this.phase = 'uploading';
    this.error = null;
    this.consecutiveFailures = 0;
    this.clearRetry();
    this.samples.length = 0;
    this.changed();
    this.pump();
  }

  /** Stops sending; parts in flight are abandoned (they restart on resume), finished parts stay. */
  pause(): void {
    if (this.isFinished() || this.phase === 'completing') return;
    this.phase = 'paused';
    this.clearRetry();
    this.abortInFlight();
    this.changed();
  }

  resume(): void {
    this.start();
  }

  /** Browser went offline: stop now, try again when it is back (see `online`). */
  offline(): void {
    if (this.phase !== 'uploading') return;
    this.abortInFlight();
    this.phase = 'retrying';
    this.error = 'The connection is lost. The upload continues when it is back.';
    this.retryAt = null;
    this.changed();
  }

  online(): void {
    if (this.phase === 'retrying') this.start();
  }

  async cancel(): Promise<void> {
    if (this.phase === 'done' || this.phase === 'cancelled') return;
    this.phase = 'cancelled';
    this.clearRetry();
    this.abortInFlight();
    this.changed();
    await this.transport.abort();
  }

  private isFinished(): boolean {
    return this.phase === 'done' || this.phase === 'cancelled' || this.phase === 'failed';
  }

  private pending(): number[] {
    const parts: number[] = [];
    for (let number = 1; number <= this.plan.partCount; number += 1) {
      if (!this.done.has(number) && !this.inFlight.has(number) && !this.recording.has(number) && !this.unrecorded.has(number)) {
        parts.push(number);
      }
    }
    return parts;
  }

  private pump(): void {
    if (this.phase !== 'uploading') return;
    for (const [partNumber, etag] of [...this.unrecorded]) {
      this.unrecorded.delete(partNumber);
      this.recording.add(partNumber);
      void this.record(partNumber, etag);
    }
    const waiting = this.pending();
    if (waiting.length === 0 && this.inFlight.size === 0 && this.recording.size === 0) {
      void this.finish();
      return;
    }
    const free = this.options.concurrency - this.inFlight.size;
    for (const partNumber of waiting.slice(0, Math.max(0, free))) void this.sendPart(partNumber);
  }

  private async urlFor(partNumber: number): Promise<string> {
    // Someone else's batch may be on its way with this part in it: wait for it rather than sign the same parts twice.
    if (!this.usableUrl(partNumber) && this.signing) await this.signing;
    if (!this.usableUrl(partNumber)) await this.signBatch([partNumber]);
    const url = this.usableUrl(partNumber);
    if (!url) throw new Error(`the server did not sign part ${partNumber}`);
    this.signAhead();
    return url;
  }

  private usableUrl(partNumber: number): string | null {
    const cached = this.signed.get(partNumber);
    return cached && cached.expiresAt - this.options.now() > URL_MARGIN_MS ? cached.url : null;
  }

  /** Signs `first` and the next waiting parts in one request; one request at a time, shared by whoever waits. */
  private signBatch(first: number[]): Promise<void> {
    const batch = [...first, ...this.pending().filter((number) => !first.includes(number) && !this.usableUrl(number))].slice(0, SIGN_BATCH);
    const signing = this.transport.signParts(batch).then(({ urls, expiresAt }) => {
      for (const { partNumber: number, url } of urls) this.signed.set(number, { url, expiresAt: Date.parse(expiresAt) });
    });
    this.signing = signing;
    const clear = () => {
      if (this.signing === signing) this.signing = null;
    };
    signing.then(clear, clear);
    return signing;
  }

  /**
   * Signs the next batch while parts are still being sent, once fewer signed parts wait than there are slots: a
   * part's slot then never waits a round trip to the API for its link (it did at every batch boundary).
   */
  private signAhead(): void {
    if (this.signing || this.phase !== 'uploading') return;
    const waiting = this.pending();
    const ready = waiting.filter((number) => this.usableUrl(number)).length;
    if (ready >= this.options.concurrency || ready === waiting.length) return;
    // A failure here is not reported: the part that needs the link asks again and reports it.
    this.signBatch([]).catch(() => {});
  }

  private partBlob(partNumber: number): Blob {
    const start = (partNumber - 1) * this.plan.partSizeBytes;
    return this.file.slice(start, Math.min(start + this.plan.partSizeBytes, this.file.size));
  }

  private async sendPart(partNumber: number): Promise<void> {
    const controller = new AbortController();
    const slot = { loaded: 0, controller };
    this.inFlight.set(partNumber, slot);
    try {
      const url = await this.urlFor(partNumber);
      if (controller.signal.aborted) return;
      const etag = await this.transport.putPart(
        url,
        this.partBlob(partNumber),
        (sent) => {
          slot.loaded = sent;
          this.changed();
        },
        controller.signal,
      );
      if (controller.signal.aborted) return;
      // Storage has the bytes: the slot goes to the next part while the ETag is recorded alongside.
      this.inFlight.delete(partNumber);
      this.signed.delete(partNumber);
      this.recording.add(partNumber);
      this.pump();
      await this.record(partNumber, etag);
    } catch (error) {
      if (this.inFlight.get(partNumber) === slot) this.inFlight.delete(partNumber);
      if (controller.signal.aborted || this.phase !== 'uploading') return;
      this.fail(error);
    }
  }

  private async record(partNumber: number, etag: string): Promise<void> {
    try {
      await this.transport.recordPart(partNumber, etag);
      this.done.add(partNumber);
      this.consecutiveFailures = 0;
    } catch (error) {
      // Storage has the bytes: keep the ETag and record it later rather than send the part again.
      if (!(error instanceof FatalUploadError)) this.unrecorded.set(partNumber, etag);
      // A pause or cancel meanwhile needs no report.
      if (this.phase === 'uploading') this.fail(error);
      return;
    } finally {
      this.recording.delete(partNumber);
      this.changed();
    }
    this.pump();
  }

  private fail(error: unknown): void {
    if (error instanceof FatalUploadError) {
      this.phase = 'failed';
      this.error = error.message;
      this.abortInFlight();
      this.changed();
      return;
    }
    if (error instanceof StorageUnavailableError) {
      this.waitForStorage();
      return;
    }
    this.consecutiveFailures += 1;
    this.signed.clear();
    if (this.consecutiveFailures >= this.options.maxConsecutiveFailures) {
      this.phase = 'paused';
      this.abortInFlight();
      this.error = `The upload stopped after ${this.consecutiveFailures} failed tries (${messageOf(error)}). Press resume to try again.`;
      this.changed();
      return;
    }
    // Back off: stop sending for a while, then start again with what is left.
    const delay = Math.min(this.options.retryDelayMs * 2 ** (this.consecutiveFailures - 1), this.options.maxRetryDelayMs);
    this.abortInFlight();
    this.phase = 'retrying';
    this.error = `A part failed to upload (${messageOf(error)}).`;
    this.retryAt = this.options.now() + delay;
    this.retryTimer = setTimeout(() => {
      this.retryTimer = undefined;
      if (this.phase !== 'retrying') return;
      this.phase = 'uploading';
      this.retryAt = null;
      this.changed();
      this.pump();
    }, delay);
    this.changed();
  }

  /**
   * Storage is down: stop sending (no try counts as a failure, however long it lasts), ask now and
   * then whether it is back, and carry on by itself when it is. Pause and cancel still work.
   */
  private waitForStorage(): void {
    this.abortInFlight();
    this.signed.clear();
    this.clearRetry();
    this.phase = 'waiting-for-storage';
    this.error = WAITING_FOR_STORAGE;
    const check = () => {
      this.retryTimer = setTimeout(() => {
        this.retryTimer = undefined;
        if (this.phase !== 'waiting-for-storage') return;
        this.transport.storageAvailable().then(
          (available) => {
            if (this.phase !== 'waiting-for-storage') return;
            if (available) this.start();
            else check();
          },
          () => {
            if (this.phase === 'waiting-for-storage') check();
          },
        );
      }, this.options.storageCheckMs);
    };
    check();
    this.changed();
  }

  private async finish(): Promise<void> {
    if (this.phase !== 'uploading') return;
    this.phase = 'completing';
    this.changed();
    try {
      await this.transport.complete();
      this.phase = 'done';
    } catch (error) {
      if (error instanceof StorageUnavailableError) {
        this.waitForStorage();
        return;
      }
      if (error instanceof PartsRejectedError && error.partNumbers.length > 0) {
        // The API forgot parts storage does not hold as recorded: send exactly those again.
        for (const partNumber of error.partNumbers) this.done.delete(partNumber);
        this.phase = 'uploading';
        this.fail(error);
        return;
      }
      this.phase = error instanceof FatalUploadError ? 'failed' : 'paused';
      this.error = `Finishing the upload failed (${messageOf(error)}).${this.phase === 'paused' ? ' Press resume to try again.' : ''}`;
    }
    this.changed();
  }

  private abortInFlight(): void {
    for (const { controller } of this.inFlight.values()) controller.abort();
    this.inFlight.clear();
  }

  private clearRetry(): void {
    if (this.retryTimer !== undefined) clearTimeout(this.retryTimer);
    this.retryTimer = undefined;
    this.retryAt = null;
  }

  private uploadedBytes(): number {
    let bytes = 0;
    for (const partNumber of this.done) {
      const start = (partNumber - 1) * this.plan.partSizeBytes;
      bytes += Math.min(this.plan.partSizeBytes, this.file.size - start);
    }
    for (const partNumber of [...this.recording, ...this.unrecorded.keys()]) {
      const start = (partNumber - 1) * this.plan.partSizeBytes;
      bytes += Math.min(this.plan.partSizeBytes, this.file.size - start);
    }
    for (const { loaded } of this.inFlight.values()) bytes += loaded;
    return bytes;
  }

  private takeSnapshot(): UploadSnapshot {
    const now = this.options.now();
    const uploadedBytes = this.phase === 'done' ? this.file.size : this.uploadedBytes();
    if (this.phase === 'uploading') {
      this.samples.push({ at: now, bytes: uploadedBytes });
      while (this.samples.length > 2 && now - this.samples[0].at > SPEED_WINDOW_MS) this.samples.shift();
    }
    const first = this.samples[0];
    const elapsed = first ? (now - first.at) / 1000 : 0;
    const bytesPerSecond = this.phase === 'uploading' && first && elapsed >= 1 ? Math.max(0, (uploadedBytes - first.bytes) / elapsed) : null;
    const remaining = this.file.size - uploadedBytes;
    return {
      footageId: this.plan.footageId,
      fileName: this.file.name,
      phase: this.phase,
      totalBytes: this.file.size,
      uploadedBytes,
      bytesPerSecond,
      secondsLeft: bytesPerSecond ? Math.ceil(remaining / bytesPerSecond) : null,
      retryInSeconds: this.retryAt === null ? null : Math.max(0, Math.ceil((this.retryAt - now) / 1000)),
      error: this.error,
    };
  }

  private changed(): void {
    this.snapshot = this.takeSnapshot();
    for (const listener of this.listeners) listener();
  }
}

function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

import { progressEstimate, renditionJobFraction, type RenditionJobPhase } from '../engine/media-renditions';

/** Progress is stored at most this often, and at least this often while the job runs (the studio polls every 2 s). */
export const PROGRESS_WRITE_MS = 1000;

/** Time for the progress writer: injected, so its cadence is tested without waiting. */
export interface ProgressClock {
  now(): number;
  /** Calls `tick` every `ms` until the returned function is called. */
  every(ms: number, tick: () => void): () => void;
}

export const systemClock: ProgressClock = {
  now: () => Date.now(),
  every: (ms, tick) => {
    const timer = setInterval(tick, ms);
    timer.unref();
    return () => clearInterval(timer);
  },
};

type Store = (percent: number, secondsLeft: number | null) => Promise<unknown>;

/**
 * Stores a transcode job's progress: at once when the job starts and at each phase or milestone
 * (`reach`), at most once a second for the steady reports within a phase (`report`), and on a
 * one-second heartbeat otherwise. The heartbeat writes a report the once-a-second limit held back,
 * and keeps the row moving while nothing reports (ffmpeg starting, the MP4 remux): the time left
 * then counts down from the last estimate instead of standing still. Writes go one at a time, in order.
 */
export class RenditionProgress {
  private fraction = 0;
  private startedAt = 0;
  private lastWriteAt = Number.NEGATIVE_INFINITY;
  private storedFraction = -1;
  /** When the last estimate said the job would end, for the countdown between reports. */
  private finishAt: number | null = null;
  private stopTicking: (() => void) | undefined;
  private stopped = false;
  private chain: Promise<unknown> = Promise.resolve();

  constructor(
    private readonly store: Store,
    private readonly clock: ProgressClock = systemClock,
  ) {}

  start(): void {
    this.startedAt = this.clock.now();
    this.write();
    this.stopTicking = this.clock.every(PROGRESS_WRITE_MS, () => {
      if (this.clock.now() - this.lastWriteAt >= PROGRESS_WRITE_MS) this.write();
    });
  }

  /** A steady report within a phase (ffmpeg's frames, bytes stored): stored if a second has passed, else by the next heartbeat. */
  report(phase: RenditionJobPhase, phaseFraction: number): void {
    this.advance(phase, phaseFraction);
    if (this.clock.now() - this.lastWriteAt >= PROGRESS_WRITE_MS) this.write();
  }

  /** A phase starts or a milestone is passed: stored at once. */
  reach(phase: RenditionJobPhase, phaseFraction = 0): void {
    this.advance(phase, phaseFraction);
    this.write();
  }

  /** No more writes (the job ended, either way). */
  stop(): void {
    this.stopped = true;
    this.stopTicking?.();
  }

  /** Resolves when every write is stored (a failed write is the store's to log, not thrown here). */
  settled(): Promise<unknown> {
    return this.chain;
  }

  private advance(phase: RenditionJobPhase, phaseFraction: number): void {
    // Never backwards within a run (a late report of an earlier phase).
    this.fraction = Math.max(this.fraction, renditionJobFraction(phase, phaseFraction));
  }

  private write(): void {
    if (this.stopped) return;
    const now = this.clock.now();
    this.lastWriteAt = now;
    const estimate = progressEstimate(this.fraction, now - this.startedAt);
    let { secondsLeft } = estimate;
    if (this.fraction === this.storedFraction && this.finishAt !== null) {
      // Nothing new since the last write: count down from that estimate (never to 0 while work remains).
      secondsLeft = Math.max(1, Math.round((this.finishAt - now) / 1000));
    } else {
      this.finishAt = secondsLeft === null ? null : now + secondsLeft * 1000;
    }
    this.storedFraction = this.fraction;
    // Never 100 before the row says ready.
    const percent = Math.min(99.9, estimate.percent);
    this.chain = this.chain.then(() => this.store(percent, secondsLeft)).catch(() => undefined);
  }
}

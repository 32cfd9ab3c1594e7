import { RENDITION_JOB_PHASES } from '../engine/media-renditions';
import { PROGRESS_WRITE_MS, type ProgressClock, RenditionProgress } from './rendition-progress';

const flush = () => new Promise<void>((resolve) => setImmediate(resolve));

/** A clock the test moves by hand; its ticks fire as time passes, as setInterval's would. */
class ManualClock implements ProgressClock {
  private time = 0;
  private timers: { every: number; due: number; tick: () => void }[] = [];

  now(): number {
    return this.time;
  }

  every(ms: number, tick: () => void): () => void {
    const timer = { every: ms, due: this.time + ms, tick };
    this.timers.push(timer);
    return () => {
      this.timers = this.timers.filter((other) => other !== timer);
    };
  }

  /** Moves time forward by `ms`, 10 ms at a time, firing the ticks that fall due; stores run before time moves on. */
  async advance(ms: number): Promise<void> {
    await flush();
    const end = this.time + ms;
    while (this.time < end) {
      this.time = Math.min(end, this.time + 10);
      for (const timer of [...this.timers]) {
        if (timer.due <= this.time) {
          timer.due += timer.every;
          timer.tick();
        }
      }
      await flush();
    }
  }
}

interface Write {
  at: number;
  percent: number;
  secondsLeft: number | null;
}

function writer() {
  const clock = new ManualClock();
  const writes: Write[] = [];
  const progress = new RenditionProgress(async (percent, secondsLeft) => {
    writes.push({ at: clock.now(), percent, secondsLeft });
  }, clock);
  return { clock, writes, progress };
}

const gaps = (writes: Write[]) => writes.slice(1).map((write, index) => write.at - writes[index].at);

describe('RenditionProgress: when a transcode job stores its progress', () => {
  it('stores 0 % when the job starts, then a heartbeat every second while nothing reports (ffmpeg starting)', async () => {
    const { clock, writes, progress } = writer();
    progress.start();
    await clock.advance(5_000);
    progress.stop();
    await progress.settled();
    expect(writes[0]).toEqual({ at: 0, percent: 0, secondsLeft: null });
    expect(writes).toHaveLength(6);
    expect(Math.max(...gaps(writes))).toBeLessThanOrEqual(PROGRESS_WRITE_MS);
  });

  it('stores each phase switch and milestone at once, even within a second of the last write', async () => {
    const { clock, writes, progress } = writer();
    progress.start();
    await clock.advance(100);
    progress.reach('starting', 2 / 3);
    await clock.advance(100);
    progress.reach('packing');
    await clock.advance(100);
    progress.reach('storing');
    await progress.settled();
    expect(writes.map((write) => [write.at, write.percent])).toEqual([
      [0, 0],
      [100, 0.7],
      [200, RENDITION_JOB_PHASES.packing.start * 100],
      [300, RENDITION_JOB_PHASES.storing.start * 100],
    ]);
  });

  it('stores steady reports at most once a second, and a report held back by that limit within the next second', async () => {
    const { clock, writes, progress } = writer();
    progress.start();
    // ffmpeg reports every 300 ms for 6 s: about one write a second, never two within a second.
    for (let step = 1; step <= 20; step += 1) {
      await clock.advance(300);
      progress.report('converting', step / 20);
    }
    await progress.settled();
    const steady = writes.length;
    expect(steady).toBeGreaterThanOrEqual(6);
    expect(steady).toBeLessThanOrEqual(8);
    expect(Math.min(...gaps(writes))).toBeGreaterThanOrEqual(PROGRESS_WRITE_MS);
    // The last report (converting done) came inside the limit: the heartbeat stores it.
    await clock.advance(PROGRESS_WRITE_MS);
    await progress.settled();
    expect(writes[writes.length - 1].percent).toBe(RENDITION_JOB_PHASES.packing.start * 100);
    expect(Math.max(...gaps(writes))).toBeLessThanOrEqual(PROGRESS_WRITE_MS);
  });

  it('never goes backwards within a run, never shows 100 before ready, and stops writing when stopped', async () => {
    const { clock, writes, progress } = writer();
    progress.start();
    progress.reach('storing', 1);
    await clock.advance(1_000);
    progress.report('converting', 0.5);
    await clock.advance(1_000);
    progress.stop();
    await progress.settled();
    const written = writes.length;
    await clock.advance(5_000);
    progress.reach('storing', 1);
    await progress.settled();
    expect(writes.length).toBe(written);
    expect(writes.every((write) => write.percent <= 99.9)).toBe(true);
    expect(writes.map((write) => write.percent)).toEqual([...writes.map((write) => write.percent)].sort((a, b) => a - b));
  });

  it('counts the time left down between reports instead of standing still (a long remux)', async () => {
    const { clock, writes, progress } = writer();
    progress.start();
    await clock.advance(200_000);
    progress.reach('packing');
    await progress.settled();
    const estimate = writes[writes.length - 1].secondsLeft!;
    expect(estimate).toBeGreaterThan(4);
    await clock.advance(4_000);
    await progress.settled();
    const countdown = writes.slice(-4).map((write) => write.secondsLeft);
    expect(countdown).toEqual([estimate - 1, estimate - 2, estimate - 3, estimate - 4]);
    // Past the estimate, it holds at 1 s rather than claiming the work is done.
    await clock.advance(estimate * 1000);
    await progress.settled();
    expect(writes[writes.length - 1].secondsLeft).toBe(1);
  });

  it('keeps going after a store that fails', async () => {
    const clock = new ManualClock();
    const stored: number[] = [];
    let calls = 0;
    const progress = new RenditionProgress(async (percent) => {
      calls += 1;
      if (calls === 1) throw new Error('database away');
      stored.push(percent);
    }, clock);
    progress.start();
    progress.reach('packing');
    await progress.settled();
    expect(stored).toEqual([RENDITION_JOB_PHASES.packing.start * 100]);
  });
});

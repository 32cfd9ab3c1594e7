import type { Queue } from 'bull';
import type { EnqueueOptions, JobQueue } from './job-queue';

/** The job port on Bull: one instance per registered queue (InfraModule binds them to their tokens). */
export class BullJobQueue<Data = unknown> implements JobQueue<Data> {
  constructor(private readonly queue: Queue<Data>) {}

  async enqueue(name: string, data: Data, options: EnqueueOptions = {}): Promise<void> {
    const { jobId, replaceFinished, attempts, backoffMs, timeoutMs } = options;
    if (jobId !== undefined && replaceFinished) {
      // A finished or failed job with this id would make add() a no-op.
      const earlier = await this.queue.getJob(jobId);
      if (earlier && ((await earlier.isCompleted()) || (await earlier.isFailed()))) await earlier.remove();
    }
    const jobOptions = {
      ...(jobId !== undefined && { jobId }),
      ...(attempts !== undefined && { attempts }),
      ...(backoffMs !== undefined && { backoff: { type: 'exponential', delay: backoffMs } }),
      ...(timeoutMs !== undefined && { timeout: timeoutMs }),
    };
    // No options at all: the queue's defaults apply, exactly as a plain add(name, data).
    if (Object.keys(jobOptions).length === 0) await this.queue.add(name, data);
    else await this.queue.add(name, data, jobOptions);
  }

  async removeWaiting(name: string): Promise<number> {
    let removed = 0;
    for (const job of await this.queue.getJobs(['waiting', 'delayed', 'paused'])) {
      if (job?.name !== name) continue;
      await job.remove();
      removed += 1;
    }
    return removed;
  }

  async ping(): Promise<void> {
    await this.queue.client.ping();
  }
}

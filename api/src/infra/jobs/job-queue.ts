import { Inject } from '@nestjs/common';
import type { QueueName } from './queues';

/** How a job is added. Defaults (5 attempts, exponential back-off from 2 s) live in infra.module.ts. */
export interface EnqueueOptions {
  /** The job's id: adding one while a job with this id exists does nothing. */
  jobId?: string;
  /** Replace a finished or failed job that holds `jobId` (a retry must run again), instead of doing nothing. */
  replaceFinished?: boolean;
  attempts?: number;
  /** First delay of the exponential back-off between attempts. */
  backoffMs?: number;
  /** A run longer than this fails the attempt. */
  timeoutMs?: number;
}

/**
 * The job port: domains add work to a named queue and never see the queue library. Inject one with
 * `@InjectJobQueue(QUEUES.x)`; the driver (Bull on Redis, `bull-job-queue.ts`) is bound in `InfraModule`.
 */
export interface JobQueue<Data = unknown> {
  enqueue(name: string, data: Data, options?: EnqueueOptions): Promise<void>;
  /** Removes waiting, delayed and paused jobs of this name (work a queue no longer handles); resolves to how many. */
  removeWaiting(name: string): Promise<number>;
  /** Resolves when the queue's backend answers (the health check). */
  ping(): Promise<void>;
}

/** A job as its handler sees it: the data, its id and how many attempts came before this one. */
export interface JobRun<Data> {
  id: string | number;
  name: string;
  data: Data;
  attemptsMade: number;
  opts: { attempts?: number };
}

export const jobQueueToken = (queue: QueueName): string => `fitwright:job-queue:${queue}`;

/** Injects the job port of one queue. */
export const InjectJobQueue = (queue: QueueName): ParameterDecorator => Inject(jobQueueToken(queue));

import { OnQueueFailed, Process, Processor } from '@nestjs/bull';
import type { QueueName } from './queues';

/**
 * The worker side of the job port: a domain class marked `@JobProcessor(QUEUES.x)` works that queue,
 * one `@JobHandler(name)` method per job name (taking a `JobRun`), and `@OnJobFailed()` hears every failed
 * attempt. Only this file knows they are Bull's decorators.
 */
export const JobProcessor = (queue: QueueName): ClassDecorator => Processor(queue);

/** `concurrency`: how many of these jobs one process runs at once (Bull adds up a queue's handlers). */
export const JobHandler = (name: string, options: { concurrency?: number } = {}): MethodDecorator =>
  Process({ name, ...options });

/** Called with the job and its error after each failed attempt; compare `attemptsMade` with `opts.attempts`. */
export const OnJobFailed = (): MethodDecorator => OnQueueFailed();

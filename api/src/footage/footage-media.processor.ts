import { OnQueueFailed, Process, Processor } from '@nestjs/bull';
import { Inject, Logger } from '@nestjs/common';
import type { Job } from 'bull';
import { QUEUES } from '../infra/jobs/queues';
import { MEDIA_JOBS, type ProcessFootageJob } from './footage-jobs';
import { FootageProcessingService } from './footage-processing.service';

/**
 * Works the media queue. Jobs live in Redis (append-only persistence), so an API restart picks up
 * waiting jobs and re-runs ones that were active; Bull retries failures with exponential backoff
 * (defaults in infra.module.ts), and after the last attempt the footage is marked failed.
 */
@Processor(QUEUES.media)
export class FootageMediaProcessor {
  private readonly logger = new Logger(FootageMediaProcessor.name);

  constructor(@Inject(FootageProcessingService) private readonly processing: FootageProcessingService) {}

  @Process({ name: MEDIA_JOBS.processFootage, concurrency: 2 })
  async processFootage(job: Job<ProcessFootageJob>): Promise<string> {
    try {
      return await this.processing.process(job.data.footageId);
    } catch (error) {
      this.logger.warn(
        `footage ${job.data.footageId}: attempt ${job.attemptsMade + 1} failed: ${error instanceof Error ? error.message : String(error)}`,
      );
      throw error;
    }
  }

  @OnQueueFailed()
  async onFailed(job: Job<ProcessFootageJob>, error: Error): Promise<void> {
    if (job.name !== MEDIA_JOBS.processFootage) return;
    const attempts = job.opts.attempts ?? 1;
    if (job.attemptsMade < attempts) return;
    await this.processing.markFailed(
      job.data.footageId,
      `Processing failed after ${attempts} attempts: ${error.message}. Delete the footage and upload it again.`,
    );
  }
}

import { OnQueueFailed, Process, Processor } from '@nestjs/bull';
import { Inject, Logger } from '@nestjs/common';
import type { Job } from 'bull';
import { QUEUES } from '../infra/jobs/queues';
import { MEDIA_JOBS, type ProcessFootageJob, type TranscodeFootageJob } from './footage-jobs';
import { FootageProcessingService } from './footage-processing.service';
import { FootageRenditionsService } from './footage-renditions.service';
import { FootageService } from './footage.service';

/**
 * Works the media queue. Jobs live in Redis (append-only persistence), so an API restart picks up
 * waiting jobs and re-runs ones that were active; Bull retries failures with exponential backoff
 * (defaults in infra.module.ts), and after the last attempt the footage is marked failed.
 */
@Processor(QUEUES.media)
export class FootageMediaProcessor {
  private readonly logger = new Logger(FootageMediaProcessor.name);

  constructor(
    @Inject(FootageProcessingService) private readonly processing: FootageProcessingService,
    @Inject(FootageRenditionsService) private readonly renditions: FootageRenditionsService,
    @Inject(FootageService) private readonly footage: FootageService,
  ) {}

  @Process({ name: MEDIA_JOBS.processFootage, concurrency: 2 })
  async processFootage(job: Job<ProcessFootageJob>): Promise<string> {
    try {
      const outcome = await this.processing.process(job.data.footageId);
      if (outcome === 'ready') await this.footage.enqueueRenditions(job.data.footageId);
      return outcome;
    } catch (error) {
      this.logger.warn(
        `footage ${job.data.footageId}: attempt ${job.attemptsMade + 1} failed: ${error instanceof Error ? error.message : String(error)}`,
      );
      throw error;
    }
  }

  /**
   * One transcode at a time per process: ffmpeg already uses every core. More throughput comes
   * from more worker processes (worker.ts) on the media queue.
   */
  @Process({ name: MEDIA_JOBS.transcodeFootage, concurrency: 1 })
  async transcodeFootage(job: Job<TranscodeFootageJob>): Promise<string> {
    try {
      return await this.renditions.transcode(job.data.footageId);
    } catch (error) {
      this.logger.warn(
        `renditions of footage ${job.data.footageId}: attempt ${job.attemptsMade + 1} failed: ${error instanceof Error ? error.message : String(error)}`,
      );
      throw error;
    }
  }

  @OnQueueFailed()
  async onFailed(job: Job<ProcessFootageJob | TranscodeFootageJob>, error: Error): Promise<void> {
    const attempts = job.opts.attempts ?? 1;
    if (job.attemptsMade < attempts) return;
    if (job.name === MEDIA_JOBS.transcodeFootage) {
      await this.renditions.markFailed(job.data.footageId, `Web versions could not be made after ${attempts} attempts: ${error.message}. The original is kept; retry later.`);
      return;
    }
    if (job.name !== MEDIA_JOBS.processFootage) return;
    await this.processing.markFailed(
      job.data.footageId,
      `Processing failed after ${attempts} attempts: ${error.message}. Delete the footage and upload it again.`,
    );
  }
}

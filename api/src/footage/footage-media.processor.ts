import { Inject, Logger } from '@nestjs/common';
import { JobHandler, JobProcessor, OnJobFailed } from '../infra/jobs/job-handlers';
import type { JobRun } from '../infra/jobs/job-queue';
import { QUEUES } from '../infra/jobs/queues';
import { MEDIA_JOBS, type ProcessFootageJob, type TranscodeFootageJob } from './footage-jobs';
import { FootageProcessingService } from './footage-processing.service';
import { FootageRenditionsService } from './footage-renditions.service';
import { FootageService } from './footage.service';

/**
 * Works the media queue. Jobs live in Redis (append-only persistence), so an API restart picks up
 * waiting jobs and re-runs ones that were active; Bull retries failures with exponential backoff
 * (defaults in infra.module.ts), and after the last attempt the footage is marked failed. Transcodes
 * run on their own queue (FootageTranscodeProcessor, below): only probing jobs share these two slots.
 */
@JobProcessor(QUEUES.media)
export class FootageMediaProcessor {
  private readonly logger = new Logger(FootageMediaProcessor.name);

  constructor(
    @Inject(FootageProcessingService) private readonly processing: FootageProcessingService,
    @Inject(FootageService) private readonly footage: FootageService,
  ) {}

  @JobHandler(MEDIA_JOBS.processFootage, { concurrency: 2 })
  async processFootage(job: JobRun<ProcessFootageJob>): Promise<string> {
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

  @OnJobFailed()
  async onFailed(job: JobRun<ProcessFootageJob>, error: Error): Promise<void> {
    const attempts = job.opts.attempts ?? 1;
    if (job.attemptsMade < attempts) return;
    if (job.name !== MEDIA_JOBS.processFootage) return;
    await this.processing.markFailed(
      job.data.footageId,
      `Processing failed after ${attempts} attempts: ${error.message}. Delete the footage and upload it again.`,
    );
  }
}

/**
 * Works the media-transcode queue (kept in this file, beside the media queue's processor): one transcode at a time per process, because ffmpeg already uses
 * every core. This is the queue's only handler, so its concurrency of 1 is the process's total (Bull
 * sums the slots of all handlers on a queue). More throughput comes from more worker processes.
 */
@JobProcessor(QUEUES.mediaTranscode)
export class FootageTranscodeProcessor {
  private readonly logger = new Logger(FootageTranscodeProcessor.name);

  constructor(@Inject(FootageRenditionsService) private readonly renditions: FootageRenditionsService) {}

  @JobHandler(MEDIA_JOBS.transcodeFootage, { concurrency: 1 })
  async transcodeFootage(job: JobRun<TranscodeFootageJob>): Promise<string> {
    try {
      return await this.renditions.transcode(job.data.footageId);
    } catch (error) {
      this.logger.warn(
        `renditions of footage ${job.data.footageId}: attempt ${job.attemptsMade + 1} failed: ${error instanceof Error ? error.message : String(error)}`,
      );
      throw error;
    }
  }

  @OnJobFailed()
  async onFailed(job: JobRun<TranscodeFootageJob>, error: Error): Promise<void> {
    const attempts = job.opts.attempts ?? 1;
    if (job.attemptsMade < attempts) return;
    await this.renditions.markFailed(job.data.footageId, `Web versions could not be made after ${attempts} attempts: ${error.message}. The original is kept; retry later.`);
  }
}

import { Process, Processor } from '@nestjs/bull';
import { Inject, Logger } from '@nestjs/common';
import type { Job } from 'bull';
import { QUEUES } from '../infra/jobs/queues';
import { FitNewsService } from './fit-news.service';
import { NOTIFICATION_JOBS, type FitNewsJob } from './fit-news.jobs';

/** Works the notifications queue. A retry sends only what the failed attempt did not (deliveries are unique). */
@Processor(QUEUES.notifications)
export class FitNewsProcessor {
  private readonly logger = new Logger(FitNewsProcessor.name);

  constructor(@Inject(FitNewsService) private readonly fitNews: FitNewsService) {}

  @Process({ name: NOTIFICATION_JOBS.fitNews, concurrency: 2 })
  async deliver(job: Job<FitNewsJob>): Promise<number> {
    try {
      return await this.fitNews.deliver(job.data);
    } catch (error) {
      this.logger.warn(`fit news for check ${job.data.fitCheckId}: attempt ${job.attemptsMade + 1} failed: ${error instanceof Error ? error.message : String(error)}`);
      throw error;
    }
  }
}

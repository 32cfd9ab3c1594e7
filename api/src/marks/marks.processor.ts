import { Inject, Logger } from '@nestjs/common';
import { JobHandler, JobProcessor } from '../infra/jobs/job-handlers';
import type { JobRun } from '../infra/jobs/job-queue';
import { QUEUES } from '../infra/jobs/queues';
import { MarkSuggestionsMiner } from './mark-suggestions-miner.service';
import { MARKS_JOBS, type MineTranscriptJob } from './marks-jobs';

/** Works the marks queue: mining a transcript for suggested marks. Failures retry with the queue's backoff. */
@JobProcessor(QUEUES.marks)
export class MarksProcessor {
  private readonly logger = new Logger(MarksProcessor.name);

  constructor(@Inject(MarkSuggestionsMiner) private readonly miner: MarkSuggestionsMiner) {}

  @JobHandler(MARKS_JOBS.mineTranscript, { concurrency: 2 })
  async mineTranscript(job: JobRun<MineTranscriptJob>): Promise<number> {
    try {
      return await this.miner.mine(job.data.workshopId, job.data.footageId);
    } catch (error) {
      this.logger.warn(
        `footage ${job.data.footageId}: mining attempt ${job.attemptsMade + 1} failed: ${error instanceof Error ? error.message : String(error)}`,
      );
      throw error;
    }
  }
}

import { Inject, Logger } from '@nestjs/common';
import { JobHandler, JobProcessor } from '../infra/jobs/job-handlers';
import type { JobRun } from '../infra/jobs/job-queue';
import { QUEUES } from '../infra/jobs/queues';
import { ACCOUNTS_JOBS, type PasswordResetRequestedJob } from './accounts-jobs';
import { AuthService } from './auth.service';

/** Works the accounts queue: the account-dependent half of requests that must answer alike for every address. */
@JobProcessor(QUEUES.accounts)
export class AccountsProcessor {
  private readonly logger = new Logger(AccountsProcessor.name);

  constructor(@Inject(AuthService) private readonly auth: AuthService) {}

  @JobHandler(ACCOUNTS_JOBS.passwordResetRequested)
  async passwordResetRequested(job: JobRun<PasswordResetRequestedJob>): Promise<boolean> {
    try {
      return await this.auth.sendPasswordResetLink(job.data.email);
    } catch (error) {
      this.logger.warn(
        `password reset job ${job.id} attempt ${job.attemptsMade + 1} failed: ${error instanceof Error ? error.message : String(error)}`,
      );
      throw error;
    }
  }
}

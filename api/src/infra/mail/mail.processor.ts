import { Process, Processor } from '@nestjs/bull';
import { Inject, Logger } from '@nestjs/common';
import type { Job } from 'bull';
import { QUEUES } from '../jobs/queues';
import { SEND_MAIL_JOB } from './mail-queue.service';
import { MailService, type OutgoingMail } from './mail.service';

/** Works the mail queue: one SMTP delivery per job, retried with backoff by Bull when the relay fails. */
@Processor(QUEUES.mail)
export class MailProcessor {
  private readonly logger = new Logger(MailProcessor.name);

  constructor(@Inject(MailService) private readonly mail: MailService) {}

  @Process(SEND_MAIL_JOB)
  async send(job: Job<OutgoingMail>): Promise<void> {
    try {
      await this.mail.send(job.data);
    } catch (error) {
      this.logger.warn(
        `mail job ${job.id} attempt ${job.attemptsMade + 1} failed: ${error instanceof Error ? error.message : String(error)}`,
      );
      throw error;
    }
  }
}

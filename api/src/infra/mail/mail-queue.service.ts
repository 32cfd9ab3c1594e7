import { InjectQueue } from '@nestjs/bull';
import { Injectable } from '@nestjs/common';
import type { Queue } from 'bull';
import { QUEUES } from '../jobs/queues';
import type { OutgoingMail } from './mail.service';

export const SEND_MAIL_JOB = 'send';

/** How domain code sends mail: it enqueues a job and returns; the mail processor does the SMTP work. */
@Injectable()
export class MailQueueService {
  constructor(@InjectQueue(QUEUES.mail) private readonly queue: Queue<OutgoingMail>) {}

  async enqueue(mail: OutgoingMail): Promise<void> {
    await this.queue.add(SEND_MAIL_JOB, mail);
  }
}

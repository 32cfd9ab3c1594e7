import type { INestApplicationContext } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { AppModule } from '../src/app.module';
import { MailQueueService } from '../src/infra/mail/mail-queue.service';
import { uniqueEmail } from './support/accounts';
import { waitForMail } from './support/mail-inbox';

jest.setTimeout(60_000);

describe('a queue-only worker process (src/worker.ts: no HTTP)', () => {
  let worker: INestApplicationContext;
  beforeAll(async () => {
    // What src/worker.ts boots; no HTTP app runs in this test file, so only this context can work the jobs.
    worker = await NestFactory.createApplicationContext(AppModule, { logger: ['error', 'warn'] });
  });
  afterAll(async () => worker.close());

  it('works the queues: a queued e-mail is sent', async () => {
    const to = uniqueEmail('worker');
    await worker.get(MailQueueService).enqueue({ to, subject: 'Sent by a worker process', text: 'Queued and sent without HTTP.' });
    const mail = await waitForMail(to, { subject: 'Sent by a worker process' });
    expect(mail.text).toContain('Queued and sent without HTTP.');
  });
});

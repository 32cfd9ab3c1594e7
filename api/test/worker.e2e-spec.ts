import type { INestApplicationContext } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { AppModule } from '../src/app.module';
import { MailOutbox } from '../src/outbox/mail-outbox.service';
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

  it('relays the mail outbox: a written e-mail is sent', async () => {
    const to = uniqueEmail('worker');
    await worker.get(MailOutbox).send({ kind: 'test', mail: { to, subject: 'Sent by a worker process', text: 'Queued and sent without HTTP.' } });
    const mail = await waitForMail(to, { subject: 'Sent by a worker process' });
    expect(mail.text).toContain('Queued and sent without HTTP.');
  });
});

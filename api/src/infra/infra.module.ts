import { BullModule, getQueueToken } from '@nestjs/bull';
import { Global, Module, type Provider, type Type } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Queue } from 'bull';
import { AppConfig } from '../config/app-config';
import { BullJobQueue } from './jobs/bull-job-queue';
import { jobQueueToken } from './jobs/job-queue';
import { QueueWorkersLifecycle } from './jobs/queue-workers.lifecycle';
import { QUEUES } from './jobs/queues';
import { MailService } from './mail/mail.service';
import { SmtpMailService } from './mail/smtp-mail.service';
import { MediaToolsService } from './media/media-tools.service';
import { S3StorageService } from './storage/s3-storage.service';
import { StorageService } from './storage/storage.service';

/** The driver behind each port, by the name the configuration gives (STORAGE_DRIVER, MAIL_DRIVER). */
const STORAGE_DRIVER_CLASSES: Record<AppConfig['storage']['driver'], Type<StorageService>> = { s3: S3StorageService };
const MAIL_DRIVER_CLASSES: Record<AppConfig['mail']['driver'], Type<MailService>> = { smtp: SmtpMailService };

const DRIVERS: Provider[] = [
  {
    provide: StorageService,
    inject: [ConfigService],
    useFactory: (config: ConfigService<AppConfig, true>) => new STORAGE_DRIVER_CLASSES[config.get('storage', { infer: true }).driver](config),
  },
  {
    provide: MailService,
    inject: [ConfigService],
    useFactory: (config: ConfigService<AppConfig, true>) => new MAIL_DRIVER_CLASSES[config.get('mail', { infer: true }).driver](config),
  },
];

/** The job port of each queue, on its Bull queue. */
const JOB_QUEUES: Provider[] = Object.values(QUEUES).map((name) => ({
  provide: jobQueueToken(name),
  inject: [getQueueToken(name)],
  useFactory: (queue: Queue) => new BullJobQueue(queue),
}));

/** Infrastructure wrappers: storage, mail and the job queues (domains add jobs through the `JobQueue` port,
 * `jobs/job-queue.ts`; Bull stays here). Global so domains inject them directly. */
@Global()
@Module({
  imports: [
    BullModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppConfig, true>) => {
        const redis = config.get('redis', { infer: true });
        return {
          redis: { host: redis.host, port: redis.port, password: redis.password },
          prefix: redis.prefix,
          // A job whose process died (crash, SIGKILL, lost host) runs again once its lock lapses. Bull renews the
          // lock every lockDuration / 2 while the job runs and looks for lapsed ones every stalledInterval, so a
          // killed job restarts within ~20 s instead of Bull's default ~60 s (npm run test:faults checks it).
          settings: { lockDuration: 15_000, stalledInterval: 5_000 },
          defaultJobOptions: {
            attempts: 5,
            backoff: { type: 'exponential', delay: 2000 },
            removeOnComplete: 1000,
            removeOnFail: 5000,
          },
        };
      },
    }),
    BullModule.registerQueue({ name: QUEUES.media }, { name: QUEUES.mediaTranscode }, { name: QUEUES.marks }, { name: QUEUES.accounts }),
  ],
  providers: [...DRIVERS, MediaToolsService, QueueWorkersLifecycle, ...JOB_QUEUES],
  exports: [StorageService, MailService, MediaToolsService, ...JOB_QUEUES],
})
export class InfraModule {}

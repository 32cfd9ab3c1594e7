import { BullModule } from '@nestjs/bull';
import { Global, Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { AppConfig } from '../config/app-config';
import { QueueWorkersLifecycle } from './jobs/queue-workers.lifecycle';
import { QUEUES } from './jobs/queues';
import { MailService } from './mail/mail.service';
import { MediaToolsService } from './media/media-tools.service';
import { StorageService } from './storage/storage.service';

/** Infrastructure wrappers: storage, mail and the job queues. Global so domains inject them directly. */
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
  providers: [StorageService, MailService, MediaToolsService, QueueWorkersLifecycle],
  exports: [StorageService, MailService, BullModule, MediaToolsService],
})
export class InfraModule {}

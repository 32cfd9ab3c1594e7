import { Inject, Injectable, Logger } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { InjectJobQueue, type JobQueue } from '../infra/jobs/job-queue';
import { QUEUES } from '../infra/jobs/queues';
import { MailService } from '../infra/mail/mail.service';
import { StorageService } from '../infra/storage/storage.service';

export type CheckState = 'up' | 'down';
export interface HealthReport {
  status: 'ok' | 'down';
  checks: { database: CheckState; storage: CheckState; mail: CheckState; queue: CheckState };
}

/** A dead service must not hang the health route: each probe gets this long. */
const PROBE_TIMEOUT_MS = 3000;

@Injectable()
export class HealthService {
  private readonly logger = new Logger(HealthService.name);

  constructor(
    @Inject(DataSource) private readonly dataSource: DataSource,
    @Inject(StorageService) private readonly storage: StorageService,
    @Inject(MailService) private readonly mail: MailService,
    @InjectJobQueue(QUEUES.media) private readonly mediaQueue: JobQueue,
  ) {}

  async check(): Promise<HealthReport> {
    const [database, storage, mail, queue] = await Promise.all([
      this.probe('database', () => this.dataSource.query('SELECT 1')),
      this.probe('storage', () => this.storage.ping()),
      this.probe('mail', () => this.mail.ping()),
      this.probe('queue', () => this.mediaQueue.ping()),
    ]);
    const checks = { database, storage, mail, queue };
    const allUp = Object.values(checks).every((state) => state === 'up');
    return { status: allUp ? 'ok' : 'down', checks };
  }

  private async probe(name: string, run: () => Promise<unknown>): Promise<CheckState> {
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error(`no answer within ${PROBE_TIMEOUT_MS} ms`)), PROBE_TIMEOUT_MS);
    });
    try {
      await Promise.race([run(), timeout]);
      return 'up';
    } catch (error) {
      this.logger.warn(`${name} is down: ${error instanceof Error ? error.message : String(error)}`);
      return 'down';
    } finally {
      clearTimeout(timer);
    }
  }
}

import { InjectQueue } from '@nestjs/bull';
import { Injectable } from '@nestjs/common';
import { OnEvent } from '@nestjs/event-emitter';
import type { Queue } from 'bull';
import { FIT_CHECK_CHANGED, type FitCheckChangedEvent } from '../fit-checks/fit-checks.events';
import { QUEUES } from '../infra/jobs/queues';
import { NEWS_STATES } from './fit-news.service';
import { NOTIFICATION_JOBS, type FitNewsJob } from './fit-news.jobs';

/** Events enqueue, jobs do the work: a check that became confirmed or no fit queues its fan-out to followers. */
@Injectable()
export class FitNewsListener {
  constructor(@InjectQueue(QUEUES.notifications) private readonly queue: Queue<FitNewsJob>) {}

  @OnEvent(FIT_CHECK_CHANGED, { async: true, promisify: true })
  async handleFitCheckChanged(event: FitCheckChangedEvent): Promise<void> {
    if (!(NEWS_STATES as readonly string[]).includes(event.to)) return;
    await this.queue.add(NOTIFICATION_JOBS.fitNews, event, { jobId: `fit-news-${event.eventId}` });
  }
}

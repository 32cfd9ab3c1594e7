import { Injectable } from '@nestjs/common';
import { OnEvent } from '@nestjs/event-emitter';
import { InjectJobQueue, type JobQueue } from '../infra/jobs/job-queue';
import { QUEUES } from '../infra/jobs/queues';
import { TRANSCRIPT_ATTACHED, type TranscriptAttachedEvent } from '../transcripts/transcripts.events';
import { MARKS_JOBS, type MineTranscriptJob } from './marks-jobs';

/** Events enqueue, jobs do the work: a stored transcript revision queues its mining. */
@Injectable()
export class TranscriptAttachedListener {
  constructor(@InjectJobQueue(QUEUES.marks) private readonly queue: JobQueue<MineTranscriptJob>) {}

  @OnEvent(TRANSCRIPT_ATTACHED, { async: true, promisify: true })
  async handleTranscriptAttached(event: TranscriptAttachedEvent): Promise<void> {
    // One job per revision: a repeated event for the same revision adds nothing.
    await this.queue.enqueue(MARKS_JOBS.mineTranscript, event, { jobId: `mine-transcript-${event.transcriptId}` });
  }
}

import { InjectQueue } from '@nestjs/bull';
import { Injectable } from '@nestjs/common';
import { OnEvent } from '@nestjs/event-emitter';
import type { Queue } from 'bull';
import { QUEUES } from '../infra/jobs/queues';
import { TRANSCRIPT_ATTACHED, type TranscriptAttachedEvent } from '../transcripts/transcripts.events';
import { MARKS_JOBS, type MineTranscriptJob } from './marks-jobs';

/** Events enqueue, jobs do the work: a stored transcript revision queues its mining. */
@Injectable()
export class TranscriptAttachedListener {
  constructor(@InjectQueue(QUEUES.marks) private readonly queue: Queue<MineTranscriptJob>) {}

  @OnEvent(TRANSCRIPT_ATTACHED, { async: true, promisify: true })
  async handleTranscriptAttached(event: TranscriptAttachedEvent): Promise<void> {
    // One job per revision: a repeated event for the same revision adds nothing.
    await this.queue.add(MARKS_JOBS.mineTranscript, event, { jobId: `mine-transcript-${event.transcriptId}` });
  }
}

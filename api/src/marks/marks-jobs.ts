/** Jobs on the marks queue (infra/jobs/queues.ts); the marks processor works them. */
export const MARKS_JOBS = {
  mineTranscript: 'mine-transcript',
} as const;

export interface MineTranscriptJob {
  workshopId: string;
  footageId: string;
  transcriptId: string;
}

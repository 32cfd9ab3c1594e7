/** Jobs on the media queue (infra/jobs/queues.ts); the footage media processor works them. */
export const MEDIA_JOBS = {
  processFootage: 'process-footage',
} as const;

export interface ProcessFootageJob {
  footageId: string;
}

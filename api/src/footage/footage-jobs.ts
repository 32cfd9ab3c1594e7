/** Jobs on the media queue (infra/jobs/queues.ts); the footage media processor works them. */
export const MEDIA_JOBS = {
  processFootage: 'process-footage',
  /** Web renditions, sprites and waveform; queued once probing made the footage ready. */
  transcodeFootage: 'transcode-footage',
} as const;

export interface ProcessFootageJob {
  footageId: string;
}

export interface TranscodeFootageJob {
  footageId: string;
}

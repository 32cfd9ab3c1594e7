/**
 * Job names. `process-footage` runs on the media queue (FootageMediaProcessor); `transcode-footage` on
 * the media-transcode queue (FootageTranscodeProcessor), see infra/jobs/queues.ts for why apart.
 */
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

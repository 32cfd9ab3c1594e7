/** Queue names, one processor class per queue. */
export const QUEUES = {
  media: 'media',
  /**
   * Web renditions, on their own queue: Bull adds up the concurrency of every named processor on one
   * queue and lets any slot take any job, so sharing `media` would let one process run several ffmpeg
   * transcodes at once. This queue has one processor with one slot.
   */
  mediaTranscode: 'media-transcode',
  marks: 'marks',
  /** Account work done off the request path, so answers do not depend on whether an account exists. */
  accounts: 'accounts',
} as const;

export type QueueName = (typeof QUEUES)[keyof typeof QUEUES];

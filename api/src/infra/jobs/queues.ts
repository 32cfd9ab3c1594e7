/** Queue names, one processor class per queue. */
export const QUEUES = {
  media: 'media',
  marks: 'marks',
  /** Account work done off the request path, so answers do not depend on whether an account exists. */
  accounts: 'accounts',
} as const;

export type QueueName = (typeof QUEUES)[keyof typeof QUEUES];

/** Queue names, one processor class per queue. */
export const QUEUES = {
  mail: 'mail',
  media: 'media',
  marks: 'marks',
  notifications: 'notifications',
  /** Account work done off the request path, so answers do not depend on whether an account exists. */
  accounts: 'accounts',
} as const;

export type QueueName = (typeof QUEUES)[keyof typeof QUEUES];

/** Queue names, one processor class per queue. */
export const QUEUES = {
  mail: 'mail',
  media: 'media',
  marks: 'marks',
  notifications: 'notifications',
} as const;

export type QueueName = (typeof QUEUES)[keyof typeof QUEUES];

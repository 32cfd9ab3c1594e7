/**
 * Errors that mean "Redis (the job queue, the rate limits) cannot be reached right now": ioredis gave up
 * on a command after its reconnect retries, or the connection was closed under it. Matched by name and
 * message because only infra/ may import the Redis client; both texts are ioredis 5's own.
 */
const CONNECTION_CLOSED = 'Connection is closed.';

export function isQueueUnavailable(exception: unknown): boolean {
  if (!(exception instanceof Error)) return false;
  return exception.name === 'MaxRetriesPerRequestError' || exception.message === CONNECTION_CLOSED;
}

/** A 503 that says what is wrong without leaking connection details; the client may retry. */
export function queueUnavailableBody(exception: unknown): { statusCode: number; message: string; code: string } | undefined {
  if (!isQueueUnavailable(exception)) return undefined;
  return { statusCode: 503, message: 'The job queue is not reachable right now; try again shortly', code: 'queue_unavailable' };
}

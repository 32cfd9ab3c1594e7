import { queueUnavailableBody } from './queue-unavailable';

/** Error shapes as ioredis 5 raises them (errors/MaxRetriesPerRequestError.js, utils CONNECTION_CLOSED_ERROR_MSG). */
describe('queueUnavailableBody', () => {
  class MaxRetriesPerRequestError extends Error {
    override get name(): string {
      return 'MaxRetriesPerRequestError';
    }
  }

  it('answers 503 when ioredis gave up retrying a command', () => {
    const error = new MaxRetriesPerRequestError('Reached the max retries per request limit (which is 20).');
    expect(queueUnavailableBody(error)).toEqual({
      statusCode: 503,
      message: 'The job queue is not reachable right now; try again shortly',
      code: 'queue_unavailable',
    });
  });

  it('answers 503 when the connection closed under a command', () => {
    expect(queueUnavailableBody(new Error('Connection is closed.'))?.statusCode).toBe(503);
  });

  it('leaves other errors alone', () => {
    expect(queueUnavailableBody(new Error('Connection is closed by the peer'))).toBeUndefined();
    expect(queueUnavailableBody(new Error('boom'))).toBeUndefined();
    expect(queueUnavailableBody({ name: 'MaxRetriesPerRequestError' })).toBeUndefined();
  });
});

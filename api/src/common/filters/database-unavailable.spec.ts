import { QueryFailedError } from 'typeorm';
import { databaseUnavailableBody, isDatabaseUnavailable } from './database-unavailable';

/** Error shapes as mysql2 3.x and TypeORM 1.x raise them (from their sources and seen in the fault tests). */
describe('isDatabaseUnavailable', () => {
  function mysqlError(message: string, fields: Record<string, unknown>): Error {
    return Object.assign(new Error(message), fields);
  }

  it('matches a refused connection (mysql2 marks network errors fatal)', () => {
    expect(isDatabaseUnavailable(mysqlError('connect ECONNREFUSED 127.0.0.1:3327', { code: 'ECONNREFUSED', errno: -111, fatal: true }))).toBe(true);
  });

  it('matches a connection lost mid-query, wrapped by TypeORM', () => {
    const lost = mysqlError('Connection lost: The server closed the connection.', { code: 'PROTOCOL_CONNECTION_LOST', fatal: true });
    expect(isDatabaseUnavailable(new QueryFailedError('SELECT 1', [], lost))).toBe(true);
  });

  it('matches the server shutting down and running out of connections (MariaDB error codes 1053, 1040)', () => {
    expect(isDatabaseUnavailable(mysqlError('Server shutdown in progress', { code: 'ER_SERVER_SHUTDOWN', errno: 1053 }))).toBe(true);
    expect(isDatabaseUnavailable(mysqlError('Too many connections', { code: 'ER_CON_COUNT_ERROR', errno: 1040 }))).toBe(true);
  });

  it('matches a pooled connection that closed before the query was sent', () => {
    expect(isDatabaseUnavailable(new Error("Can't add new command when connection is in closed state"))).toBe(true);
  });

  it('does not match errors the request caused, nor other services being down', () => {
    expect(isDatabaseUnavailable(mysqlError("Duplicate entry 'x' for key 'slug'", { code: 'ER_DUP_ENTRY', errno: 1062 }))).toBe(false);
    // Storage or SMTP refusing a connection: plain Node network errors, not mysql2's.
    expect(isDatabaseUnavailable(mysqlError('connect ECONNREFUSED 127.0.0.1:4589', { code: 'ECONNREFUSED', errno: -111 }))).toBe(false);
    expect(isDatabaseUnavailable(new Error('boom'))).toBe(false);
    expect(isDatabaseUnavailable('ECONNREFUSED')).toBe(false);
    expect(isDatabaseUnavailable(null)).toBe(false);
  });

  it('answers 503 with a code the client can key on', () => {
    expect(databaseUnavailableBody(mysqlError('connect ECONNREFUSED', { code: 'ECONNREFUSED', fatal: true }))).toEqual({
      statusCode: 503,
      message: 'The database is not reachable right now; try again shortly',
      code: 'database_unavailable',
    });
    expect(databaseUnavailableBody(new Error('boom'))).toBeUndefined();
  });
});

import { HttpStatus } from '@nestjs/common';

/**
 * Errors that mean "the database cannot be reached right now", not "this request was wrong": the
 * server refused or dropped the connection, is shutting down, or is out of connections. mysql2 marks
 * every connection-level failure (ECONNREFUSED, a lost connection) `fatal`; the codes are MariaDB's
 * and mysql2's own, so a network error from storage or SMTP (plain ECONNREFUSED) never matches.
 */
const UNREACHABLE_CODES = new Set([
  'PROTOCOL_CONNECTION_LOST',
  'PROTOCOL_ENQUEUE_AFTER_FATAL_ERROR',
  'PROTOCOL_ENQUEUE_AFTER_QUIT',
  'PROTOCOL_SEQUENCE_TIMEOUT',
  'ER_SERVER_SHUTDOWN',
  'ER_CON_COUNT_ERROR',
  'ER_TOO_MANY_USER_CONNECTIONS',
  'ER_CONNECTION_KILLED',
]);

/** mysql2's message when a pooled connection died before the query was sent (it carries no code). */
const CLOSED_CONNECTION = /connection is in closed state/i;

export function isDatabaseUnavailable(exception: unknown): boolean {
  if (typeof exception !== 'object' || exception === null) return false;
  const { code, fatal, message, driverError } = exception as { code?: unknown; fatal?: unknown; message?: unknown; driverError?: unknown };
  if (typeof code === 'string' && UNREACHABLE_CODES.has(code)) return true;
  if (fatal === true) return true;
  if (typeof message === 'string' && CLOSED_CONNECTION.test(message)) return true;
  return driverError !== undefined && driverError !== exception && isDatabaseUnavailable(driverError);
}

/** A 503 that says what is wrong without leaking connection details; the client may retry. */
export function databaseUnavailableBody(exception: unknown): { statusCode: number; message: string; code: string } | undefined {
  if (!isDatabaseUnavailable(exception)) return undefined;
  return {
    statusCode: HttpStatus.SERVICE_UNAVAILABLE,
    message: 'The database is not reachable right now; try again shortly',
    code: 'database_unavailable',
  };
}

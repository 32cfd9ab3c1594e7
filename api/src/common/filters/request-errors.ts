import { HttpStatus } from '@nestjs/common';

/** The JSON shape every error leaves the API in. */
export interface ErrorBody {
  statusCode: number;
  message: string | string[];
  error?: string;
  [detail: string]: unknown;
}

/**
 * Errors raised before Nest sees the request, by Express's body parser (http-errors with a `type`):
 * too large, unreadable JSON, too deeply nested (our verify step), an unknown charset. Undefined for anything else.
 */
export function bodyParserErrorBody(exception: unknown): ErrorBody | undefined {
  if (typeof exception !== 'object' || exception === null) return undefined;
  const { type, status, limit } = exception as { type?: unknown; status?: unknown; limit?: unknown };
  if (typeof type !== 'string' || typeof status !== 'number' || status < 400 || status >= 500) return undefined;
  switch (type) {
    case 'entity.too.large':
      return {
        statusCode: HttpStatus.PAYLOAD_TOO_LARGE,
        message: `The request body is larger than the ${typeof limit === 'number' ? describeBytes(limit) : 'allowed'} limit`,
        code: 'body_too_large',
      };
    case 'entity.parse.failed':
      return { statusCode: HttpStatus.BAD_REQUEST, message: 'The request body is not valid JSON', code: 'body_not_json' };
    case JSON_TOO_DEEP:
      return { statusCode: HttpStatus.BAD_REQUEST, message: (exception as Error).message, code: 'body_too_deep' };
    case 'charset.unsupported':
    case 'encoding.unsupported':
      return { statusCode: HttpStatus.UNSUPPORTED_MEDIA_TYPE, message: (exception as Error).message, code: 'body_encoding' };
    default:
      return { statusCode: status, message: (exception as Error).message || 'The request body could not be read', code: 'body_unreadable' };
  }
}

/** The `type` our JSON verify step gives a body that nests too deeply. */
export const JSON_TOO_DEEP = 'entity.too.deep';

/**
 * MariaDB refusals that a request caused (an id that names nothing, a value a column cannot hold) become 4xx
 * naming the field, so ids cannot be probed by their 500s. Services check these first; this is the backstop.
 */
export function databaseErrorBody(exception: unknown): ErrorBody | undefined {
  if (typeof exception !== 'object' || exception === null) return undefined;
  const { code, sqlMessage } = exception as { code?: unknown; sqlMessage?: unknown };
  if (typeof code !== 'string') return undefined;
  const text = typeof sqlMessage === 'string' ? sqlMessage : '';
  switch (code) {
    case 'ER_NO_REFERENCED_ROW':
    case 'ER_NO_REFERENCED_ROW_2':
      return fieldBody(HttpStatus.UNPROCESSABLE_ENTITY, /FOREIGN KEY \(`([^`]{1,64})`\)/.exec(text)?.[1], 'names nothing in this workshop', 'reference_not_found');
    case 'ER_ROW_IS_REFERENCED':
    case 'ER_ROW_IS_REFERENCED_2':
      return { statusCode: HttpStatus.CONFLICT, message: 'Other records still refer to this one', code: 'still_referenced' };
    case 'ER_DUP_ENTRY':
      return { statusCode: HttpStatus.CONFLICT, message: 'That already exists', code: 'duplicate' };
    case 'ER_DATA_TOO_LONG':
      return fieldBody(HttpStatus.BAD_REQUEST, columnOf(text), 'is too long', 'value_too_long');
    case 'ER_WARN_DATA_OUT_OF_RANGE':
      return fieldBody(HttpStatus.BAD_REQUEST, columnOf(text), 'is out of range', 'value_out_of_range');
    case 'ER_TRUNCATED_WRONG_VALUE':
    case 'ER_TRUNCATED_WRONG_VALUE_FOR_FIELD':
    case 'ER_WRONG_VALUE_FOR_TYPE':
    case 'ER_BAD_NULL_ERROR':
      return fieldBody(HttpStatus.BAD_REQUEST, columnOf(text), 'is not a value this field can hold', 'value_invalid');
    default:
      return undefined;
  }
}

function columnOf(sqlMessage: string): string | undefined {
  return /column '([^']{1,64})'/.exec(sqlMessage)?.[1];
}

function fieldBody(statusCode: number, column: string | undefined, problem: string, code: string): ErrorBody {
  if (!column) return { statusCode, message: `A value ${problem}`, code };
  const field = column.replace(/_([a-z0-9])/g, (_match, letter: string) => letter.toUpperCase());
  const sentence = `${field} ${problem}`;
  return { statusCode, message: sentence, errors: { [field]: sentence }, code };
}

function describeBytes(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${Math.round((bytes / (1024 * 1024)) * 10) / 10} MB` : `${Math.round(bytes / 1024)} kB`;
}

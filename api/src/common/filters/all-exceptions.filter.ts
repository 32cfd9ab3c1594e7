import { ArgumentsHost, Catch, ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { Response } from 'express';
import { EngineError } from '../../engine/engine-error';
import { databaseUnavailableBody } from './database-unavailable';
import { queueUnavailableBody } from './queue-unavailable';
import { bodyParserErrorBody, databaseErrorBody, type ErrorBody } from './request-errors';

/** Shapes every error as JSON `{ statusCode, message, ... }`; unexpected errors are logged, never leaked. */
@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const body = this.toBody(exception);
    if (body.statusCode === HttpStatus.SERVICE_UNAVAILABLE) {
      // A dependency is down: expected while it is, reported by health; one line each, not a stack trace.
      this.logger.warn(`${String(body.code ?? 'unavailable')}: ${exception instanceof Error ? exception.message : String(exception)}`);
    } else if (body.statusCode >= 500) {
      this.logger.error(exception instanceof Error ? (exception.stack ?? exception.message) : String(exception));
    } else if (databaseErrorBody(exception)) {
      // A service let the database find a bad reference or value: answered 4xx, but the check belongs in the service.
      this.logger.warn(`database refused input: ${exception instanceof Error ? exception.message : String(exception)}`);
    }
    response.status(body.statusCode).json(body);
  }

  private toBody(exception: unknown): ErrorBody {
    if (exception instanceof HttpException) {
      const payload = exception.getResponse();
      if (typeof payload === 'string') return { statusCode: exception.getStatus(), message: payload };
      const { message = exception.message, ...details } = payload as Partial<ErrorBody>;
      return { ...details, statusCode: exception.getStatus(), message };
    }
    if (exception instanceof EngineError) {
      // Input the engine could read but not accept (a bad line in a file) is 422; a bad request parameter is 400.
      const statusCode = exception.line === undefined ? HttpStatus.BAD_REQUEST : HttpStatus.UNPROCESSABLE_ENTITY;
      const body: ErrorBody = { statusCode, message: exception.message, code: exception.code };
      if (exception.line !== undefined) body.line = exception.line;
      return body;
    }
    return (
      bodyParserErrorBody(exception) ??
      databaseUnavailableBody(exception) ??
      queueUnavailableBody(exception) ??
      databaseErrorBody(exception) ?? { statusCode: HttpStatus.INTERNAL_SERVER_ERROR, message: 'Internal server error' }
    );
  }
}

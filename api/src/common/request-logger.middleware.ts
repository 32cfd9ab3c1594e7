import { Injectable, Logger, NestMiddleware } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';

/** One line per request: method, path (no query string, which may carry tokens), status, time. */
@Injectable()
export class RequestLoggerMiddleware implements NestMiddleware {
  private readonly logger = new Logger('HTTP');

  use(request: Request, response: Response, next: NextFunction): void {
    const started = process.hrtime.bigint();
    response.on('finish', () => {
      const ms = Number(process.hrtime.bigint() - started) / 1e6;
      const path = request.originalUrl.split('?')[0];
      this.logger.log(`${request.method} ${path} ${response.statusCode} ${ms.toFixed(1)} ms`);
    });
    next();
  }
}

import { CallHandler, ExecutionContext, Injectable, NestInterceptor, StreamableFile } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Response } from 'express';
import { map, type Observable } from 'rxjs';
import { ACCESS_RULE, type AccessRule } from '../decorators/access.decorator';
import type { AccessRequest } from '../types/access-context';

export const NO_STORE = 'no-store';

/** A presigned S3 link (SigV4 or the older query signature): private, and it expires. */
const PRESIGNED_URL = /X-Amz-Signature=|[?&]Signature=/;

/**
 * Answers that no browser or proxy may keep (RFC 9111 `no-store`): everything answered to a signed-in
 * caller or on a route that needs one (member lists, e-mail addresses, drafts), anything that sets a cookie,
 * and anything carrying a presigned storage link. A public read by an anonymous caller keeps whatever
 * policy its route sets (e.g. `@Header('Cache-Control', 'public, max-age=60')`), as does a public route
 * that declares one for signed-in readers too, since its answer is the same for everyone.
 */
@Injectable()
export class NoStoreInterceptor implements NestInterceptor {
  constructor(private readonly reflector: Reflector) {}

  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    if (context.getType() !== 'http') return next.handle();
    const http = context.switchToHttp();
    const request = http.getRequest<AccessRequest>();
    const response = http.getResponse<Response>();
    const rule = this.reflector.getAllAndOverride<AccessRule | undefined>(ACCESS_RULE, [context.getHandler(), context.getClass()]);
    const isPublicRoute = rule === 'public';
    // Route-level @Header values are already on the response here; on a public route they stand.
    if (!isPublicRoute || (request.user && !response.hasHeader('Cache-Control'))) response.setHeader('Cache-Control', NO_STORE);
    return next.handle().pipe(
      map((body: unknown) => {
        if (!response.headersSent && (response.hasHeader('Set-Cookie') || carriesPresignedUrl(body))) {
          response.setHeader('Cache-Control', NO_STORE);
        }
        return body;
      }),
    );
  }
}

export function carriesPresignedUrl(body: unknown): boolean {
  if (body === undefined || body === null || body instanceof StreamableFile || Buffer.isBuffer(body)) return false;
  const text = typeof body === 'string' ? body : JSON.stringify(body);
  return typeof text === 'string' && PRESIGNED_URL.test(text);
}

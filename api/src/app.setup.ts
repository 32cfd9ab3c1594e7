import { Logger, ValidationPipe } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { Reflector } from '@nestjs/core';
import { NestExpressApplication } from '@nestjs/platform-express';
import { SwaggerModule } from '@nestjs/swagger';
import compression from 'compression';
import cookieParser from 'cookie-parser';
import expressStaticGzip from 'express-static-gzip';
import type { IncomingMessage } from 'node:http';
import type { NextFunction, Request, Response } from 'express';
import { existsSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import helmet from 'helmet';
import { AppConfig } from './config/app-config';
import { AllExceptionsFilter } from './common/filters/all-exceptions.filter';
import { JSON_TOO_DEEP } from './common/filters/request-errors';
import { jsonNestingExceeds } from './common/http/json-depth';
import { NoStoreInterceptor } from './common/interceptors/no-store.interceptor';
import { RejectControlCharactersPipe } from './common/pipes/control-characters';
import { ObjectBodyPipe } from './common/pipes/object-body.pipe';
import { validationException } from './common/pipes/validation-errors';
import { buildOpenApiDocument } from './openapi/openapi-document';
import { PublicPageShellService } from './guides/public-page-shell.service';
import { PAGE_SHELL_SCRIPT_SOURCE, shellPageOf, withPageShell } from './guides/public-page-shell';

/** Everything main.ts and the e2e tests share, so tests exercise the app as it is served. */
export function configureApp(app: NestExpressApplication): void {
  const config = app.get<ConfigService<AppConfig, true>>(ConfigService);
  const storage = config.get('storage', { infer: true });
  const storageOrigin = storage.publicEndpoint ? new URL(storage.publicEndpoint).origin : 'https:';

  app.setGlobalPrefix('api');
  app.enableShutdownHooks();
  app.disable('x-powered-by');
  // Trust X-Forwarded-For only from configured proxies (TRUST_PROXY; default nobody), or clients pick their own address.
  app.set('trust proxy', config.get('trustProxy', { infer: true }));
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // The one inline script: the page shell's loader, which starts the studio's code after the first paint.
          'script-src': ["'self'", PAGE_SHELL_SCRIPT_SOURCE],
          // Browsers upload to and play from storage directly with presigned URLs.
          'connect-src': ["'self'", storageOrigin],
          'media-src': ["'self'", storageOrigin, 'blob:'],
          'img-src': ["'self'", 'data:', 'blob:', storageOrigin],
          // Helmet's default upgrades http links to https; a plain-http storage (the local S3 fake) must stay http,
          // or the redirects of the public guide media to it are blocked.
          'upgrade-insecure-requests': storageOrigin.startsWith('http:') ? null : [],
        },
      },
    }),
  );
  app.use(cookieParser());
  // JSON answers over 1 kB are compressed (a 3,000-cue transcript is ~10× smaller); files already
  // compressed at build time pass through untouched.
  app.use(compression({ threshold: 1024 }));
  // Pasted transcripts run to 2 MB (JSON-escaped, a little more); Express's default JSON limit is 100 kB.
  app.useBodyParser('json', { limit: '5mb', verify: refuseDeepJson });
  app.useGlobalPipes(
    new ObjectBodyPipe(),
    new RejectControlCharactersPipe(),
    new ValidationPipe({
      whitelist: true,
      forbidNonWhitelisted: true,
      transform: true,
      // Adds `errors: { field: sentence }` beside the usual `message` list, for forms.
      exceptionFactory: validationException,
    }),
  );
  app.useGlobalFilters(new AllExceptionsFilter());
  app.useGlobalInterceptors(new NoStoreInterceptor(app.get(Reflector)));

  SwaggerModule.setup('api/docs', app, buildOpenApiDocument(app), { jsonDocumentUrl: 'api/docs/openapi.json' });

  const studioDist = config.get('studioDist', { infer: true });
  if (studioDist && existsSync(join(studioDist, 'index.html'))) serveStudio(app, studioDist);
}

/** No request of ours nests deeper than a few levels; a hostile one is refused before parsing and validation recurse into it. */
const MAX_JSON_DEPTH = 32;

function refuseDeepJson(_request: IncomingMessage, _response: unknown, body: Buffer): void {
  if (jsonNestingExceeds(body, MAX_JSON_DEPTH)) {
    throw Object.assign(new Error(`The request body nests deeper than ${MAX_JSON_DEPTH} levels`), { status: 400, type: JSON_TOO_DEEP });
  }
}

/** The page's path is ours, not the request's: a build under a dot-folder (a benchmark's .data/…) is served too. */
const SEND_INDEX = { dotfiles: 'allow' } as const;

/** Serves the built single-page studio; any non-API GET that is not a file gets index.html. */
function serveStudio(app: NestExpressApplication, dist: string): void {
  // The build writes .br and .gz beside each asset (vite.config.ts); the smallest the browser accepts is sent.
  // Names under assets/ carry a content hash, so they never change and may be cached for a year.
  const assets = expressStaticGzip(dist, {
    index: false,
    enableBrotli: true,
    orderPreference: ['br', 'gzip'],
    serveStatic: {
      setHeaders: (response, path) => {
        const hashed = path.startsWith(join(dist, 'assets'));
        response.setHeader('Cache-Control', hashed ? 'public, max-age=31536000, immutable' : 'public, max-age=3600');
      },
    },
  });
  // API requests never name a file: they skip the file lookup (a stat on the thread pool for every API call).
  app.use((request: Request, response: Response, next: NextFunction) => (request.path.startsWith('/api/') ? next() : assets(request, response, next)));
  const indexHtml = join(dist, 'index.html');
  const shells = app.get(PublicPageShellService, { strict: false });
  const logger = new Logger('StudioPages');
  app.use((request: Request, response: Response, next: NextFunction) => {
    const isPageRequest = request.method === 'GET' && !request.path.startsWith('/api');
    if (!isPageRequest) return next();
    response.setHeader('Cache-Control', 'no-cache');
    const page = shellPageOf(request.path, request.query);
    if (!page) return response.sendFile(indexHtml, SEND_INDEX);
    // A public guide page arrives with its title, cautions and poster drawn, before the JavaScript.
    void Promise.all([shells.shellFor(page), readFile(indexHtml, 'utf8')]).then(
      ([shell, html]) => (shell ? response.type('html').send(withPageShell(html, shell)) : response.sendFile(indexHtml, SEND_INDEX)),
      (error: unknown) => {
        // The shell is an extra: without it (Redis or the database away) the page still loads and says what is wrong.
        logger.warn(`No page shell for ${request.path}: ${error instanceof Error ? error.message : String(error)}`);
        response.sendFile(indexHtml, SEND_INDEX);
      },
    );
  });
}

import {
  applyDecorators,
  BadRequestException,
  CallHandler,
  ExecutionContext,
  Injectable,
  mixin,
  NestInterceptor,
  PayloadTooLargeException,
  Type,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBody, ApiConsumes } from '@nestjs/swagger';
import { catchError, Observable, throwError } from 'rxjs';

export interface SingleFileUploadOptions {
  /** Largest accepted file, bytes; the upload stops there. */
  maxBytes: number;
  /** What the file is, for messages: "The logo", "The photo". */
  what: string;
  /** What to send, for the wrong-field message: "one image". */
  expected: string;
  /** Text fields sent beside the file, for the OpenAPI description (validate them with a DTO). */
  textFields?: Record<string, { type: 'string'; enum?: string[] }>;
}

/** A size limit in words: limits are set as round binary (2 × 1024²) or decimal (2 000 000) megabytes. */
export function megabytes(bytes: number): string {
  const binary = bytes / (1024 * 1024);
  const decimal = bytes / 1_000_000;
  const round = Number.isInteger(binary) ? binary : Number.isInteger(decimal) ? decimal : Math.round(binary * 10) / 10;
  return `${round} MB`;
}

/** Puts multer's terse upload errors ("File too large", "Unexpected field") into words a person can act on. */
function friendlyUploadErrors(field: string, options: SingleFileUploadOptions): Type<NestInterceptor> {
  @Injectable()
  class FriendlyUploadErrorsInterceptor implements NestInterceptor {
    intercept(_context: ExecutionContext, next: CallHandler): Observable<unknown> {
      return next.handle().pipe(
        catchError((error: unknown) => {
          if (error instanceof PayloadTooLargeException) {
            const limit = megabytes(options.maxBytes);
            return throwError(
              () => new PayloadTooLargeException({ message: `${options.what} must be ${limit} or smaller`, errors: { [field]: `At most ${limit}` } }),
            );
          }
          if (error instanceof BadRequestException && /Unexpected (file )?field|Too many files/u.test(error.message)) {
            return throwError(
              () => new BadRequestException({ message: `Send ${options.expected} in the "${field}" field`, errors: { [field]: options.expected } }),
            );
          }
          return throwError(() => error);
        }),
      );
    }
  }
  return mixin(FriendlyUploadErrorsInterceptor);
}

/** One file in a multipart form field, held in memory up to `maxBytes`, with readable errors and its OpenAPI shape. */
export function SingleFileUpload(field: string, options: SingleFileUploadOptions) {
  return applyDecorators(
    UseInterceptors(
      friendlyUploadErrors(field, options),
      FileInterceptor(field, { limits: { fileSize: options.maxBytes, files: 1, fields: 10 } }),
    ),
    ApiConsumes('multipart/form-data'),
    ApiBody({
      schema: {
        type: 'object',
        properties: { [field]: { type: 'string', format: 'binary' }, ...options.textFields },
        required: [field],
      },
    }),
  );
}

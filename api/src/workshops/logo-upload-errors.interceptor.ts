import {
  BadRequestException,
  CallHandler,
  ExecutionContext,
  Injectable,
  NestInterceptor,
  PayloadTooLargeException,
} from '@nestjs/common';
import { catchError, Observable, throwError } from 'rxjs';

/** Puts multer's terse upload errors ("File too large", "Unexpected field") into the studio's words. */
@Injectable()
export class LogoUploadErrorsInterceptor implements NestInterceptor {
  intercept(_context: ExecutionContext, next: CallHandler): Observable<unknown> {
    return next.handle().pipe(
      catchError((error: unknown) => {
        if (error instanceof PayloadTooLargeException) {
          return throwError(
            () => new PayloadTooLargeException({ message: 'The logo must be 2 MB or smaller', errors: { logo: 'At most 2 MB' } }),
          );
        }
        if (error instanceof BadRequestException && /Unexpected field|Too many files/.test(error.message)) {
          return throwError(
            () => new BadRequestException({ message: 'Send one image in the "logo" field', errors: { logo: 'One image file' } }),
          );
        }
        return throwError(() => error);
      }),
    );
  }
}

import {
  BadRequestException,
  CallHandler,
  ExecutionContext,
  Injectable,
  NestInterceptor,
  PayloadTooLargeException,
} from '@nestjs/common';
import { catchError, Observable, throwError } from 'rxjs';

/** Puts multer's terse upload errors ("File too large", "Unexpected field") into words for the creator. */
@Injectable()
export class TranscriptUploadErrorsInterceptor implements NestInterceptor {
  intercept(_context: ExecutionContext, next: CallHandler): Observable<unknown> {
    return next.handle().pipe(
      catchError((error: unknown) => {
        if (error instanceof PayloadTooLargeException) {
          return throwError(() => new PayloadTooLargeException('The transcript file must be 2 MB or smaller'));
        }
        if (error instanceof BadRequestException && /Unexpected (file )?field|Too many files/u.test(error.message)) {
          return throwError(() => new BadRequestException('Send one transcript file in the "file" field'));
        }
        return throwError(() => error);
      }),
    );
  }
}

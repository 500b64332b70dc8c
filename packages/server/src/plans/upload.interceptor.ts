import {
  mixin,
  PayloadTooLargeException,
  type CallHandler,
  type ExecutionContext,
  type NestInterceptor,
  type Type,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import type { Observable } from 'rxjs';
import { FileTooLargeError } from './plans.errors';

/**
 * The one file of a multipart form, field `file`, held in memory up to `maxBytes`: the parser stops
 * reading at the limit, and the person is told the limit rather than "File too large".
 */
export function SingleFileUpload(what: 'drawing' | 'attachment', maxBytes: number): Type<NestInterceptor> {
  const Parser = FileInterceptor('file', {
    limits: { fileSize: maxBytes, files: 1 },
    // Browsers send file names as UTF-8; busboy's default would read them as Latin-1.
    defParamCharset: 'utf8',
  });
  class SingleFileUploadInterceptor implements NestInterceptor {
    private readonly parser = new Parser();

    async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
      try {
        return await this.parser.intercept(context, next);
      } catch (error) {
        if (error instanceof PayloadTooLargeException) throw new FileTooLargeError(what, maxBytes);
        throw error;
      }
    }
  }
  return mixin(SingleFileUploadInterceptor);
}

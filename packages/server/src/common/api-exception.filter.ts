import { ArgumentsHost, Catch, ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { Response } from 'express';
import type { ApiErrorDto } from './api-error.dto';
import { DomainError, type DomainErrorKind } from './domain-error';

const STATUS_OF_KIND: Record<DomainErrorKind, number> = {
  invalid: HttpStatus.BAD_REQUEST,
  unauthenticated: HttpStatus.UNAUTHORIZED,
  forbidden: HttpStatus.FORBIDDEN,
  not_found: HttpStatus.NOT_FOUND,
  conflict: HttpStatus.CONFLICT,
};

const CODE_OF_STATUS: Record<number, string> = {
  400: 'bad_request',
  401: 'unauthenticated',
  403: 'forbidden',
  404: 'not_found',
  405: 'method_not_allowed',
  409: 'conflict',
  413: 'payload_too_large',
  415: 'unsupported_media_type',
  429: 'rate_limited',
};

interface HttpExceptionBody {
  message?: string | string[];
  code?: string;
}

/** The error body for anything thrown while handling a request. Exported for its unit spec. */
export function errorBodyOf(exception: unknown): ApiErrorDto {
  if (exception instanceof DomainError) {
    return {
      statusCode: STATUS_OF_KIND[exception.kind],
      code: exception.code,
      message: exception.message,
      ...(exception.details === undefined ? {} : { details: exception.details }),
    };
  }
  if (exception instanceof HttpException) {
    const statusCode = exception.getStatus();
    const raw = exception.getResponse();
    const body: HttpExceptionBody = typeof raw === 'string' ? { message: raw } : (raw as HttpExceptionBody);
    // The ValidationPipe reports every failed constraint as a list of messages.
    if (Array.isArray(body.message)) {
      return { statusCode, code: 'validation_failed', message: 'The request is not valid.', details: body.message };
    }
    return {
      statusCode,
      code: body.code ?? CODE_OF_STATUS[statusCode] ?? (statusCode >= 500 ? 'internal_error' : 'http_error'),
      message: body.message ?? exception.message,
    };
  }
  return { statusCode: 500, code: 'internal_error', message: 'Something went wrong on our side.' };
}

/** Every error leaves the API as `{ statusCode, code, message, details? }`. */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('ApiExceptionFilter');

  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const body = errorBodyOf(exception);
    if (body.statusCode >= 500) {
      this.logger.error(exception instanceof Error ? (exception.stack ?? exception.message) : String(exception));
    }
    if (response.headersSent) return;
    response.status(body.statusCode).json(body);
  }
}

import type { ApiErrorBody } from '@hopwise/common';
import {
  Catch,
  HttpException,
  Logger,
  type ArgumentsHost,
  type ExceptionFilter,
} from '@nestjs/common';
import type { Response } from 'express';
import { errorBody } from './api-error.js';

interface BodyParserError extends Error {
  type?: string;
  status?: number;
  statusCode?: number;
  expose?: boolean;
}

const GENERIC_500 = 'Internal server error';

function fromHttpException(ex: HttpException): ApiErrorBody {
  const statusCode = ex.getStatus();
  const res = ex.getResponse();
  if (typeof res === 'string') return errorBody(statusCode, res);
  const r = res as Partial<ApiErrorBody> & { message?: unknown };
  const message = Array.isArray(r.message)
    ? r.message.join('; ')
    : typeof r.message === 'string'
      ? r.message
      : ex.message;
  return errorBody(statusCode, message, r.fields);
}

function bodyParserError(err: unknown): ApiErrorBody | undefined {
  const e = err as BodyParserError | undefined;
  if (!e || typeof e !== 'object' || typeof e.type !== 'string') return undefined;
  if (e.type === 'entity.parse.failed') return errorBody(400, 'Malformed JSON body');
  if (e.type === 'entity.too.large') return errorBody(413, 'Request body too large');
  const status = e.status ?? e.statusCode;
  if (status && status >= 400 && status < 500) {
    return errorBody(status, e.expose && e.message ? e.message : 'Unreadable request body');
  }
  return undefined;
}

/** Messages that replace terse framework defaults. */
function friendlier(body: ApiErrorBody): ApiErrorBody {
  if (body.statusCode === 429) {
    return { ...body, message: 'Too many requests; wait a minute and try again' };
  }
  return body;
}

/**
 * Renders every error in the one error shape `{ statusCode, error, message, fields? }`.
 * Never sends a stack trace; unexpected errors are logged here and answered with a generic 500.
 */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const res = host.switchToHttp().getResponse<Response>();
    const body = this.toBody(exception);
    if (res.headersSent) return;
    res.status(body.statusCode).json(body);
  }

  toBody(exception: unknown): ApiErrorBody {
    // body-parser errors (raised before any route) carry a `type`; Nest's express adapter wraps
    // them in an HttpException with the original as `cause`.
    const parserError = bodyParserError(
      exception instanceof HttpException ? exception.cause : exception,
    );
    if (parserError) return parserError;
    if (exception instanceof HttpException) return friendlier(fromHttpException(exception));

    this.logger.error(
      exception instanceof Error ? (exception.stack ?? exception.message) : String(exception),
    );
    return errorBody(500, GENERIC_500);
  }
}

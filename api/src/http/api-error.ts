import type { ApiErrorBody } from '@hopwise/common';
import { HttpException, HttpStatus } from '@nestjs/common';

/** Reason phrases for the `error` field of the one error shape. */
const REASON: Record<number, string> = {
  400: 'Bad Request',
  401: 'Unauthorized',
  403: 'Forbidden',
  404: 'Not Found',
  405: 'Method Not Allowed',
  409: 'Conflict',
  413: 'Payload Too Large',
  415: 'Unsupported Media Type',
  422: 'Unprocessable Entity',
  423: 'Locked',
  429: 'Too Many Requests',
  500: 'Internal Server Error',
  503: 'Service Unavailable',
};

export function reasonPhrase(statusCode: number): string {
  return REASON[statusCode] ?? (statusCode >= 500 ? 'Server Error' : 'Error');
}

export function errorBody(
  statusCode: number,
  message: string,
  fields?: Record<string, string>,
): ApiErrorBody {
  const body: ApiErrorBody = { statusCode, error: reasonPhrase(statusCode), message };
  if (fields && Object.keys(fields).length > 0) body.fields = fields;
  return body;
}

/**
 * An HttpException whose response already is the one error shape. Services throw these
 * (or plain Nest exceptions, which the filter normalises).
 */
export class ApiException extends HttpException {
  constructor(statusCode: number, message: string, fields?: Record<string, string>) {
    super(errorBody(statusCode, message, fields), statusCode);
  }
}

export const badRequest = (message: string, fields?: Record<string, string>) =>
  new ApiException(HttpStatus.BAD_REQUEST, message, fields);

import type { UploadFormat, UploadRowError } from '@hopwise/common';
import {
  BadRequestException,
  Catch,
  HttpException,
  Injectable,
  PayloadTooLargeException,
  UseFilters,
  UseInterceptors,
  applyDecorators,
  type ArgumentsHost,
  type CallHandler,
  type ExceptionFilter,
  type ExecutionContext,
  type NestInterceptor,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import type { Request, Response } from 'express';
import { catchError, type Observable } from 'rxjs';
import { ApiException, reasonPhrase } from '../../http/api-error.js';

/** Largest accepted upload: 2 MB (about 20 000 rows of two numbers, with room to spare). */
export const UPLOAD_MAX_BYTES = 2 * 1024 * 1024;
const UPLOAD_MAX_LABEL = '2 MB';

/** The uploaded file as multer's memory storage hands it over. */
export interface UploadedFileLike {
  originalname: string;
  mimetype: string;
  size: number;
  buffer: Buffer;
}

/** One bad row of an upload, as answered in the 400 body. */
export interface UploadRowDto {
  row: number;
  line: number | null;
  column: string | null;
  reason: string;
  detail: string;
}

/** 400 listing every bad row: `{ statusCode, error, message, rows }`; nothing is stored. */
export class UploadRowsException extends HttpException {
  constructor(
    message: string,
    readonly rows: UploadRowError[],
  ) {
    super({ statusCode: 400, error: reasonPhrase(400), message, rows }, 400);
  }
}

/** Renders UploadRowsException with its `rows` (the global filter knows only `fields`). */
@Catch(UploadRowsException)
export class UploadRowsFilter implements ExceptionFilter {
  catch(exception: UploadRowsException, host: ArgumentsHost): void {
    const res = host.switchToHttp().getResponse<Response>();
    if (res.headersSent) return;
    res.status(400).json({
      statusCode: 400,
      error: reasonPhrase(400),
      message: exception.message,
      rows: exception.rows,
    });
  }
}

/** Turns multer's terse errors into the one error shape with plain messages naming `file`. */
@Injectable()
export class UploadErrorsInterceptor implements NestInterceptor {
  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    const req = context.switchToHttp().getRequest<Request>();
    if (!(req.headers['content-type'] ?? '').toLowerCase().startsWith('multipart/form-data')) {
      throw new ApiException(
        415,
        'send the file as multipart/form-data in the field "file" (CSV or JSON)',
        { file: 'expected a multipart/form-data upload' },
      );
    }
    return next.handle().pipe(
      catchError((err: unknown) => {
        if (err instanceof PayloadTooLargeException) {
          throw new ApiException(
            413,
            `file: larger than the ${UPLOAD_MAX_LABEL} upload limit; split it or thin the rows`,
            { file: `at most ${UPLOAD_MAX_LABEL}` },
          );
        }
        if (err instanceof BadRequestException && !(err instanceof ApiException)) {
          throw new ApiException(400, `file: ${err.message}; send one file in the field "file"`, {
            file: err.message,
          });
        }
        throw err;
      }),
    );
  }
}

/** Route decorator: one file in field `file`, in memory, at most 2 MB, errors in our shape. */
export function AcceptUpload(): MethodDecorator {
  return applyDecorators(
    UseFilters(UploadRowsFilter),
    UseInterceptors(
      UploadErrorsInterceptor,
      FileInterceptor('file', {
        limits: { fileSize: UPLOAD_MAX_BYTES, files: 1, fields: 20 },
      }),
    ),
  );
}

const CSV_TYPES = ['text/csv', 'application/csv', 'text/comma-separated-values'];
const JSON_TYPES = ['application/json', 'text/json'];
const NEUTRAL_TYPES = ['text/plain', 'application/octet-stream', ''];

/**
 * CSV or JSON from the file name's extension, else from the content type; 415 otherwise, and
 * for content that is not text (NUL bytes or invalid UTF-8).
 */
export function uploadedText(file: UploadedFileLike | undefined): {
  text: string;
  format: UploadFormat;
} {
  if (!file) {
    throw new ApiException(400, 'file is required: send it in the multipart field "file"', {
      file: 'is required',
    });
  }
  const name = file.originalname.toLowerCase();
  const type = file.mimetype.toLowerCase().split(';')[0].trim();
  let format: UploadFormat | undefined;
  if (name.endsWith('.csv')) format = 'csv';
  else if (name.endsWith('.json')) format = 'json';
  else if (CSV_TYPES.includes(type)) format = 'csv';
  else if (JSON_TYPES.includes(type)) format = 'json';
  else if (name.endsWith('.txt') && NEUTRAL_TYPES.includes(type)) format = 'csv';
  if (!format) {
    throw new ApiException(
      415,
      `file: '${file.originalname}' (${type || 'no type'}) is neither CSV (.csv) nor JSON (.json)`,
      { file: 'must be a .csv or .json file' },
    );
  }
  if (file.buffer.includes(0)) {
    throw new ApiException(415, `file: '${file.originalname}' is not a text file`, {
      file: 'must be UTF-8 text',
    });
  }
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(file.buffer);
  } catch {
    throw new ApiException(415, `file: '${file.originalname}' is not UTF-8 text`, {
      file: 'must be UTF-8 text',
    });
  }
  return { text, format };
}

/** File name without its extension, for a default record name. */
export function baseName(fileName: string): string {
  const base = fileName.replace(/^.*[\\/]/, '').replace(/\.[^.]+$/, '');
  return (base.trim() || 'upload').slice(0, 120);
}

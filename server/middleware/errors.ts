import type { ErrorRequestHandler, RequestHandler } from 'express';
import multer from 'multer';
import { ZodError } from 'zod';
import { AppError } from '../errors';
import type { Logger } from '../lib/logger';
import { zodFields } from './validate';

export const notFoundHandler: RequestHandler = (req, _res, next) => {
  next(new AppError(404, 'not-found', `No route for ${req.method} ${req.path}`));
};

/** Plain words per status for errors raised below our code (body parser, static files, busboy). */
const generic: Record<number, [string, string]> = {
  400: ['bad-request', 'The request could not be read'],
  404: ['not-found', 'Not found'],
  405: ['method-not-allowed', 'That method is not allowed here'],
  413: ['body-too-large', 'The request body is too large'],
  415: ['unsupported-media-type', 'That content type is not accepted here'],
};

const multerMessages: Partial<Record<multer.MulterError['code'], string>> = {
  LIMIT_PART_COUNT: 'The form has too many parts',
  LIMIT_FILE_COUNT: 'Send one file, in the field "file"',
  LIMIT_UNEXPECTED_FILE: 'Send one file, in the field "file"',
  LIMIT_FIELD_KEY: 'A form field name is too long',
  LIMIT_FIELD_VALUE: 'A form field is too long',
  LIMIT_FIELD_COUNT: 'The form has too many fields',
};

/**
 * The one place where errors become responses. Only our own words reach the client: an error
 * raised by a library keeps its message (which may hold a file path or a query) in the log.
 */
export function errorHandler(opts: { log: Logger }): ErrorRequestHandler {
  return (err, req, res, _next) => {
    const send = (status: number, code: string, message: string, fields?: Record<string, string>) =>
      res.status(status).json({ error: { code, message, ...(fields ? { fields } : {}) } });

    if (err instanceof AppError) return send(err.status, err.code, err.message, err.fields);
    if (err instanceof ZodError)
      return send(400, 'invalid-input', 'Some fields need attention', zodFields(err));
    if (err instanceof multer.MulterError) {
      if (err.code === 'LIMIT_FILE_SIZE')
        return send(413, 'file-too-large', 'The file is larger than allowed');
      return send(400, 'bad-upload', multerMessages[err.code] ?? 'The upload could not be read');
    }
    const e = err as { type?: string; status?: number; statusCode?: number; code?: string };
    if (e.type === 'entity.parse.failed')
      return send(400, 'malformed-json', 'The request body is not valid JSON');
    if (e.type === 'entity.too.large')
      return send(413, 'body-too-large', 'The request body is too large');
    if (e.code === 'EBADCSRFTOKEN')
      return send(
        403,
        'csrf-invalid',
        'The form expired or came from elsewhere: reload and try again',
      );
    const status = e.status ?? e.statusCode;
    if (typeof status === 'number' && status >= 400 && status < 500) {
      const [code, message] = generic[status] ?? ['bad-request', 'The request could not be served'];
      return send(status, code, message);
    }

    opts.log.error(`Unexpected error on ${req.method} ${req.path}`, err);
    return send(500, 'internal', 'Something went wrong on our side');
  };
}

import type { ErrorRequestHandler, RequestHandler } from 'express';
import multer from 'multer';
import { ZodError } from 'zod';
import { AppError } from '../errors';
import { zodFields } from './validate';

export const notFoundHandler: RequestHandler = (req, _res, next) => {
  next(new AppError(404, 'not-found', `No route for ${req.method} ${req.path}`));
};

/** The one place where errors become responses. */
export function errorHandler(opts: {
  production: boolean;
  log?: (err: unknown) => void;
}): ErrorRequestHandler {
  const log = opts.log ?? ((err) => console.error(err));
  return (err, _req, res, _next) => {
    const send = (status: number, code: string, message: string, fields?: Record<string, string>) =>
      res.status(status).json({ error: { code, message, ...(fields ? { fields } : {}) } });

    if (err instanceof AppError) return send(err.status, err.code, err.message, err.fields);
    if (err instanceof ZodError)
      return send(400, 'invalid-input', 'Some fields need attention', zodFields(err));
    if (err instanceof multer.MulterError) {
      if (err.code === 'LIMIT_FILE_SIZE')
        return send(413, 'file-too-large', 'The file is larger than allowed');
      return send(400, 'bad-upload', err.message);
    }
    const e = err as { type?: string; status?: number; code?: string; message?: string };
    if (e.type === 'entity.parse.failed')
      return send(400, 'malformed-json', 'The request body is not valid JSON');
    if (e.type === 'entity.too.large')
      return send(413, 'body-too-large', 'The request body is too large');
    if (e.code === 'EBADCSRFTOKEN' || e.message === 'invalid csrf token')
      return send(
        403,
        'csrf-invalid',
        'The form expired or came from elsewhere: reload and try again',
      );
    if (typeof e.status === 'number' && e.status >= 400 && e.status < 500)
      return send(e.status, 'bad-request', e.message ?? 'Bad request');

    log(err);
    return send(
      500,
      'internal',
      opts.production ? 'Something went wrong on our side' : String(e.message ?? err),
    );
  };
}

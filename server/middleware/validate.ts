import type { RequestHandler } from 'express';
import type { ZodError, ZodType } from 'zod';
import { AppError } from '../errors';

export function zodFields(err: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of err.issues) {
    const key = issue.path.join('.') || '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

interface Schemas {
  body?: ZodType;
  query?: ZodType;
  params?: ZodType;
}

/**
 * What a route reads from the request, as its middleware says (read by tests/api/route-table.ts
 * to fuzz every route that takes a body or a query): `body: 'json'` from `validate({ body })`,
 * `'multipart'` from an upload receiver.
 */
export interface ReadsTag {
  body?: 'json' | 'multipart';
  query?: boolean;
  params?: boolean;
}

/** Mark an upload receiver (multer) as reading a multipart body. */
export const readsMultipart = <T extends RequestHandler>(fn: T) =>
  Object.assign(fn, { reads: { body: 'multipart' } satisfies ReadsTag });

/** Parse body, query and params; parsed values land in `res.locals.body/query/params`. */
export function validate(schemas: Schemas): RequestHandler {
  const check: RequestHandler = (req, res, next) => {
    const fields: Record<string, string> = {};
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part];
      if (!schema) continue;
      const result = schema.safeParse(part === 'body' ? (req.body ?? {}) : req[part]);
      if (result.success) res.locals[part] = result.data;
      else Object.assign(fields, zodFields(result.error));
    }
    if (Object.keys(fields).length > 0) {
      return next(new AppError(400, 'invalid-input', 'Some fields need attention', fields));
    }
    next();
  };
  const reads: ReadsTag = {
    ...(schemas.body ? { body: 'json' } : {}),
    query: !!schemas.query,
    params: !!schemas.params,
  };
  return Object.assign(check, { reads });
}

/** The parsed value of a validated part, typed by the caller. */
export const parsed = <T>(
  res: { locals: Record<string, unknown> },
  part: 'body' | 'query' | 'params',
) => res.locals[part] as T;

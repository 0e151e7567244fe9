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

/** Parse body, query and params; parsed values land in `res.locals.body/query/params`. */
export function validate(schemas: Schemas): RequestHandler {
  return (req, res, next) => {
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
}

/** The parsed value of a validated part, typed by the caller. */
export const parsed = <T>(
  res: { locals: Record<string, unknown> },
  part: 'body' | 'query' | 'params',
) => res.locals[part] as T;

import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useState } from 'react';
import {
  useForm,
  type DefaultValues,
  type FieldValues,
  type Path,
  type Resolver,
} from 'react-hook-form';
import type { z } from 'zod';
import { ApiError } from '@/lib/api-client';
import type { RefusedEntry } from '@/lib/field-entries';
import { applyServerErrors } from '@/lib/form-errors';

/** An empty box is "not given" (null); anything else a number, which the schema then checks. */
export const optionalNumber = (v: unknown) => (v === '' || v === null ? null : Number(v));

/** The props of a box for a decimal number (a phone shows its number pad). */
export const decimalInput = { type: 'number', step: 'any', inputMode: 'decimal' } as const;

/** An empty note is no note. */
export const noteOrNull = (note: string | null | undefined) => (note ? note : null);

/**
 * The form that edits a refused entry before it is sent again: checked by the entry's own shared
 * schema, and opened with the server's reason on the fields it names (what no field takes as
 * `formError`).
 */
export function useRefusedForm<T extends FieldValues>(opts: {
  schema: z.ZodType<T, FieldValues>;
  defaults: DefaultValues<T>;
  refused: RefusedEntry;
  fields: readonly Path<T>[];
}) {
  const { schema, defaults, refused, fields } = opts;
  const form = useForm<T>({
    resolver: zodResolver(schema) as unknown as Resolver<T>,
    defaultValues: defaults,
  });
  const [formError, setFormError] = useState<string | null>(null);
  useEffect(() => {
    // The reason itself is shown above the form; here only what no field took.
    const leftOver = applyServerErrors(
      new ApiError(409, refused.code, refused.message, refused.fields),
      form.setError,
      fields,
      () => '',
    );
    setFormError(leftOver || null);
  }, [refused, fields, form.setError]);
  return { form, formError };
}

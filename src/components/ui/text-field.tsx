import type { InputHTMLAttributes, Ref } from 'react';
import { Field, controlClass } from './field';

interface TextFieldProps extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  error?: string;
  hint?: string;
  ref?: Ref<HTMLInputElement>;
}

/** A labelled text input with its hint and error; takes `form.register(name)` spread in. */
export function TextField({ label, error, hint, className, ...input }: TextFieldProps) {
  return (
    <Field label={label} error={error} hint={hint} className={className}>
      {(control) => <input {...control} {...input} className={controlClass} />}
    </Field>
  );
}

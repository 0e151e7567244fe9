import type { ReactElement } from 'react';
import { Field, controlClass } from './field';

export interface SelectOption<T extends string> {
  value: T;
  label: string;
}

/** A list filter as every page offers it: its label, its no-choice option and its choices. */
export interface SelectFilter<T extends string> {
  label: string;
  all: string;
  options: readonly SelectOption<T>[];
}

interface CommonProps<T extends string> {
  label: string;
  options: readonly SelectOption<T>[];
  error?: string;
  className?: string;
}

/** With `all`, a first option that stands for no choice: the value is then undefined. */
interface OptionalProps<T extends string> extends CommonProps<T> {
  all: string;
  value: T | undefined;
  onChange: (value: T | undefined) => void;
}

interface RequiredProps<T extends string> extends CommonProps<T> {
  all?: undefined;
  value: T;
  onChange: (value: T) => void;
}

/** A labelled select over a fixed list of values. */
export function SelectField<T extends string>(props: OptionalProps<T>): ReactElement;
export function SelectField<T extends string>(props: RequiredProps<T>): ReactElement;
export function SelectField<T extends string>(props: OptionalProps<T> | RequiredProps<T>) {
  const { label, options, error, className } = props;
  const pick = (raw: string) => {
    if (props.all === undefined) props.onChange(raw as T);
    else props.onChange((raw || undefined) as T | undefined);
  };
  return (
    <Field label={label} error={error} className={className}>
      {(control) => (
        <select
          {...control}
          value={props.value ?? ''}
          onChange={(e) => pick(e.target.value)}
          className={controlClass}
        >
          {props.all !== undefined && <option value="">{props.all}</option>}
          {options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
      )}
    </Field>
  );
}

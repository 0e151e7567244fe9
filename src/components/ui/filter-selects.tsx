import { SelectField, type SelectFilter } from './select-field';

/** The keys of `F` whose values are strings: those a select can set. */
type StringKeys<F> = {
  [K in keyof F]-?: NonNullable<F[K]> extends string ? K : never;
}[keyof F];

/** Which of a list's filters get a select, and how each reads: `{ status: statusFilter }`. */
export type FilterSelectSpec<F> = {
  [K in StringKeys<F>]?: SelectFilter<NonNullable<F[K]> & string>;
};

/** One select for each filter in `selects`, in order; choosing one sends `{ [key]: value }`. */
export function FilterSelects<F extends object>({
  values,
  selects,
  onChange,
}: {
  values: F;
  selects: FilterSelectSpec<F>;
  onChange: (patch: Partial<F>) => void;
}) {
  const entries = Object.entries(selects) as [keyof F & string, SelectFilter<string>][];
  return entries.map(([key, filter]) => (
    <SelectField
      key={key}
      {...filter}
      value={values[key] as string | undefined}
      onChange={(value) => onChange({ [key]: value } as Partial<F>)}
    />
  ));
}

import { cn } from './cn';
import { controlClass } from './field';

/** The box a tree tag is searched in: an example tag to show the form, and no autofill. */
export function SearchInput({
  id,
  value,
  onChange,
  className,
  'aria-describedby': describedBy,
}: {
  id: string;
  value: string;
  onChange: (value: string) => void;
  className?: string;
  'aria-describedby'?: string;
}) {
  return (
    <input
      id={id}
      type="search"
      value={value}
      onChange={(event) => onChange(event.target.value)}
      placeholder="e.g. 0412"
      autoComplete="off"
      aria-describedby={describedBy}
      className={cn(controlClass, className)}
    />
  );
}

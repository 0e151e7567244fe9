import { useCallback } from 'react';
import { cn } from './cn';
import { FilterSelects, type FilterSelectSpec } from './filter-selects';
import { TagSearch } from './tag-search';

/** The row above a list of trees: the tag search, then a select for each of `selects`. */
export function ListFilterBar<F extends { q?: string }>({
  filters,
  selects,
  onChange,
  className,
}: {
  filters: F;
  selects: FilterSelectSpec<F>;
  /** A new search replaces the URL entry rather than adding one, so typing leaves no trail. */
  onChange: (patch: Partial<F>, options?: { replace?: boolean }) => void;
  className?: string;
}) {
  const onSearch = useCallback(
    (q: string) => onChange({ q } as Partial<F>, { replace: true }),
    [onChange],
  );
  return (
    <div className={cn('mb-4 grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4', className)}>
      <div className="col-span-2 sm:col-span-1">
        <TagSearch value={filters.q ?? ''} onSearch={onSearch} />
      </div>
      <FilterSelects values={filters} selects={selects} onChange={onChange} />
    </div>
  );
}

import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { FilterSelects, type FilterSelectSpec } from '@/components/ui/filter-selects';
import { SearchInput } from '@/components/ui/search-input';
import { verdictFilter, warningFilter } from '@/lib/advice-options';
import { speciesFilter, statusFilter } from '@/lib/tree-options';
import { formatNumber } from '@/lib/units';
import type { MapFilters } from '../lib/map-filters';

const selects: FilterSelectSpec<MapFilters> = {
  species: speciesFilter,
  status: statusFilter,
  verdict: { ...verdictFilter, label: 'Advice', all: 'All advice' },
  warning: warningFilter,
};

interface MapToolbarProps {
  filters: MapFilters;
  onFilters: (patch: Partial<MapFilters>) => void;
  /** Returns false when no tree carries that tag. */
  onFind: (tag: string) => boolean;
  onStep: (direction: 1 | -1) => void;
  position: { index: number; count: number };
}

/** Finding a tree, narrowing the map down, and stepping from tree to tree. */
export function MapToolbar({ filters, onFilters, onFind, onStep, position }: MapToolbarProps) {
  const [tag, setTag] = useState('');
  const [missing, setMissing] = useState<string | null>(null);
  const [open, setOpen] = useState(false);
  const active = Object.values(filters).filter(Boolean).length;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const q = tag.trim();
    if (!q) return;
    setMissing(onFind(q) ? null : q);
  };

  return (
    <div className="mb-4 flex flex-col gap-3">
      <div className="grid grid-cols-2 gap-3 lg:grid-cols-[minmax(12rem,1.3fr)_repeat(4,minmax(0,1fr))]">
        <form
          onSubmit={submit}
          className="col-span-2 flex flex-col gap-1 lg:col-span-1"
          role="search"
        >
          <label htmlFor="find-tree" className="text-sm font-bold">
            Find tree by tag
          </label>
          <div className="flex gap-2">
            <SearchInput
              id="find-tree"
              value={tag}
              onChange={setTag}
              aria-describedby={missing ? 'find-tree-missing' : undefined}
              className="min-w-0 flex-1"
            />
            <Button type="submit">Find</Button>
          </div>
          {missing && (
            <p id="find-tree-missing" role="status" className="text-sm text-alert">
              No tree is tagged ‘{missing}’ in this sugarbush.
            </p>
          )}
        </form>
        {/* On a phone the filters fold away so the map comes first. */}
        <div className="col-span-2 md:hidden">
          <Button
            aria-expanded={open}
            aria-controls="map-filters"
            onClick={() => setOpen(!open)}
            block
          >
            {open ? 'Hide filters' : active ? `Filters (${active} on)` : 'Filters'}
          </Button>
        </div>
        <div
          id="map-filters"
          className={`col-span-2 grid-cols-2 gap-3 md:grid md:grid-cols-4 lg:col-span-4 ${open ? 'grid' : 'hidden'}`}
        >
          <FilterSelects values={filters} selects={selects} onChange={onFilters} />
        </div>
      </div>
      <div className="flex flex-wrap items-center gap-2">
        <Button onClick={() => onStep(-1)} disabled={position.count === 0}>
          ← Previous tree
        </Button>
        <Button onClick={() => onStep(1)} disabled={position.count === 0}>
          Next tree →
        </Button>
        <p className="text-sm text-bark tabular-nums" aria-live="polite">
          {position.count === 0
            ? 'No trees on the map'
            : position.index >= 0
              ? `${formatNumber(position.index + 1)} of ${formatNumber(position.count)} on the map`
              : `${formatNumber(position.count)} on the map`}
        </p>
      </div>
    </div>
  );
}

import { useState, type FormEvent } from 'react';
import { verdicts, type VerdictKey } from '@shared/rules/verdicts';
import { warningCodes, type WarningCode } from '@shared/rules/warnings';
import {
  species as speciesList,
  speciesLabels,
  treeStatuses,
  treeStatusLabels,
  type Species,
  type TreeStatus,
} from '@shared/schemas/enums';
import { Button } from '@/components/ui/button';
import { Field, controlClass } from '@/components/ui/field';
import { warningLabel } from '@/features/advice/warning-labels';
import { formatNumber } from '@/lib/units';
import type { MapFilters } from '../lib/map-filters';

interface MapToolbarProps {
  filters: MapFilters;
  onFilters: (patch: Partial<MapFilters>) => void;
  /** Returns false when no tree carries that tag. */
  onFind: (tag: string) => boolean;
  onStep: (direction: 1 | -1) => void;
  position: { index: number; count: number };
}

function Select<T extends string>({
  label,
  value,
  all,
  options,
  onChange,
}: {
  label: string;
  value: T | undefined;
  all: string;
  options: readonly { value: T; label: string }[];
  onChange: (value: T | undefined) => void;
}) {
  return (
    <Field label={label}>
      {(control) => (
        <select
          {...control}
          value={value ?? ''}
          onChange={(e) => onChange((e.target.value || undefined) as T | undefined)}
          className={controlClass}
        >
          <option value="">{all}</option>
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
            <input
              id="find-tree"
              type="search"
              value={tag}
              onChange={(e) => setTag(e.target.value)}
              placeholder="e.g. 0412"
              autoComplete="off"
              aria-describedby={missing ? 'find-tree-missing' : undefined}
              className={`${controlClass} min-w-0 flex-1`}
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
          <Select<Species>
            label="Species"
            value={filters.species}
            all="All species"
            options={speciesList.map((s) => ({ value: s, label: speciesLabels[s] }))}
            onChange={(species) => onFilters({ species })}
          />
          <Select<TreeStatus>
            label="Status"
            value={filters.status}
            all="All statuses"
            options={treeStatuses.map((s) => ({ value: s, label: treeStatusLabels[s] }))}
            onChange={(status) => onFilters({ status })}
          />
          <Select<VerdictKey>
            label="Advice"
            value={filters.verdict}
            all="All advice"
            options={verdicts.map((v) => ({ value: v.key, label: `${v.letter} · ${v.label}` }))}
            onChange={(verdict) => onFilters({ verdict })}
          />
          <Select<WarningCode>
            label="Warning"
            value={filters.warning}
            all="Any or none"
            options={warningCodes.map((c) => ({ value: c, label: warningLabel(c) }))}
            onChange={(warning) => onFilters({ warning })}
          />
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

import type { PlanItem } from '@shared/schemas/plan';
import { Button } from '@/components/ui/button';
import { cn } from '@/components/ui/cn';
import type { ListPatch } from '@/lib/list-search-params';
import type { UnitSystem } from '@/lib/units';
import { useGeolocation } from '@/lib/use-geolocation';
import type { PlanFilters } from '../api/plan-keys';
import { PlanCard } from './plan-card';
import { roundedStart } from './walk-start';

/** How the cards are ordered, and the one action that changes where the walk starts. */
function WalkBar({
  filters,
  onChange,
}: {
  filters: PlanFilters;
  onChange: (patch: ListPatch<PlanFilters>) => void;
}) {
  const geo = useGeolocation('The walk starts at the first tree by tag.');
  const walking = filters.sort === 'walk';
  const fromHere = walking && filters.fromLat !== undefined;
  const startHere = async () => {
    const position = await geo.locate();
    if (position)
      onChange({
        sort: 'walk',
        fromLat: roundedStart(position.lat),
        fromLng: roundedStart(position.lng),
      });
  };
  return (
    <div className="mb-3 flex flex-col gap-2 print:hidden">
      <p className="text-sm" aria-live="polite">
        {!walking
          ? 'Trees in the order you picked.'
          : fromHere
            ? 'Trees in walking order, nearest first from where you stood.'
            : 'Trees in walking order, from the first tree by tag.'}
      </p>
      <div className="grid grid-cols-1 gap-2 min-[360px]:grid-cols-2">
        <Button onClick={() => void startHere()} disabled={geo.status === 'locating'}>
          {geo.status === 'locating' ? 'Finding you…' : 'Start from where I stand'}
        </Button>
        {(fromHere || !walking) && (
          <Button
            onClick={() => onChange({ sort: 'walk', fromLat: undefined, fromLng: undefined })}
          >
            Walk from the first tree
          </Button>
        )}
      </div>
      {geo.status === 'failed' && (
        <p role="alert" className="text-sm text-alert">
          {geo.message}
        </p>
      )}
    </div>
  );
}

/**
 * The plan on a phone: one card per tree, in walking order unless another order was picked,
 * nothing wider than the screen. The table stays on wider screens.
 */
export function PlanCards({
  items,
  season,
  system,
  sugarbushId,
  canRecord,
  filters,
  onChange,
  stale,
}: {
  items: PlanItem[];
  season: number;
  system: UnitSystem;
  sugarbushId: number;
  canRecord: boolean;
  filters: PlanFilters;
  onChange: (patch: ListPatch<PlanFilters>) => void;
  stale: boolean;
}) {
  return (
    <section aria-label="Season plan, tree by tree">
      <WalkBar filters={filters} onChange={onChange} />
      <ol
        aria-label={filters.sort === 'walk' ? 'Trees in walking order' : 'Trees'}
        aria-busy={stale || undefined}
        className={cn('flex flex-col gap-3', stale && 'opacity-60')}
      >
        {items.map((item) => (
          <li key={item.treeId}>
            <PlanCard
              item={item}
              season={season}
              system={system}
              sugarbushId={sugarbushId}
              canRecord={canRecord}
            />
          </li>
        ))}
      </ol>
    </section>
  );
}

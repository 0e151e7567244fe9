import { useId, useState } from 'react';
import { Link } from 'react-router';
import type { PlanItem } from '@shared/schemas/plan';
import { HazardNotice } from '@/components/hazard-notice';
import { Button } from '@/components/ui/button';
import { VerdictBadge } from '@/components/verdict-badge';
import { paths } from '@/config/paths';
import { adviceSentence, formatBitSize, formatHeight } from '@/lib/advice-words';
import { nearestCompassPoint } from '@/lib/compass';
import { seasonParam } from '@/lib/season';
import { formatDbh, formatLength, lengthUnitOf, type UnitSystem } from '@/lib/units';
import { PlanCardDetail } from './plan-card-detail';

type Spot = PlanItem['placements'][number];

/** "South-west, 225°". */
export function sideWords(azimuthDeg: number): string {
  const { word } = nearestCompassPoint(azimuthDeg);
  const deg = Math.round(((azimuthDeg % 360) + 360) % 360) % 360;
  return `${word[0].toUpperCase()}${word.slice(1)}, ${deg}°`;
}

function TapLine({ spot, item, system }: { spot: Spot; item: PlanItem; system: UnitSystem }) {
  const unit = lengthUnitOf(system);
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-3 text-sm">
      <dt className="text-bark">Side</dt>
      <dd className="font-bold">{sideWords(spot.azimuthDeg)}</dd>
      <dt className="text-bark">Height</dt>
      <dd className="tabular-nums">{formatHeight(spot.heightCm, system)}</dd>
      <dt className="text-bark">Drill</dt>
      <dd className="tabular-nums">
        {formatBitSize(item.bitCm, system)} bit,{' '}
        {formatLength(item.depthCm, unit, unit === 'in' ? 2 : 1)} deep with the bark
      </dd>
    </dl>
  );
}

/**
 * One tree of the plan as a phone shows it: its tag and verdict, any hazard before the drilling
 * advice, then each tap's side, height, bit and depth. Opening it loads the tree's holes for the
 * trunk diagram; those who record tapholes record what was drilled from here.
 */
export function PlanCard({
  item,
  season,
  system,
  sugarbushId,
  canRecord,
}: {
  item: PlanItem;
  season: number;
  system: UnitSystem;
  sugarbushId: number;
  canRecord: boolean;
}) {
  const headingId = useId();
  const detailId = useId();
  const [open, setOpen] = useState<'closed' | 'trunk' | 'record'>('closed');
  const unit = lengthUnitOf(system);

  return (
    <article
      aria-labelledby={headingId}
      data-tree-card={item.tag}
      className="flex flex-col gap-3 rounded border border-rule bg-paper p-3"
    >
      <HazardNotice hazards={item.hazards} tag={item.tag} />
      <header className="flex flex-wrap items-center justify-between gap-2">
        <h3 id={headingId} className="text-lg font-bold">
          <Link
            to={paths.tree.href(item.treeId, { season: seasonParam(season) })}
            className="inline-flex min-h-11 items-center underline underline-offset-4"
          >
            <span className="sr-only">Tree </span>
            {item.tag}
          </Link>
        </h3>
        <VerdictBadge verdict={item.verdict} />
      </header>
      <p className="text-sm text-bark">
        DBH {formatDbh(item.dbhCm, unit)} · {adviceSentence(item, season, system)}
      </p>
      {item.placements.length > 0 && (
        <ol aria-label={`Taps at ${item.tag}`} className="flex flex-col gap-2">
          {item.placements.map((spot, i) => (
            <li key={i} className="flex gap-3 rounded bg-frost/60 px-3 py-2">
              <span
                aria-hidden="true"
                className="inline-grid size-6 shrink-0 place-items-center rounded-full bg-sap text-sm font-bold"
              >
                {i + 1}
              </span>
              <span className="sr-only">Tap {i + 1}: </span>
              <TapLine spot={spot} item={item} system={system} />
            </li>
          ))}
        </ol>
      )}
      <div className="grid grid-cols-1 gap-2 min-[360px]:grid-cols-2">
        <Button
          aria-expanded={open !== 'closed'}
          aria-controls={detailId}
          onClick={() => setOpen((now) => (now === 'closed' ? 'trunk' : 'closed'))}
        >
          {open === 'closed' ? 'Trunk and holes' : 'Close'}
        </Button>
        {canRecord && (
          <Button
            variant={open === 'record' ? 'secondary' : 'primary'}
            aria-expanded={open === 'record'}
            aria-controls={detailId}
            onClick={() => setOpen((now) => (now === 'record' ? 'trunk' : 'record'))}
          >
            Record what was drilled
          </Button>
        )}
      </div>
      <div id={detailId}>
        {open !== 'closed' && (
          <PlanCardDetail
            treeId={item.treeId}
            tag={item.tag}
            season={season}
            sugarbushId={sugarbushId}
            system={system}
            recording={canRecord && open === 'record'}
          />
        )}
      </div>
    </article>
  );
}

import type { ReactNode } from 'react';
import { ErrorState } from '@/components/ui/error-state';
import { Skeleton } from '@/components/ui/skeleton';
import { formatNumber, type UnitSystem } from '@/lib/units';
import { useStandFigures } from '../api/get-figures';
import type { StandFigures as Figures } from '@shared/schemas/map';

const FT_PER_M = 1 / 0.3048;

type Pair = [value: number | null, unit: string, digits: number];

/** Two systems side by side, the user's own first: "12.4 ac (5.0 ha)". */
function both(system: UnitSystem, imperial: Pair, metric: Pair): string {
  const [first, second] = system === 'imperial' ? [imperial, metric] : [metric, imperial];
  if (first[0] === null || second[0] === null) return '—';
  return `${formatNumber(first[0], first[2])} ${first[1]} (${formatNumber(second[0], second[2])} ${second[1]})`;
}

function spacing(f: Figures, system: UnitSystem): string {
  const nn = f.nearestNeighbourM;
  if (!nn) return '—';
  const [k, u] = system === 'imperial' ? [FT_PER_M, 'ft'] : [1, 'm'];
  const v = (m: number) => formatNumber(m * k, 1);
  return `median ${v(nn.median)} ${u}, mean ${v(nn.mean)} ${u} (${v(nn.min)}–${v(nn.max)} ${u})`;
}

function Row({ term, children }: { term: string; children: ReactNode }) {
  return (
    <>
      <dt className="font-bold">{term}</dt>
      <dd className="tabular-nums">{children}</dd>
    </>
  );
}

/** Area and density figures for the stand inside its boundary. */
export function StandFigures({
  sugarbushId,
  season,
  system,
  onSelectTree,
}: {
  sugarbushId: number;
  season: number | undefined;
  system: UnitSystem;
  onSelectTree: (treeId: number) => void;
}) {
  const figures = useStandFigures(sugarbushId, season);
  return (
    <section aria-labelledby="stand-figures" className="rounded border border-rule p-4">
      <h2 id="stand-figures" className="font-bold">
        Stand figures
      </h2>
      {figures.isPending ? (
        <div role="status" aria-label="Loading stand figures" className="mt-2 flex flex-col gap-2">
          <Skeleton className="h-5 w-full" />
          <Skeleton className="h-5 w-2/3" />
        </div>
      ) : figures.isError ? (
        <ErrorState
          title="We couldn't work out the stand figures."
          error={figures.error}
          onRetry={() => void figures.refetch()}
        />
      ) : (
        <FigureList figures={figures.data} system={system} onSelectTree={onSelectTree} />
      )}
    </section>
  );
}

function FigureList({
  figures: f,
  system,
  onSelectTree,
}: {
  figures: Figures;
  system: UnitSystem;
  onSelectTree: (treeId: number) => void;
}) {
  return (
    <>
      {!f.boundary && (
        <p className="mt-1 text-sm text-bark">
          No boundary yet. Import a boundary file or draw the boundary to see area and density.
        </p>
      )}
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5 text-sm">
        {f.boundary && (
          <>
            <Row term="Area">{both(system, [f.areaAcres, 'ac', 1], [f.areaHa, 'ha', 1])}</Row>
            <Row term="Trees">
              {both(system, [f.treesPerAcre, '/ac', 0], [f.treesPerHa, '/ha', 0])}
            </Row>
            <Row term="Taps">
              {both(system, [f.tapsPerAcre, '/ac', 0], [f.tapsPerHa, '/ha', 0])}
            </Row>
            <Row term="Basal area">
              {both(system, [f.basalAreaFt2PerAcre, 'ft²/ac', 0], [f.basalAreaM2PerHa, 'm²/ha', 1])}
            </Row>
            <Row term="Inside">
              {formatNumber(f.treesInside)} of {formatNumber(f.mappedTrees)} mapped trees
            </Row>
          </>
        )}
        <Row term="Taps planned">{formatNumber(f.tapsPlanned)}</Row>
        <Row term="Nearest tree">{spacing(f, system)}</Row>
      </dl>
      {f.treesOutside.length > 0 && (
        <div className="mt-3">
          <h3 className="text-sm font-bold">
            {formatNumber(f.treesOutside.length)} outside the boundary
          </h3>
          <ul className="mt-1 flex flex-wrap gap-1.5">
            {f.treesOutside.map((t) => (
              <li key={t.id}>
                <button
                  type="button"
                  onClick={() => onSelectTree(t.id)}
                  className="min-h-11 rounded border border-bark/40 px-2 text-sm hover:bg-frost md:min-h-8"
                >
                  {t.tag}
                </button>
              </li>
            ))}
          </ul>
        </div>
      )}
    </>
  );
}

import { Link } from 'react-router';
import { speciesLabels } from '@shared/schemas/enums';
import type { Tree } from '@shared/schemas/tree';
import { TreeStatusLabel } from '@/components/tree-status-label';
import { PageHeader } from '@/components/ui/page-header';
import { UnitToggle } from '@/components/ui/unit-toggle';
import { paths } from '@/config/paths';
import { formatDate, formatDbh, formatPercent, useUnitSystem } from '@/lib/units';

export function TreeHeader({ tree }: { tree: Tree }) {
  const { unit } = useUnitSystem();
  const figures = [
    { term: 'Latest DBH', value: formatDbh(tree.latestDbhCm, unit) },
    { term: 'Crown dieback', value: formatPercent(tree.latestCrownDiebackPct) },
    { term: 'Last measured', value: formatDate(tree.latestMeasuredOn) },
  ];
  return (
    <>
      <Link
        to={paths.trees.href(tree.sugarbushId)}
        className="mb-2 inline-block text-sm underline underline-offset-4"
      >
        ← All trees
      </Link>
      <PageHeader
        title={`Tree ${tree.tag}`}
        subtitle={
          <span className="inline-flex flex-wrap items-center gap-x-3">
            <span>{speciesLabels[tree.species]}</span>
            <span aria-hidden="true">·</span>
            <TreeStatusLabel status={tree.status} />
          </span>
        }
        actions={<UnitToggle />}
      />
      <dl className="mb-8 grid grid-cols-3 gap-4 tabular-nums">
        {figures.map((f) => (
          <div key={f.term}>
            <dt className="text-sm text-bark">{f.term}</dt>
            <dd className="text-lg font-bold">{f.value}</dd>
          </div>
        ))}
      </dl>
    </>
  );
}

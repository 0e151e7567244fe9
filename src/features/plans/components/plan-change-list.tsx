import { Link } from 'react-router';
import { verdictByKey } from '@shared/rules/index';
import type {
  PlanChange,
  PlanChangeKind,
  PlanChanges,
  TreeCall,
} from '@shared/schemas/issued-plan';
import { Pager } from '@/components/ui/pager';
import { paths } from '@/config/paths';
import { shortPlacements } from '@/lib/advice-words';
import { seasonParam } from '@/lib/season';
import { formatNumber, type UnitSystem } from '@/lib/units';

const kindWords: Record<PlanChangeKind, string> = {
  added: 'Now in the plan',
  removed: 'No longer in the plan',
  taps: 'Other number of taps',
  placements: 'Holes moved',
  verdict: 'Other verdict',
};

/** "Tap · 2 taps: S 1.10 m · N 0.80 m", or "not in the register". */
function callWords(call: TreeCall | null, system: UnitSystem): string {
  if (!call) return 'Not in the register';
  const verdict = verdictByKey[call.verdict].label;
  if (call.taps === 0) return `${verdict} · no taps`;
  const taps = `${call.taps} ${call.taps === 1 ? 'tap' : 'taps'}`;
  return call.placements.length
    ? `${verdict} · ${taps}: ${shortPlacements(call.placements, system)}`
    : `${verdict} · ${taps}`;
}

function what(change: PlanChange): string {
  const words = change.kinds.map((k) => kindWords[k]);
  if (change.kinds.includes('removed') && change.current?.verdict === 'retired')
    words[change.kinds.indexOf('removed')] = 'No longer in the plan (out of production)';
  if (change.kinds.includes('added') && !change.issued)
    words[change.kinds.indexOf('added')] = 'Added to the register and to the plan';
  return words.join('; ');
}

/** Tree by tree, what today's advice says that the issued copy does not. */
export function PlanChangeList({
  changes,
  season,
  system,
  onPage,
}: {
  changes: PlanChanges;
  season: number;
  system: UnitSystem;
  onPage: (page: number) => void;
}) {
  if (changes.total === 0)
    return (
      <p className="text-sm">
        Nothing has changed since it was issued: the crew’s copy is today’s advice.
      </p>
    );
  return (
    <>
      <p className="text-sm">
        {formatNumber(changes.total)} {changes.total === 1 ? 'tree reads' : 'trees read'}{' '}
        differently today. The crew’s copy stays as issued; issue again to give them today’s advice.
      </p>
      <div className="mt-2 overflow-x-auto">
        <table aria-label="Changes since it was issued" className="w-full min-w-[36rem] text-sm">
          <thead>
            <tr className="border-b border-rule text-left">
              <th className="py-1 pr-3">Tree</th>
              <th className="py-1 pr-3">What changed</th>
              <th className="py-1 pr-3">As issued</th>
              <th className="py-1">Today</th>
            </tr>
          </thead>
          <tbody>
            {changes.items.map((c) => (
              <tr key={c.treeId} className="border-b border-rule/60 align-top">
                <td className="py-1 pr-3">
                  <Link
                    to={paths.tree.href(c.treeId, { season: seasonParam(season) })}
                    className="inline-flex min-h-11 items-center font-bold underline underline-offset-4 md:min-h-0"
                  >
                    {c.tag}
                  </Link>
                </td>
                <td className="py-1 pr-3">{what(c)}</td>
                <td className="py-1 pr-3">{callWords(c.issued, system)}</td>
                <td className="py-1">{callWords(c.current, system)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {changes.total > changes.pageSize && (
        <Pager label="Pages of changes" list={changes} onPage={onPage} />
      )}
    </>
  );
}

import {
  warningCodes,
  type PlanTotals,
  type VerdictKey,
  type WarningCode,
} from '@shared/rules/index';
import { cn } from '@/components/ui/cn';
import { VerdictBadge } from '@/components/verdict-badge';
import { WarningMark } from '@/components/warning-chip';
import { formatNumber } from '@/lib/units';
import { warningLabel } from '@/lib/warning-labels';

const figures: { key: keyof PlanTotals; label: string; verdict?: VerdictKey }[] = [
  { key: 'treesToTap', label: 'Trees to tap' },
  { key: 'taps', label: 'Taps' },
  { key: 'reduced', label: 'Tap fewer', verdict: 'tap-reduced' },
  { key: 'rested', label: 'Rest', verdict: 'rest' },
  { key: 'tooSmall', label: 'Too small', verdict: 'too-small' },
  { key: 'retired', label: 'Out of production', verdict: 'retired' },
  { key: 'unmeasured', label: 'Measure first', verdict: 'unmeasured' },
];

/** The season in figures: what the whole stand takes, whatever the filters show. */
export function PlanTotalsStrip({ totals }: { totals: PlanTotals }) {
  return (
    <section aria-label="Plan totals" className="mb-4">
      <dl className="grid grid-cols-2 gap-x-4 gap-y-3 rounded border border-rule px-4 py-3 sm:grid-cols-4 lg:grid-cols-7">
        {figures.map((f) => (
          <div key={f.key} className="flex min-w-0 flex-col justify-between">
            <dt className="flex items-center gap-1.5 text-sm text-bark">
              {f.verdict && <VerdictBadge verdict={f.verdict} showLabel={false} />}
              <span>{f.label}</span>
            </dt>
            <dd className="text-lg font-bold tabular-nums">
              {formatNumber(totals[f.key] as number)}
            </dd>
          </div>
        ))}
      </dl>
    </section>
  );
}

/** How many trees carry each warning; picking one shows only those trees. */
export function PlanWarningSummary({
  counts,
  active,
  onPick,
}: {
  counts: PlanTotals['warningsByCode'];
  active: WarningCode | undefined;
  onPick: (code: WarningCode | undefined) => void;
}) {
  const present = warningCodes.filter((c) => (counts[c] ?? 0) > 0);
  if (present.length === 0) return null;
  return (
    <section aria-label="Warnings in this plan" className="mb-4 print:hidden">
      <h2 className="mb-2 text-sm font-bold">Warnings — pick one to see those trees</h2>
      {/* One scrolling row on a phone, so the plan itself stays near the top. */}
      <ul className="-mx-4 flex gap-2 overflow-x-auto px-4 pb-1 md:mx-0 md:flex-wrap md:px-0">
        {present.map((code) => {
          const on = active === code;
          return (
            <li key={code}>
              <button
                type="button"
                aria-pressed={on}
                onClick={() => onPick(on ? undefined : code)}
                className={cn(
                  'inline-flex min-h-11 items-center gap-1.5 whitespace-nowrap rounded border px-2 text-sm md:min-h-8',
                  on ? 'border-ink bg-ink text-paper' : 'border-rule hover:bg-frost',
                )}
              >
                <WarningMark code={code} />
                {warningLabel(code)}
                <span className="font-bold tabular-nums">{formatNumber(counts[code])}</span>
              </button>
            </li>
          );
        })}
      </ul>
    </section>
  );
}

import type { ComplianceTotals } from '@shared/schemas/compliance';
import { formatNumber } from '@/lib/units';

const rows: { key: keyof ComplianceTotals; label: string }[] = [
  { key: 'treesTapped', label: 'Trees tapped' },
  { key: 'tapsSet', label: 'Taps set' },
  { key: 'tapsAllowed', label: 'Taps allowed' },
  { key: 'tapsOver', label: 'Taps over' },
  { key: 'treesOver', label: 'Trees with more taps than allowed' },
  { key: 'holesTooClose', label: 'Holes too close' },
  { key: 'treesTooSmall', label: 'Trees tapped too small' },
  { key: 'treesDeclining', label: 'Trees tapped while declining' },
  { key: 'treesUnmeasured', label: 'Trees with no DBH before the season' },
  { key: 'treesCompliant', label: 'Trees with no finding' },
];

/** The season's totals under the guideline, and under a second one beside it. */
export function ComplianceTotalsTable({
  totals,
  label,
  compare,
}: {
  totals: ComplianceTotals;
  label: string;
  compare: { totals: ComplianceTotals; label: string } | null;
}) {
  return (
    <div className="overflow-x-auto">
      <table
        aria-label="Compliance totals"
        className="w-full border-collapse text-left tabular-nums"
      >
        <thead>
          <tr className="border-b-2 border-ink/70 text-sm">
            <th scope="col" className="px-3 py-2">
              <span className="sr-only">Figure</span>
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              {label}
            </th>
            {compare && (
              <th scope="col" className="px-3 py-2 text-right">
                {compare.label}
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.key} className="border-b border-rule">
              <th scope="row" className="px-3 py-1.5 font-normal">
                {r.label}
              </th>
              <td className="px-3 py-1.5 text-right font-bold">{formatNumber(totals[r.key])}</td>
              {compare && (
                <td className="px-3 py-1.5 text-right font-bold">
                  {formatNumber(compare.totals[r.key])}
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** "In 2026, 984 trees were tapped with 1,512 taps; the guideline allowed them 1,487 …". */
export function complianceSentence(season: number, t: ComplianceTotals): string {
  if (t.treesTapped === 0) return `No taps are recorded for ${season}`;
  const findings =
    t.treesWithFindings === 0
      ? 'no tree has a finding'
      : `${formatNumber(t.treesWithFindings)} ${t.treesWithFindings === 1 ? 'tree has' : 'trees have'} a finding`;
  return `In ${season}, ${formatNumber(t.treesTapped)} trees were tapped with ${formatNumber(t.tapsSet)} taps; at the DBH measured before the season the guideline allowed them ${formatNumber(t.tapsAllowed)}, and ${findings}`;
}

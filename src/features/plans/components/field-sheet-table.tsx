import type { FieldSheetLine } from '@shared/schemas/issued-plan';
import { formatHeight, drillWords } from '@/lib/advice-words';
import { nearestCompassPoint } from '@/lib/compass';
import { formatNumber, type UnitSystem } from '@/lib/units';

/** "south (200°) at 1.10 m": the side as a word, the bearing to aim by, the height. */
const tapWords = (p: FieldSheetLine['placements'][number], system: UnitSystem) =>
  `${nearestCompassPoint(p.azimuthDeg).word} (${formatNumber(p.azimuthDeg)}°) at ${formatHeight(p.heightCm, system)}`;

/** One line per tree: a box to tick, the tag, hazards first, then each tap, bit and depth. */
export function FieldSheetTable({
  lines,
  system,
}: {
  lines: readonly FieldSheetLine[];
  system: UnitSystem;
}) {
  return (
    <table aria-label="Field sheet" className="field-sheet-table w-full border-collapse text-sm">
      <thead>
        <tr className="border-b-2 border-ink text-left">
          <th className="w-10 py-1 pr-2">Done</th>
          <th className="w-10 py-1 pr-2 text-right">#</th>
          <th className="py-1 pr-2">Tag</th>
          <th className="py-1 pr-2 text-right">Taps</th>
          <th className="py-1 pr-2">Where to drill</th>
          <th className="py-1">Bit and depth</th>
        </tr>
      </thead>
      <tbody>
        {lines.map((line) => (
          <tr key={line.treeId} className="break-inside-avoid border-b border-ink/40 align-top">
            <td className="py-1 pr-2">
              <span
                role="img"
                aria-label={`Box to tick for ${line.tag}`}
                className="inline-block h-5 w-5 border-2 border-ink"
              />
            </td>
            <td className="py-1 pr-2 text-right tabular-nums">{line.position}</td>
            <td className="py-1 pr-2 font-bold">{line.tag}</td>
            <td className="py-1 pr-2 text-right tabular-nums">{line.taps}</td>
            <td className="py-1 pr-2">
              {line.hazards.map((h, n) => (
                <p key={n} className="font-bold">
                  Hazard: {h}
                </p>
              ))}
              <ol className="list-none">
                {line.placements.map((p, n) => (
                  <li key={n}>{tapWords(p, system)}</li>
                ))}
              </ol>
            </td>
            <td className="py-1">
              {line.bitCm !== null && line.depthCm !== null
                ? drillWords(line.bitCm, line.depthCm, system)
                : '—'}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

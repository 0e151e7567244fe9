import type { SapSeasonTotals } from '@shared/schemas/sap';
import { WhyDisclosure } from '@/components/ui/why-disclosure';
import { formatNumber } from '@/lib/units';
import { formatBrix, formatVolume, type SeasonUnits } from '../lib/season-units';

/** The season's sap at a glance: volume, sugar, taps and yield, syrup by both rules and as made. */
export function SeasonTotals({
  season,
  totals,
  units,
}: {
  season: number;
  totals: SapSeasonTotals;
  units: SeasonUnits;
}) {
  const figures: { label: string; value: string; note?: string }[] = [
    {
      label: 'Sap collected',
      value: formatVolume(totals.volumeL, units.volume),
      note: `on ${formatNumber(totals.days)} ${totals.days === 1 ? 'day' : 'days'}`,
    },
    { label: 'Mean sugar', value: formatBrix(totals.meanSugarPct), note: 'weighted by volume' },
    { label: 'Taps', value: formatNumber(totals.taps), note: `tapholes recorded for ${season}` },
    {
      label: 'Sap per tap',
      value: formatVolume(totals.yieldPerTapL, units.volume),
      note: totals.taps === 0 ? 'no tapholes recorded' : undefined,
    },
    {
      label: 'Syrup expected, Rule of 86',
      value: formatVolume(totals.expectedSyrupL, units.volume),
      note: 'sap ÷ (86 ÷ °Brix)',
    },
    {
      label: 'Syrup expected, revised rule',
      value: formatVolume(totals.expectedSyrupLRevised, units.volume),
      note: 'for 66.0 °Brix syrup: sap ÷ (87.1 ÷ °Brix − 0.32)',
    },
    {
      label: 'Syrup made',
      value: formatVolume(totals.syrupMadeL, units.volume),
      // Made on some days only: compared with what that sap alone should make.
      note:
        totals.syrupMadeL === null || totals.expectedSyrupLWhereMade === null
          ? 'not entered'
          : `from the sap of ${totals.entriesWithSyrup === 1 ? '1 entry' : `${totals.entriesWithSyrup} entries`}, which should make ${formatVolume(totals.expectedSyrupLWhereMade, units.volume)} by the Rule of 86`,
    },
  ];
  return (
    <div className="flex flex-col gap-2">
      <dl
        aria-label={`Season ${season} totals`}
        className="grid grid-cols-2 gap-x-6 gap-y-4 sm:grid-cols-3 lg:grid-cols-4"
      >
        {figures.map((f) => (
          <div key={f.label} className="border-t border-rule pt-2">
            <dt className="text-sm text-bark">{f.label}</dt>
            <dd className="text-lg font-bold tabular-nums">{f.value}</dd>
            {f.note && <dd className="text-sm text-bark">{f.note}</dd>}
          </div>
        ))}
      </dl>
      <WhyDisclosure
        name="Why? Syrup expected and sap per tap"
        source="Rule of 86 (Jones, UVM): gallons of sap for a gallon of syrup = 86 ÷ sugar %. Revised for 66.0 °Brix syrup: 87.1 ÷ sugar % − 0.32 (Perkins & Isselhardt, UVM Proctor)."
        notes={[
          'Each entry is converted at its own sugar content, and the season adds them up.',
          "Sap per tap divides the season's sap by the tapholes recorded for the season: on the entry's collection, or all of them for the whole stand.",
        ]}
      />
    </div>
  );
}

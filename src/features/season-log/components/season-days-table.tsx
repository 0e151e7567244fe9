import { formatTemperature } from '@shared/rules/index';
import { cn } from '@/components/ui/cn';
import { formatDate } from '@/lib/units';
import type { SeasonDay } from '../lib/season-days';
import { formatBrix, formatVolume, type SeasonUnits } from '../lib/season-units';
import { runLabels, runSymbols } from '../lib/season-words';
import { SapCautions } from './sap-cautions';

const th = 'whitespace-nowrap px-2 py-1';
const td = 'whitespace-nowrap px-2 py-1 text-right';

/** Every day of the season in words: the chart's text alternative, and the log itself. */
export function SeasonDaysTable({
  id,
  season,
  days,
  units,
}: {
  id: string;
  season: number;
  days: readonly SeasonDay[];
  units: SeasonUnits;
}) {
  const t = units.temperature;
  return (
    // Focusable, so that a keyboard can scroll it sideways on a phone.
    <div
      role="group"
      aria-label={`Days of season ${season}, scrolls sideways`}
      tabIndex={0}
      className="relative overflow-x-auto"
    >
      <table
        id={id}
        aria-label={`Days of season ${season}`}
        className="w-full border-collapse text-left text-sm tabular-nums"
      >
        <thead>
          <tr className="border-b-2 border-ink/70">
            <th scope="col" className={th}>
              Date
            </th>
            <th scope="col" className={cn(th, 'text-right')}>
              Low
            </th>
            <th scope="col" className={cn(th, 'text-right')}>
              High
            </th>
            <th scope="col" className={th}>
              Run
            </th>
            <th scope="col" className={cn(th, 'text-right')}>
              Sap
            </th>
            <th scope="col" className={cn(th, 'text-right')}>
              Sugar
            </th>
            <th scope="col" className={cn(th, 'text-right')}>
              Syrup, Rule of 86
            </th>
            <th scope="col" className={cn(th, 'text-right')}>
              Syrup, revised rule
            </th>
            <th scope="col" className={th}>
              Keep it cold
            </th>
          </tr>
        </thead>
        <tbody>
          {days.map((d) => (
            <tr key={d.date} data-day={d.date} className="border-b border-rule align-top">
              <th scope="row" className={cn(th, 'font-normal')}>
                {formatDate(d.date)}
              </th>
              <td className={td}>{d.minC === null ? '—' : formatTemperature(d.minC, t)}</td>
              <td className={td}>{d.maxC === null ? '—' : formatTemperature(d.maxC, t)}</td>
              <td className="min-w-56 px-2 py-1" data-run={d.run ?? 'unknown'}>
                {d.run === null ? (
                  <span className="text-bark">No weather recorded</span>
                ) : (
                  <>
                    <span className={cn('font-bold', d.run === 'none' && 'font-normal text-bark')}>
                      <span aria-hidden="true">{runSymbols[d.run]} </span>
                      {runLabels[d.run]}
                    </span>
                    <span className="block text-bark">{d.reason}</span>
                  </>
                )}
              </td>
              <td className={td}>{formatVolume(d.sap?.volumeL, units.volume)}</td>
              <td className={td}>{formatBrix(d.sap?.meanSugarPct)}</td>
              <td className={td}>{formatVolume(d.sap?.expectedSyrupL, units.volume)}</td>
              <td className={td}>{formatVolume(d.sap?.expectedSyrupLRevised, units.volume)}</td>
              <td className="min-w-48 px-2 py-1">
                {d.cautions.length === 0 ? '' : <SapCautions cautions={d.cautions} compact />}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

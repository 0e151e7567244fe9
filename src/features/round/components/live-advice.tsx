import { adviseTree } from '@shared/rules/index';
import type { Round } from '../api/get-round';
import type { TreeRecordAnswer } from '@shared/schemas/round';
import { VerdictBadge } from '@/components/verdict-badge';

/**
 * The tree's advice for the plan's season with the reading being typed, from the shared advisor
 * on this device (no network needed once the tree's record is here).
 */
export function LiveAdvice({
  record,
  round,
  reading,
}: {
  record: TreeRecordAnswer | undefined;
  round: Round;
  reading: {
    measuredOn: string;
    dbhCm: number;
    crownDiebackPct: number | null;
    confirmedOutlier: boolean;
  } | null;
}) {
  if (!record)
    return (
      <p className="text-sm text-bark">
        The tree&apos;s record is not on this device yet: its advice shows once it has loaded.
      </p>
    );
  const measurements = reading ? [...record.measurements, reading] : record.measurements;
  const advice = adviseTree(
    { ...record, measurements },
    {
      season: round.adviceSeason,
      profile: round.guideline.profile,
      sunnyAzimuthDeg: round.guideline.sunnyAzimuthDeg,
    },
  );
  const warnings = advice.warnings.slice(0, 3);
  return (
    <div aria-live="polite" className="rounded border border-rule bg-frost/60 px-3 py-2">
      <p className="text-sm font-bold">
        {reading ? 'Advice with this reading' : 'Advice now'} · {round.adviceSeason}
      </p>
      <div className="mt-1 flex flex-wrap items-center gap-3">
        <VerdictBadge verdict={advice.verdict} />
        <span className="font-bold">
          {advice.taps} {advice.taps === 1 ? 'tap' : 'taps'}
        </span>
      </div>
      {warnings.length > 0 && (
        <ul className="mt-1 list-disc pl-5 text-sm">
          {warnings.map((w) => (
            <li key={w.code}>{w.message}</li>
          ))}
        </ul>
      )}
    </div>
  );
}

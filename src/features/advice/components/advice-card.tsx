import type { ReactNode } from 'react';
import { useSearchParams } from 'react-router';
import type { Spot } from '@shared/rules/index';
import type { TreeAdvice } from '@shared/schemas/plan';
import { SeasonStepper } from '@/components/season-stepper';
import { TrunkDiagram } from '@/components/trunk-diagram';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { GuidelineNotice, RuleList } from '@/components/ui/guideline-rules';
import { Skeleton } from '@/components/ui/skeleton';
import { WhyDisclosure } from '@/components/ui/why-disclosure';
import { VerdictBadge } from '@/components/verdict-badge';
import { adviceSentence, drillWords, spotWords } from '@/lib/advice-words';
import { useTree } from '@/lib/get-tree';
import { useTreeAdvice } from '@/lib/get-tree-advice';
import { useTreeDrilling } from '@/lib/use-tree-drilling';
import { parseSeason, seasonParam } from '@/lib/season';
import { useUnitSystem } from '@/lib/units';
import { AdviceFigures } from './advice-figures';
import { LongRun } from './long-run';
import { ShareProjectionChart } from './share-projection-chart';
import { WarningList } from './warning-list';

/** The season shown is kept in the URL (`?season=`), so a link from the plan opens the same one. */
function useSeasonSearchParam() {
  const [params, setParams] = useSearchParams();
  const season = parseSeason(params.get('season'));
  const setSeason = (next: number) =>
    setParams(
      (prev) => {
        const out = new URLSearchParams(prev);
        const value = seasonParam(next);
        if (value === undefined) out.delete('season');
        else out.set('season', String(value));
        return out;
      },
      { replace: true },
    );
  return [season, setSeason] as const;
}

/** An advised spot and the season it is advised for. */
export type AdvisedSpot = Spot & { season: number };

/**
 * The advisor's answer for one tree and season: how many taps, where, how to drill, and why.
 * `caution` is the safety box shown where the work is advised; `onUseSpot`, given to those who
 * record tapholes, offers each advised spot to their form.
 */
export function AdviceCard({
  treeId,
  caution,
  onUseSpot,
}: {
  treeId: number;
  caution?: ReactNode;
  onUseSpot?: (spot: AdvisedSpot) => void;
}) {
  const [season, setSeason] = useSeasonSearchParam();
  const advice = useTreeAdvice(treeId, season);

  let body: ReactNode;
  if (advice.isPending) {
    body = (
      <div role="status" aria-label="Loading advice" className="flex flex-col gap-3">
        <Skeleton className="h-8 w-2/3" />
        <Skeleton className="h-5 w-1/2" />
        <Skeleton className="h-40 w-full" />
      </div>
    );
  } else if (advice.isError) {
    body = (
      <ErrorState
        title={`We couldn't work out the advice for ${season}.`}
        error={advice.error}
        onRetry={() => void advice.refetch()}
      />
    );
  } else {
    body = (
      <AdviceBody advice={advice.data} stale={advice.isPlaceholderData} onUseSpot={onUseSpot} />
    );
  }

  return (
    <section
      aria-labelledby="advice-heading"
      className="flex flex-col gap-4 rounded border border-rule p-4"
      data-slot="tree-advice"
    >
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="advice-heading" className="text-lg font-bold">
          Advice for {season}
        </h2>
        <SeasonStepper season={season} onChange={setSeason} />
      </div>
      {body}
      {caution}
    </section>
  );
}

function AdviceBody({
  advice,
  stale,
  onUseSpot,
}: {
  advice: TreeAdvice;
  stale: boolean;
  onUseSpot?: (spot: AdvisedSpot) => void;
}) {
  const { system } = useUnitSystem();
  // The tree's every hole, faded by the growth over it, beside the spots advised.
  const sugarbushId = useTree(advice.treeId).data?.sugarbushId;
  const drilling = useTreeDrilling(advice.treeId, sugarbushId, advice.season);
  const earlier = drilling.marks?.some((m) => m.kind !== 'advised') ?? false;
  const drawTrunk = advice.taps > 0 || earlier;

  return (
    <div aria-busy={stale || undefined} className="flex flex-col gap-4">
      <div>
        <VerdictBadge verdict={advice.verdict} size="lg" />
        <p className="mt-2 text-lg font-bold">{adviceSentence(advice, advice.season, system)}</p>
        {advice.taps > 0 && (
          <>
            {advice.frozen && (
              <p role="alert" className="mt-2 font-bold text-alert">
                Wait to drill: the trunk is frozen.
              </p>
            )}
            <p className="mt-1">Drill with a {drillWords(advice.bitCm, advice.depthCm, system)}.</p>
            <RuleList rules={advice.drillingNotes} label="With the drilling" />
          </>
        )}
        {onUseSpot && advice.placements.length > 0 && (
          <ul aria-label="Advised spots" className="mt-2 flex flex-col gap-2">
            {advice.placements.map((spot, i) => {
              const words = spotWords(spot, system);
              return (
                <li
                  key={`${spot.azimuthDeg}-${spot.heightCm}`}
                  className="grid grid-cols-[minmax(0,1fr)_auto] items-center gap-x-4"
                >
                  <span>
                    {advice.placements.length > 1 && `${i + 1}. `}
                    {/* Keep each figure with its unit when the line wraps. */}
                    {(words[0].toUpperCase() + words.slice(1)).replace(/ (m|in|ft)\b/g, '\u00a0$1')}
                  </span>
                  <Button
                    aria-label={`Use this spot: ${words}`}
                    disabled={stale}
                    onClick={() => onUseSpot({ ...spot, season: advice.season })}
                  >
                    Use this spot
                  </Button>
                </li>
              );
            })}
          </ul>
        )}
      </div>

      {advice.reasons.length > 0 && (
        <section aria-labelledby="advice-reasons-heading">
          <h3 id="advice-reasons-heading" className="font-bold">
            {advice.taps >= advice.guidelineTaps
              ? 'Reasons'
              : advice.taps === 0
                ? 'Why no taps this season'
                : `Why ${advice.taps} and not ${advice.guidelineTaps}`}
          </h3>
          <ul className="mt-1 list-disc space-y-1 pl-5">
            {advice.reasons.map((r) => (
              <li key={r}>{r}</li>
            ))}
          </ul>
        </section>
      )}

      {drawTrunk && drilling.marks && (
        <TrunkDiagram
          marks={drilling.marks}
          season={advice.season}
          heightBand={advice.profile.heightBand}
          dbhCm={advice.dbhCm}
          stainLengthCm={advice.profile.stainLengthCm}
          stainMarginCm={advice.profile.stainMarginCm}
          system={system}
          tag={advice.tag}
        />
      )}
      {drawTrunk && drilling.isError && (
        <p className="text-sm text-alert">
          The tree's earlier holes could not be loaded, so the trunk is not drawn.
        </p>
      )}

      <WarningList warnings={advice.warnings} />

      {advice.dbhCm !== null && advice.verdict !== 'retired' && (
        <>
          <AdviceFigures advice={advice} floor={advice.profile.floor} system={system} />
          {advice.projection && advice.tableTaps > 0 && (
            <div className="grid gap-4 md:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
              <ShareProjectionChart
                projection={advice.projection}
                floor={advice.profile.floor}
                tapsPerYear={advice.taps}
              />
              <LongRun advice={advice} />
            </div>
          )}
        </>
      )}

      <ProfileLine advice={advice} />
    </div>
  );
}

function ProfileLine({ advice }: { advice: TreeAdvice }) {
  const fastOnly = advice.tableTaps > advice.guidelineTaps;
  return (
    <div className="border-t border-rule pt-3 text-sm text-bark">
      <GuidelineNotice notice={advice.profile.notice} />
      <p>
        Guideline: {advice.profile.label}
        {advice.guidelineTaps > 0 &&
          ` — ${advice.guidelineTaps} by its table at this size${
            fastOnly ? `, ${advice.tableTaps} for a healthy fast grower` : ''
          }`}
        .
      </p>
      <WhyDisclosure source={advice.profile.source} />
    </div>
  );
}

import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useState } from 'react';
import { useSearchParams } from 'react-router';
import type { MeasurementInput } from '@shared/schemas/measurement';
import { Button } from '@/components/ui/button';
import { CautionBox } from '@/components/ui/caution-box';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { TableSkeleton } from '@/components/ui/skeleton';
import { newClientId, useSendFieldEntry } from '@/lib/field-entries';
import { formatDate, formatDbh, useUnitSystem } from '@/lib/units';
import { useRound, type RoundTree } from '../api/get-round';
import { prefetchTreeRecords } from '../api/get-tree-record';
import { useMeasuredHere } from '../api/use-round-entries';
import { roundOrder, roundRoute, type RoundStart } from '../lib/round-route';
import { RoundEntryForm } from './round-entry-form';
import { RoundProgress } from './round-progress';
import { RoundStartPicker } from './round-start';
import { TreeJump } from './tree-jump';

const PREFETCH_AHEAD = 12;

/** `?from=<treeId>` or `?at=<lat>,<lng>`: the start survives a reload. */
function useRoundStart(): [RoundStart, (start: RoundStart) => void] {
  const [params, setParams] = useSearchParams();
  const from = Number(params.get('from'));
  const at = params.get('at')?.split(',').map(Number);
  const start: RoundStart =
    Number.isInteger(from) && from > 0
      ? { treeId: from }
      : at && at.length === 2 && at.every(Number.isFinite)
        ? { at: { lat: at[0], lng: at[1] } }
        : {};
  const setStart = (next: RoundStart) =>
    setParams(
      next.treeId !== undefined
        ? { from: String(next.treeId) }
        : next.at
          ? { at: `${next.at.lat.toFixed(6)},${next.at.lng.toFixed(6)}` }
          : {},
      { replace: true },
    );
  return [start, setStart];
}

/** The forester's measuring round: the trees not yet measured this season, in walking order. */
export function MeasuringRound({ sugarbushId }: { sugarbushId: number }) {
  const queryClient = useQueryClient();
  const round = useRound(sugarbushId);
  const { unit } = useUnitSystem();
  const [start, setStart] = useRoundStart();
  const [skipped, setSkipped] = useState<number[]>([]);
  const [chosenId, setChosenId] = useState<number | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const send = useSendFieldEntry();
  const data = round.data;
  const measuredHere = useMeasuredHere(data?.season);

  const startKey = JSON.stringify(start);
  // The same trees from the same start give the same order: a refetch does not reshuffle it.
  const order = useMemo(
    () => (data ? roundOrder(data.trees, JSON.parse(startKey) as RoundStart) : []),
    [data, startKey],
  );
  const byId = useMemo(() => new Map((data?.trees ?? []).map((t) => [t.id, t])), [data]);
  const route = roundRoute(order, measuredHere, skipped);
  const chosen = chosenId !== null ? byId.get(chosenId) : undefined;
  const tree: RoundTree | undefined = chosen ?? route.ahead[0] ?? route.skipped[0];

  const aheadIds = route.ahead
    .slice(0, PREFETCH_AHEAD)
    .map((t) => t.id)
    .join(',');
  useEffect(() => {
    if (aheadIds) prefetchTreeRecords(queryClient, aheadIds.split(',').map(Number));
  }, [queryClient, aheadIds]);

  if (round.isPending) return <TableSkeleton rows={4} label="Loading the round" />;
  if (round.isError || !data)
    return (
      <ErrorState
        title="We couldn't load the round."
        error={round.error}
        onRetry={() => void round.refetch()}
      />
    );

  const due = data.trees.length;
  const measured = data.trees.filter((t) => t.measured || measuredHere.has(t.id)).length;

  const record = (input: MeasurementInput) => {
    if (!tree) return;
    send.mutate({
      kind: 'measurement',
      clientId: newClientId(),
      treeId: tree.id,
      tag: tree.tag,
      input,
    });
    setNotice(`Recorded tree ${tree.tag}: DBH ${formatDbh(input.dbhCm, unit)}.`);
    setSkipped((s) => s.filter((id) => id !== tree.id));
    setChosenId(null);
  };
  const skip = () => {
    if (!tree) return;
    setSkipped((s) => [...s.filter((id) => id !== tree.id), tree.id]);
    setChosenId(null);
    setNotice(`Skipped tree ${tree.tag}: it waits at the end of the route.`);
  };

  return (
    <div data-round className="flex flex-col gap-5">
      <RoundProgress measured={measured} due={due} season={data.season} />
      <p role="status" className="min-h-6 text-moss">
        {notice}
      </p>

      {due === 0 ? (
        <EmptyState title="No living trees in this stand yet">
          Add trees on the map or import the register first.
        </EmptyState>
      ) : !tree ? (
        <EmptyState title={`Every tree is measured for ${data.season}`}>
          Readings still waiting to send go out as soon as there is a network.
        </EmptyState>
      ) : (
        <section aria-labelledby="round-tree" className="flex flex-col gap-4">
          <div className="rounded border border-rule p-4">
            <p className="text-sm text-bark">
              {chosen ? 'Chosen by tag' : route.ahead[0] ? 'Next on the route' : 'Skipped earlier'}
            </p>
            <h2 id="round-tree" className="text-2xl font-bold">
              Tree {tree.tag}
            </h2>
            <p className="mt-1">
              Last DBH {formatDbh(tree.latestDbhCm, unit)}
              {tree.latestMeasuredOn ? ` on ${formatDate(tree.latestMeasuredOn)}` : ''}
              {tree.status === 'held-out' ? ' · held out of tapping' : ''}
            </p>
            {(tree.measured || measuredHere.has(tree.id)) && (
              <p className="mt-1 font-bold">
                Already measured in {data.season}: this adds a reading.
              </p>
            )}
            <div className="mt-4">
              <RoundEntryForm key={tree.id} tree={tree} round={data} onRecord={record} />
            </div>
            <Button block onClick={skip} field className="mt-3">
              Skip this tree for now
            </Button>
          </div>
        </section>
      )}

      <TreeJump trees={data.trees} onChoose={(t) => setChosenId(t.id)} />

      {route.ahead.length > 1 && (
        <section aria-labelledby="round-ahead">
          <h2 id="round-ahead" className="text-lg font-bold">
            Coming up
          </h2>
          <p className="mt-1 break-words">
            {route.ahead
              .slice(1, 6)
              .map((t) => t.tag)
              .join(' · ')}
          </p>
        </section>
      )}

      {route.skipped.length > 0 && (
        <section aria-labelledby="round-skipped">
          <h2 id="round-skipped" className="text-lg font-bold">
            Skipped — come back
          </h2>
          <ul className="mt-2 flex flex-wrap gap-2">
            {route.skipped.map((t) => (
              <li key={t.id}>
                <Button field onClick={() => setChosenId(t.id)}>
                  Measure {t.tag}
                </Button>
              </li>
            ))}
          </ul>
        </section>
      )}

      <CautionBox title="In the woods">
        <p>
          Watch your footing on ice, wet rock and slopes, and look up before you stand under a tree
          with heavy dieback: dead limbs fall without warning. Tell someone where you walk and when
          you expect to be back. Local rules and your employer&apos;s safety plan come first.
        </p>
      </CautionBox>

      <section aria-labelledby="round-start" className="border-t border-rule pt-4">
        <h2 id="round-start" className="text-lg font-bold">
          Start of the route
        </h2>
        <p className="mb-3 mt-1 text-sm">
          The route runs from the start to the nearest tree not measured yet, and on from there.
        </p>
        <RoundStartPicker
          trees={data.trees}
          onStart={(s) => {
            setStart(s);
            setChosenId(null);
            setSkipped([]);
          }}
        />
      </section>
    </div>
  );
}

import { useAdviceStatus } from '@/lib/advice-status';

const number = new Intl.NumberFormat('en-US');

/**
 * While a whole stand is re-advised (a new guideline, a new season), what a page waiting for the
 * advice shows: how far the update has come. Nothing once the advice is current.
 */
export function AdviceProgress({
  sugarbushId,
  season,
  waiting,
}: {
  sugarbushId: number;
  season?: number;
  waiting: boolean;
}) {
  const { data } = useAdviceStatus(sugarbushId, season, waiting);
  if (!waiting || data?.state !== 'updating') return null;
  const { done, total } = data;
  return (
    <div className="mb-4 flex flex-col gap-2" aria-live="polite">
      <p>
        Updating the advice for {data.season}
        {total > 0 ? `: ${number.format(done)} of ${number.format(total)} trees` : '…'}
      </p>
      {total > 0 && (
        <progress
          className="h-2 w-full max-w-md accent-sap"
          value={done}
          max={total}
          aria-label="Advice updated so far"
        />
      )}
    </div>
  );
}

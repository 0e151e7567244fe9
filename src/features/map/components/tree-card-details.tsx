import { Button } from '@/components/ui/button';
import { Skeleton } from '@/components/ui/skeleton';
import { formatDate, formatDbh, type LengthUnit } from '@/lib/units';
import type { useTreeDetails } from '../api/get-tree-details';
import { describePlacement } from '../lib/compass';

type Details = ReturnType<typeof useTreeDetails>;

const Pending = ({ className = 'w-20' }: { className?: string }) => (
  <Skeleton className={`inline-block h-4 align-middle ${className}`} />
);

/** The DBH the season's advice reads and the date of the last measurement, as rows of the card. */
export function TreeCardFigures({ details, unit }: { details: Details; unit: LengthUnit }) {
  const { record, advice } = details;
  return (
    <>
      <dt className="font-bold">DBH</dt>
      <dd className="tabular-nums">
        {advice.isPending ? (
          <Pending />
        ) : advice.isSuccess ? (
          formatDbh(advice.data.dbhCm, unit)
        ) : (
          '–'
        )}
      </dd>
      <dt className="font-bold">Last measured</dt>
      <dd className="tabular-nums">
        {record.isPending ? (
          <Pending className="w-24" />
        ) : record.isSuccess ? (
          formatDate(record.data.latestMeasuredOn)
        ) : (
          '–'
        )}
      </dd>
    </>
  );
}

/** Where to drill, once the advice is in; a skeleton while it loads, a retry if it failed. */
export function TreeCardDetails({
  details,
  tapped,
  unit,
}: {
  details: Details;
  tapped: boolean;
  unit: LengthUnit;
}) {
  const { record, advice } = details;
  const failed = [record, advice].filter((q) => q.isError);
  return (
    <>
      {(record.isPending || advice.isPending) && (
        <p role="status" className="sr-only">
          Loading the tree’s details…
        </p>
      )}
      {tapped && advice.isPending && (
        <div aria-hidden="true" className="mt-2 flex flex-col gap-1.5 pl-5">
          <Pending className="w-48" />
          <Pending className="w-40" />
        </div>
      )}
      {advice.isSuccess && advice.data.placements.length > 0 && (
        <ul aria-label="Where to drill" className="mt-1 list-disc pl-5 text-sm tabular-nums">
          {advice.data.placements.map((p, i) => (
            <li key={i}>{describePlacement(p, unit)}</li>
          ))}
        </ul>
      )}
      {failed.length > 0 && (
        <div role="alert" className="mt-3 rounded border border-alert/40 p-3 text-sm">
          <p className="text-alert">We couldn’t load this tree’s details.</p>
          <Button className="mt-2" onClick={() => failed.forEach((q) => void q.refetch())}>
            Retry
          </Button>
        </div>
      )}
    </>
  );
}

import { formatNumber } from '@/lib/units';
import { Button } from './button';

/** The rows one page shows, counted from 1: page 2 of 50 holds rows 51–100. */
export function pageRange(page: number, pageSize: number, total: number) {
  return {
    first: (page - 1) * pageSize + 1,
    last: Math.min(page * pageSize, total),
    hasNext: page * pageSize < total,
  };
}

/** "51–100 of 1,203" with Previous and Next; `label` names the navigation landmark. */
export function Pager({
  label,
  list,
  onPage,
}: {
  label: string;
  /** Where the list stands: this page's number, its size and how many rows there are in all. */
  list: { page: number; pageSize: number; total: number };
  onPage: (page: number) => void;
}) {
  const { page, pageSize, total } = list;
  const { first, last, hasNext } = pageRange(page, pageSize, total);
  return (
    <nav aria-label={label} className="mt-4 flex flex-wrap items-center justify-between gap-3">
      <p className="tabular-nums" aria-live="polite">
        {formatNumber(first)}–{formatNumber(last)} of {formatNumber(total)}
      </p>
      <div className="flex gap-2">
        <Button disabled={page <= 1} onClick={() => onPage(page - 1)}>
          Previous
        </Button>
        <Button disabled={!hasNext} onClick={() => onPage(page + 1)}>
          Next
        </Button>
      </div>
    </nav>
  );
}

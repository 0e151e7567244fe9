import { Link } from 'react-router';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { paths } from '@/config/paths';

/**
 * What a list of a stand's trees says when it has no rows: with a search or filter on, how to
 * clear it; otherwise how to add the first tree.
 */
export function TreeListEmpty({
  sugarbushId,
  filtered,
  q,
  onClear,
}: {
  sugarbushId: number;
  filtered: boolean;
  q: string | undefined;
  onClear: () => void;
}) {
  if (filtered) {
    return (
      <EmptyState title={q ? `No trees match '${q}'` : 'No trees match these filters'}>
        <Button variant="quiet" onClick={onClear}>
          Clear search and filters
        </Button>
      </EmptyState>
    );
  }
  return (
    <EmptyState title="No trees yet — import a CSV or add the first tree on the map">
      <Link to={paths.map.href(sugarbushId)} className="underline underline-offset-4">
        Open the map
      </Link>
    </EmptyState>
  );
}

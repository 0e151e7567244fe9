import { Link } from 'react-router';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { paths } from '@/config/paths';
import { can, roleLabels, rolesFor, useRole } from '@/lib/auth';

/**
 * What a list of a stand's trees says when it has no rows: with a search or filter on, how to
 * clear it; otherwise how to add the first tree, or, to someone who may not add trees, who can.
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
  const role = useRole(sugarbushId);
  if (filtered) {
    return (
      <EmptyState title={q ? `No trees match '${q}'` : 'No trees match these filters'}>
        <Button variant="quiet" onClick={onClear}>
          Clear search and filters
        </Button>
      </EmptyState>
    );
  }
  if (!can(role, 'edit-trees')) {
    const who = rolesFor('edit-trees').map((r) => `${roleLabels[r].toLowerCase()}s`);
    return (
      <EmptyState title="No trees yet">
        In this sugarbush, {who.join(' and ')} add the trees on the map. Once they do, every tree
        appears here with its tag, DBH and status.
      </EmptyState>
    );
  }
  return (
    <EmptyState title="No trees yet — add the first tree on the map">
      <p>
        On the map, stand beside the tree and choose “Add tree here”, or choose “Add tree by
        clicking the map”. Then give it its tag and species.
      </p>
      <Link
        to={paths.map.href(sugarbushId)}
        className="mt-3 inline-flex min-h-11 items-center underline underline-offset-4 md:min-h-0"
      >
        Open the map
      </Link>
    </EmptyState>
  );
}

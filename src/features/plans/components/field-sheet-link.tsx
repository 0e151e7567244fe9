import { paths } from '@/config/paths';
import { seasonParam } from '@/lib/season';
import { cn } from '@/components/ui/cn';
import { Link } from 'react-router';
import type { PlanFilters } from '../api/plan-keys';

/** To the printable sheet of every tree to tap, through the plan's filters (not its page). */
export function FieldSheetLink({
  sugarbushId,
  filters,
}: {
  sugarbushId: number;
  filters: PlanFilters;
}) {
  const { season, q, verdict, warning, share } = filters;
  return (
    <Link
      to={paths.fieldSheet.href(sugarbushId, {
        season: seasonParam(season),
        q,
        verdict,
        warning,
        share,
      })}
      className={cn(
        'inline-flex min-h-11 items-center justify-center rounded border border-bark/40 bg-paper px-4',
        'text-ink hover:bg-frost md:min-h-9 print:hidden',
      )}
    >
      Print field sheet
    </Link>
  );
}

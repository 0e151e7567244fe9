import type { FilterSelectSpec } from '@/components/ui/filter-selects';
import { ListFilterBar } from '@/components/ui/list-filter-bar';
import { shareFilter, verdictFilter, warningFilter } from '@/lib/advice-options';
import type { ListPatch } from '@/lib/list-search-params';
import type { PlanFilters } from '../api/plan-keys';

const selects: FilterSelectSpec<PlanFilters> = {
  verdict: verdictFilter,
  warning: warningFilter,
  share: shareFilter,
};

interface Props {
  filters: PlanFilters;
  onChange: (patch: ListPatch<PlanFilters>, options?: { replace?: boolean }) => void;
}

/** Search by tag, then narrow the plan by verdict, warning or clear wood; not on the printed sheet. */
export function PlanFilterBar({ filters, onChange }: Props) {
  return (
    <ListFilterBar
      filters={filters}
      selects={selects}
      onChange={onChange}
      className="print:hidden"
    />
  );
}

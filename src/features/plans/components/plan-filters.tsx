import type { FilterSelectSpec } from '@/components/ui/filter-selects';
import { ListFilterBar } from '@/components/ui/list-filter-bar';
import { verdictFilter, warningFilter } from '@/lib/advice-options';
import type { ListPatch } from '@/lib/list-search-params';
import type { PlanFilters } from '../api/plan-keys';

const selects: FilterSelectSpec<PlanFilters> = { verdict: verdictFilter, warning: warningFilter };

interface Props {
  filters: PlanFilters;
  onChange: (patch: ListPatch<PlanFilters>, options?: { replace?: boolean }) => void;
}

/** Search by tag, then narrow the plan by verdict or warning; the printed sheet leaves it out. */
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

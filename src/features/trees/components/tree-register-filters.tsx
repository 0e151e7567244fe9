import type { FilterSelectSpec } from '@/components/ui/filter-selects';
import { ListFilterBar } from '@/components/ui/list-filter-bar';
import type { ListPatch } from '@/lib/list-search-params';
import { speciesFilter, statusFilter } from '@/lib/tree-options';
import type { TreeListFilters } from '../api/tree-keys';

const selects: FilterSelectSpec<TreeListFilters> = { status: statusFilter, species: speciesFilter };

interface Props {
  filters: TreeListFilters;
  onChange: (patch: ListPatch<TreeListFilters>, options?: { replace?: boolean }) => void;
}

/** Search by tag, then narrow the register by status or species. */
export function TreeRegisterFilters({ filters, onChange }: Props) {
  return <ListFilterBar filters={filters} selects={selects} onChange={onChange} />;
}

import {
  species,
  speciesLabels,
  treeStatuses,
  treeStatusLabels,
  type Species,
  type TreeStatus,
} from '@shared/schemas/enums';
import type { SelectFilter, SelectOption } from '@/components/ui/select-field';

/** Every species, in the order the schema lists them, for a select. */
export const speciesOptions: readonly SelectOption<Species>[] = species.map((s) => ({
  value: s,
  label: speciesLabels[s],
}));

/** Every tree status, for a select. */
export const statusOptions: readonly SelectOption<TreeStatus>[] = treeStatuses.map((s) => ({
  value: s,
  label: treeStatusLabels[s],
}));

export const speciesFilter: SelectFilter<Species> = {
  label: 'Species',
  all: 'All species',
  options: speciesOptions,
};

export const statusFilter: SelectFilter<TreeStatus> = {
  label: 'Status',
  all: 'All statuses',
  options: statusOptions,
};

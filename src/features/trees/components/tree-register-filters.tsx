import {
  species as speciesList,
  speciesLabels,
  treeStatuses,
  treeStatusLabels,
  type Species,
  type TreeStatus,
} from '@shared/schemas/enums';
import { Field, controlClass } from '@/components/ui/field';
import type { TreeListFilters } from '../api/tree-keys';
import { TagSearch } from './tag-search';

interface Props {
  filters: TreeListFilters;
  onSearch: (q: string) => void;
  onStatus: (status: TreeStatus | undefined) => void;
  onSpecies: (species: Species | undefined) => void;
}

export function TreeRegisterFilters({ filters, onSearch, onStatus, onSpecies }: Props) {
  return (
    <div className="mb-4 grid grid-cols-2 gap-3 sm:grid-cols-3">
      <div className="col-span-2 sm:col-span-1">
        <TagSearch value={filters.q ?? ''} onSearch={onSearch} />
      </div>
      <Field label="Status">
        {(control) => (
          <select
            {...control}
            value={filters.status ?? ''}
            onChange={(e) => onStatus((e.target.value || undefined) as TreeStatus | undefined)}
            className={controlClass}
          >
            <option value="">All statuses</option>
            {treeStatuses.map((s) => (
              <option key={s} value={s}>
                {treeStatusLabels[s]}
              </option>
            ))}
          </select>
        )}
      </Field>
      <Field label="Species">
        {(control) => (
          <select
            {...control}
            value={filters.species ?? ''}
            onChange={(e) => onSpecies((e.target.value || undefined) as Species | undefined)}
            className={controlClass}
          >
            <option value="">All species</option>
            {speciesList.map((s) => (
              <option key={s} value={s}>
                {speciesLabels[s]}
              </option>
            ))}
          </select>
        )}
      </Field>
    </div>
  );
}

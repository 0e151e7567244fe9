import { verdicts, warningCodes, type VerdictKey, type WarningCode } from '@shared/rules/index';
import { Field, controlClass } from '@/components/ui/field';
import { warningLabel } from '@/features/advice/warning-labels';
import { TagSearch } from '@/features/trees/components/tag-search';
import type { PlanFilters } from '../api/plan-keys';

interface Props {
  filters: PlanFilters;
  onSearch: (q: string) => void;
  onVerdict: (verdict: VerdictKey | undefined) => void;
  onWarning: (warning: WarningCode | undefined) => void;
}

export function PlanFilterBar({ filters, onSearch, onVerdict, onWarning }: Props) {
  return (
    <div className="mb-4 grid grid-cols-2 gap-3 sm:grid-cols-3 print:hidden">
      <div className="col-span-2 sm:col-span-1">
        <TagSearch value={filters.q ?? ''} onSearch={onSearch} />
      </div>
      <Field label="Verdict">
        {(control) => (
          <select
            {...control}
            value={filters.verdict ?? ''}
            onChange={(e) => onVerdict((e.target.value || undefined) as VerdictKey | undefined)}
            className={controlClass}
          >
            <option value="">All verdicts</option>
            {verdicts.map((v) => (
              <option key={v.key} value={v.key}>
                {v.letter} · {v.label}
              </option>
            ))}
          </select>
        )}
      </Field>
      <Field label="Warning">
        {(control) => (
          <select
            {...control}
            value={filters.warning ?? ''}
            onChange={(e) => onWarning((e.target.value || undefined) as WarningCode | undefined)}
            className={controlClass}
          >
            <option value="">Any or none</option>
            {warningCodes.map((c) => (
              <option key={c} value={c}>
                {warningLabel(c)}
              </option>
            ))}
          </select>
        )}
      </Field>
    </div>
  );
}

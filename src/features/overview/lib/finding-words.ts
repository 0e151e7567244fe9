import type { ComplianceFinding } from '@shared/rules/index';
import { complianceFindings, profileKeys, profiles } from '@shared/rules/index';
import type { ComplianceFilter } from '@shared/schemas/compliance';
import type { SelectFilter, SelectOption } from '@/components/ui/select-field';

/** Each finding in a few words, for a chip, a filter and the printed report. */
export const findingLabels: Record<ComplianceFinding, string> = {
  over: 'More taps than allowed',
  'too-close': 'Holes too close',
  'too-small': 'Tapped too small',
  declining: 'Tapped while declining',
  unmeasured: 'No DBH before the season',
};

export const findingFilter: SelectFilter<ComplianceFilter> = {
  label: 'Finding',
  all: 'Every tapped tree',
  options: [
    { value: 'any', label: 'Any finding' },
    { value: 'none', label: 'No finding' },
    ...complianceFindings.map((f) => ({ value: f, label: findingLabels[f] })),
  ],
};

/** The guidelines the report can hold the tapping against; the stand's custom set where it has one. */
export function guidelineOptions(hasCustom: boolean): SelectOption<string>[] {
  return [
    ...profileKeys.map((key) => ({ value: key, label: profiles[key].label })),
    ...(hasCustom ? [{ value: 'custom', label: 'This stand’s custom guideline' }] : []),
  ];
}

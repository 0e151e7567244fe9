import { verdicts, warningCodes, type VerdictKey, type WarningCode } from '@shared/rules/index';
import { shareBands, type ShareBandKey } from '@shared/schemas/share-bands';
import type { SelectFilter } from '@/components/ui/select-field';
import { warningLabel } from './warning-labels';

/** Trees by what the advisor says, each verdict with its letter: "T · Tap". */
export const verdictFilter: SelectFilter<VerdictKey> = {
  label: 'Verdict',
  all: 'All verdicts',
  options: verdicts.map((v) => ({ value: v.key, label: `${v.letter} · ${v.label}` })),
};

/** Trees by one advisor warning, in its short words. */
export const warningFilter: SelectFilter<WarningCode> = {
  label: 'Warning',
  all: 'Any or none',
  options: warningCodes.map((c) => ({ value: c, label: warningLabel(c) })),
};

/** Trees big enough to tap by how much clear wood their tapping zone has left. */
export const shareFilter: SelectFilter<ShareBandKey> = {
  label: 'Clear wood',
  all: 'Any share',
  options: shareBands.map((b) => ({ value: b.key, label: b.label })),
};

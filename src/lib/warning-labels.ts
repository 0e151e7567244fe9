import type { WarningCode } from '@shared/rules/index';

export type WarningWeight = 'caution' | 'note';

interface WarningLabel {
  /** A few words for a chip or a filter. */
  label: string;
  /** `caution` asks for a change at the tree; `note` asks for a look or a measurement. */
  weight: WarningWeight;
}

/** Every advisor warning in Clearwood's own short words, in one place. */
export const warningLabels: Record<WarningCode, WarningLabel> = {
  undersized: { label: 'Too small', weight: 'note' },
  overtapped: { label: 'Tapped too hard', weight: 'caution' },
  'too-close': { label: 'Holes too close', weight: 'caution' },
  'slow-growth': { label: 'Slow growth', weight: 'caution' },
  'growth-limits-taps': { label: 'Growth carries fewer taps', weight: 'caution' },
  'crown-dieback': { label: 'Crown dieback', weight: 'caution' },
  'zone-depleted': { label: 'Little clear wood left', weight: 'caution' },
  'stale-measurement': { label: 'Measured or rated long ago', weight: 'note' },
  'no-measurement': { label: 'No DBH yet', weight: 'note' },
  'spout-7-16': { label: 'Old 7/16 in holes', weight: 'note' },
  'growth-unknown': { label: 'Growth not known yet', weight: 'note' },
  'growth-suspect': { label: 'DBH looks wrong', weight: 'caution' },
  'measurement-outlier': { label: 'Reading left out', weight: 'note' },
};

/** The mark beside a warning's words, so its weight never rests on colour alone. */
export const warningMarks: Record<WarningWeight, { mark: string; name: string }> = {
  caution: { mark: '!', name: 'Caution' },
  note: { mark: 'i', name: 'Note' },
};

export const warningLabel = (code: string): string =>
  (warningLabels as Record<string, WarningLabel | undefined>)[code]?.label ?? code;

export const warningWeight = (code: string): WarningWeight =>
  (warningLabels as Record<string, WarningLabel | undefined>)[code]?.weight ?? 'note';

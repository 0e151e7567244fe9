import { verdicts, type VerdictKey } from '@shared/rules/verdicts';
import { colors } from '@/lib/theme';

/** The second cue beside colour: every verdict has its own outline, and its letter up close. */
export type MarkerShape = 'circle' | 'diamond' | 'ring' | 'triangle' | 'square' | 'open-square';

export interface VerdictStyle {
  key: VerdictKey;
  label: string;
  letter: string;
  description: string;
  shape: MarkerShape;
  /** Fill for solid shapes, outline for open ones. */
  color: string;
  /** The Tailwind class of the same colour, for swatches in HTML. */
  colorClass: string;
  /** Ink that reads on the shape, for the letter. */
  letterColor: string;
  solid: boolean;
}

const looks: Record<VerdictKey, Pick<VerdictStyle, 'shape' | 'color' | 'colorClass' | 'solid'>> = {
  tap: { shape: 'circle', color: colors.advice.tap, colorClass: 'bg-advice-tap', solid: true },
  'tap-reduced': {
    shape: 'diamond',
    color: colors.advice.reduced,
    colorClass: 'bg-advice-reduced',
    solid: true,
  },
  rest: { shape: 'ring', color: colors.advice.rest, colorClass: 'bg-advice-rest', solid: false },
  'too-small': {
    shape: 'triangle',
    color: colors.advice.small,
    colorClass: 'bg-advice-small',
    solid: true,
  },
  retired: {
    shape: 'square',
    color: colors.advice.retired,
    colorClass: 'bg-advice-retired',
    solid: true,
  },
  unmeasured: {
    shape: 'open-square',
    color: colors.advice.unknown,
    colorClass: 'bg-advice-unknown',
    solid: false,
  },
};

export const verdictStyles: readonly VerdictStyle[] = verdicts.map((v) => ({
  key: v.key,
  label: v.label,
  letter: v.letter,
  description: v.description,
  ...looks[v.key],
  letterColor: v.key === 'retired' ? colors.paper : colors.ink,
}));

export const verdictStyle = (key: VerdictKey): VerdictStyle =>
  verdictStyles.find((s) => s.key === key) ?? verdictStyles[verdictStyles.length - 1];

/** Dots grow as the map zooms in, so a stand reads as a pattern far out and as trees up close. */
export function markerRadius(zoom: number): number {
  if (zoom >= 20) return 13;
  if (zoom >= 19) return 10;
  if (zoom >= 18) return 7;
  if (zoom >= 17) return 5;
  return 4;
}

/** Letters are drawn on the markers once there is room for them. */
export const LETTER_ZOOM = 19;
export const showsLetters = (zoom: number) => zoom >= LETTER_ZOOM;

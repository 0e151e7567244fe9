import { formatDbh, toCm, type LengthUnit } from '@/lib/units';

/** "1 tap from 30.5 cm, 2 taps from 45.7 cm": a guideline's table in the user's unit. */
export function bandsLine(bands: readonly { fromCm: number; taps: number }[], unit: LengthUnit) {
  return bands
    .map((b) => `${b.taps} ${b.taps === 1 ? 'tap' : 'taps'} from ${formatDbh(b.fromCm, unit)}`)
    .join(', ');
}

/** A custom set's bands as written (edges in its own unit) with the edges in cm. */
export const bandsInCm = (profile: {
  unit: 'in' | 'cm';
  bands: { from: number; taps: number }[];
}) => profile.bands.map((b) => ({ taps: b.taps, fromCm: toCm(b.from, profile.unit) }));

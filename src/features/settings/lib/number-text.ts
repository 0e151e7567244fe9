import { fromCm, parseDecimal, roundTo, toCm, type LengthUnit } from '@/lib/units';
import type { NumberKind } from './custom-profile-form';
import { formatShort } from './plain-issues';

/** "5/16" or "1 3/4" as numbers; anything else as `parseDecimal` reads it. */
export function parseNumberText(text: string): number | undefined {
  const fraction = /^\s*(?:(\d+)\s+)?(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
  if (fraction) {
    const [, whole, num, den] = fraction;
    return Number(den) === 0 ? Number.NaN : Number(whole ?? 0) + Number(num) / Number(den);
  }
  return parseDecimal(text);
}

/** The unit word shown beside a field of this kind. */
export function unitWord(kind: NumberKind, unit: LengthUnit): string | undefined {
  if (kind === 'length' || kind === 'bit') return unit;
  if (kind === 'share' || kind === 'percent') return '%';
  return undefined;
}

/** A stored value (cm, a 0–1 share, a percentage, a count) as the field shows it. */
export function toShown(value: number, kind: NumberKind, unit: LengthUnit): string {
  if (kind === 'share') return formatShort(value * 100, 1);
  if (kind === 'length' || kind === 'bit') {
    const shown = fromCm(value, unit);
    if (kind === 'bit' && unit === 'in') {
      const sixtyFourths = Math.round(shown * 64);
      if (sixtyFourths > 0 && Math.abs(shown * 64 - sixtyFourths) < 1e-6)
        return fraction(sixtyFourths);
    }
    return formatShort(shown, 2).replace(/,/g, '');
  }
  return formatShort(value, 2).replace(/,/g, '');
}

/** What was typed as the stored value; NaN when it is not a number, undefined when empty. */
export function fromShown(text: string, kind: NumberKind, unit: LengthUnit): number | undefined {
  const typed = parseNumberText(text);
  if (typed === undefined || Number.isNaN(typed)) return typed;
  if (kind === 'share') return roundTo(typed / 100, 6);
  if (kind === 'length' || kind === 'bit') return roundTo(toCm(typed, unit), 7);
  return typed;
}

function fraction(sixtyFourths: number): string {
  let num = sixtyFourths;
  let den = 64;
  while (num % 2 === 0 && den > 1) {
    num /= 2;
    den /= 2;
  }
  if (den === 1) return String(num);
  const whole = Math.floor(num / den);
  return whole > 0 ? `${whole} ${num % den}/${den}` : `${num}/${den}`;
}

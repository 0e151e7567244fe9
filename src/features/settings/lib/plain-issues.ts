import type { z } from 'zod';
import { formatNumber, fromCm, roundTo, type LengthUnit } from '@/lib/units';

type Issue = Parameters<z.core.$ZodErrorMap>[0];

/** A bound as the field shows it: lengths in the user's unit, shares as percentages. */
export function boundText(path: readonly PropertyKey[], bound: number, unit: LengthUnit): string {
  const key = String([...path].reverse().find((p) => typeof p === 'string') ?? '');
  if (key.endsWith('Cm'))
    return `${formatShort(fromCm(bound, unit), unit === 'in' ? 2 : 1)} ${unit}`;
  if (key === 'floor') return `${formatNumber(bound * 100)} %`;
  if (key.endsWith('Pct')) return `${formatNumber(bound)} %`;
  if (key.endsWith('Deg')) return `${formatNumber(bound)}°`;
  return formatShort(bound, 2);
}

/** At most `digits` decimals and no trailing zeros: 23.62, 10.2, 4. */
export function formatShort(value: number, digits: number): string {
  const rounded = roundTo(value, digits);
  let shown = 0;
  while (shown < digits && roundTo(rounded, shown) !== rounded) shown += 1;
  return formatNumber(rounded, shown);
}

/**
 * Plain words for the checks a schema states without a message of its own ("Use 60 cm or
 * less" rather than "Too big: expected number to be <=60"), with the bound in the units the
 * field is shown in. Messages a schema writes itself are kept as written.
 */
export function plainIssues(unit: LengthUnit): z.core.$ZodErrorMap {
  return (issue: Issue) => {
    const path = issue.path ?? [];
    switch (issue.code) {
      case 'invalid_type':
        if (issue.expected === 'number') return 'Enter a number';
        if (issue.expected === 'int') return 'Use a whole number';
        if (issue.expected === 'string') return 'Fill this in';
        return undefined;
      case 'too_small': {
        const min = Number(issue.minimum);
        if (issue.origin === 'string')
          return min <= 1 ? 'Fill this in' : `Use at least ${min} characters`;
        if (issue.origin === 'array') return `Give at least ${min}`;
        if (issue.origin !== 'number') return undefined;
        const text = boundText(path, min, unit);
        return issue.inclusive ? `Use ${text} or more` : `Use more than ${text}`;
      }
      case 'too_big': {
        const max = Number(issue.maximum);
        if (issue.origin === 'string') return `Use at most ${max} characters`;
        if (issue.origin === 'array') return `Give at most ${max}`;
        if (issue.origin !== 'number') return undefined;
        const text = boundText(path, max, unit);
        return issue.inclusive ? `Use ${text} or less` : `Use less than ${text}`;
      }
      default:
        return undefined;
    }
  };
}

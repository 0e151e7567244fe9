import { cToF } from './units';

/**
 * How a day's low and high favour a sap run. Sap runs when the night freezes and the day thaws,
 * best with days in the 40s °F; a night near 25 °F before a day near 40 °F gives a strong run.
 */
export type SapRunOutlook = 'strong-run' | 'run' | 'light-run' | 'stays-frozen' | 'no-freeze';

export const sapRunLabels: Record<SapRunOutlook, string> = {
  'strong-run': 'Strong run likely',
  run: 'Sap should run',
  'light-run': 'A light run at best',
  'stays-frozen': 'No run: the day stays frozen',
  'no-freeze': 'No run: the night does not freeze',
};

export function freezeThaw(minC: number, maxC: number): SapRunOutlook {
  // Rounded to a millionth of a degree so that 40 °F entered in °F is 40 °F again here.
  const lowF = Math.round(cToF(Math.min(minC, maxC)) * 1e6) / 1e6;
  const highF = Math.round(cToF(Math.max(minC, maxC)) * 1e6) / 1e6;
  if (highF <= 32) return 'stays-frozen';
  if (lowF >= 32) return 'no-freeze';
  const hardFrost = lowF <= 28;
  const goodThaw = highF >= 40 && highF < 50;
  if (hardFrost && goodThaw) return 'strong-run';
  if (highF < 36 || lowF > 30) return 'light-run';
  return 'run';
}

/** How fast stored sap spoils at this temperature: suppressed near freezing, slow below 40 °F, rapid above 50 °F. */
export type SapSpoilage = 'suppressed' | 'slow' | 'moderate' | 'rapid';

export function sapSpoilage(tempC: number): SapSpoilage {
  const f = cToF(tempC);
  if (f <= 34) return 'suppressed';
  if (f < 40) return 'slow';
  if (f <= 50) return 'moderate';
  return 'rapid';
}

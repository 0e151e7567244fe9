import { minimumSustainableGrowth } from '../../shared/rules/index';
import type { NoteCategory } from '../../shared/schemas/enums';
import type { TreePlan } from './types';

export interface NoteDraft {
  /** Null for a note on the whole stand. */
  tag: string | null;
  category: NoteCategory;
  body: string;
  followUpOn: string | null;
  createdAt: string;
}

export const IN = 2.54;
export const size = (cm: number) => `${cm.toFixed(1)} cm (${(cm / IN).toFixed(1)} in)`;
export const latest = (p: TreePlan) => p.measurements[p.measurements.length - 1];
export const holes = (p: TreePlan, season: number) => p.tapholes.filter((t) => t.season === season);
export const lastTapped = (p: TreePlan) => Math.max(...p.tapholes.map((t) => t.season));

export function growthCmPerYear(p: TreePlan): number {
  const a = p.measurements[0];
  const b = latest(p);
  return (b.dbhCm - a.dbhCm) / (b.season - a.season);
}

/**
 * Basal-area growth in in²/yr over the record, and what `taps` a year need at that size by the
 * advisor's tapping-zone model (calibrated to the 2016 Forest Science figures: one tap at 10 in
 * about 1.4 in²/yr, two at 18 in about 2.6).
 */
export function basalArea(p: TreePlan, taps = 1): { grew: number; needed: number } {
  const a = p.measurements[0].dbhCm / IN;
  const b = latest(p).dbhCm / IN;
  const years = latest(p).season - p.measurements[0].season;
  return {
    grew: ((Math.PI / 4) * (b * b - a * a)) / years,
    needed: minimumSustainableGrowth({ dbhCm: latest(p).dbhCm, tapsPerYear: taps }),
  };
}

export const note = (category: NoteCategory, body: string, followUpOn: string | null = null) => ({
  category,
  body,
  followUpOn,
});

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
 * Basal-area growth in in²/yr over the record, and the minimum at that size: 1.4 in²/yr at 10 in
 * and 2.6 in²/yr at 18 in, straight line between and beyond (van den Berg, Perkins, Isselhardt,
 * Wilmot 2016, Forest Science 62(1) — P; beyond 18 in it is an extrapolation).
 */
export function basalArea(p: TreePlan): { grew: number; needed: number } {
  const a = p.measurements[0].dbhCm / IN;
  const b = latest(p).dbhCm / IN;
  const years = latest(p).season - p.measurements[0].season;
  return { grew: ((Math.PI / 4) * (b * b - a * a)) / years, needed: 1.4 + ((b - 10) * 1.2) / 8 };
}

export const note = (category: NoteCategory, body: string, followUpOn: string | null = null) => ({
  category,
  body,
  followUpOn,
});

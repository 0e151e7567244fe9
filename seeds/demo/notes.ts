import type { NoteDraft } from './note-helpers';
import { DEMO_PROBLEM_TAGS } from './problems';
import { standNotes } from './stand-notes';
import { NOTED, writers } from './tree-notes';
import type { ProblemCategory, TreePlan } from './types';

export type { NoteDraft };

/** The consultant's notes from the autumn 2026 visits, oldest first. */
export function consultantNotes(plans: TreePlan[]): NoteDraft[] {
  const byTag = new Map(plans.map((p) => [p.spec.tag, p]));
  const drafts: Omit<NoteDraft, 'createdAt'>[] = [];
  for (const [category, tags] of Object.entries(DEMO_PROBLEM_TAGS) as [
    ProblemCategory,
    string[],
  ][]) {
    for (const tag of tags.slice(0, NOTED[category])) {
      const plan = byTag.get(tag);
      if (plan) for (const n of writers[category](plan)) drafts.push({ tag, ...n });
    }
  }
  drafts.push(...standNotes(plans));
  return drafts.map((d, i) => {
    const day = 12 + Math.floor(i / 4);
    const minute = 10 + ((i * 7) % 45);
    return { ...d, createdAt: `2026-10-${String(day).padStart(2, '0')} 14:${minute}:00` };
  });
}

import type { NoteCategory } from '../../shared/schemas/enums';
import { holes, note, type NoteDraft } from './note-helpers';
import { DEMO_PROBLEM_TAGS } from './problems';
import type { TreePlan } from './types';

/** The consultant's notes on the stand as a whole (no tree). */
export function standNotes(plans: TreePlan[]): Omit<NoteDraft, 'createdAt'>[] {
  const lastHoles = plans.flatMap((p) => holes(p, 2026));
  const hits = lastHoles.filter((t) => t.stainHit).length;
  const unmapped = plans.filter((p) => p.lat === null).length;
  const lateral = DEMO_PROBLEM_TAGS['depleted-zone'];
  const stand = (category: NoteCategory, body: string, followUpOn: string | null = null) => ({
    tag: null,
    ...note(category, body, followUpOn),
  });
  return [
    stand(
      'health',
      `Autumn 2026 walk-through: most crowns rate 0–10 % dieback and growth is steady. The ` +
        `exceptions are listed tree by tree.`,
    ),
    stand(
      'tapping',
      `Stain showed in ${hits} of ${lastHoles.length} holes drilled in 2026 ` +
        `(${((100 * hits) / lastHoles.length).toFixed(1)} %).`,
    ),
    stand(
      'management',
      `Rest the ledge lateral (${lateral[0]} to ${lateral[lateral.length - 1]}) for 2027, then ` +
        `one tap a tree at most until growth picks up.`,
      '2027-03-01',
    ),
    stand(
      'management',
      `Keep the conservative set for 2027: none under 12 in, one from 12 to 18 in, two from 18 in.`,
    ),
    stand(
      'hazard',
      `Ice-storm hangers over the main lines along the north road. Walk the lines in pairs with ` +
        `a radio before tapping, and keep clear of the dead trees flagged here.`,
    ),
    ...(unmapped > 0
      ? [
          stand(
            'follow-up',
            `${unmapped} trees have no GPS point; take positions during the next measuring round.`,
            '2027-10-15',
          ),
        ]
      : []),
    stand(
      'follow-up',
      `The bucket section by the sugarhouse road goes on tubing next season; check the hole ` +
        `pattern on those trees before the new drops are hung.`,
      '2027-05-01',
    ),
  ];
}

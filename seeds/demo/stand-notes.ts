import type { NoteCategory } from '../../shared/schemas/enums';
import { DROUGHT_SEASON } from './growth';
import { holes, note, type NoteDraft } from './note-helpers';
import { DEMO_PROBLEM_TAGS } from './problems';
import { THINNING } from './thinning';
import type { TreePlan } from './types';

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return (s[Math.floor((s.length - 1) / 2)] + s[Math.ceil((s.length - 1) / 2)]) / 2;
}

/** What the thinning did: trees cut, and the median yearly DBH growth before and after it. */
function thinningFigures(plans: TreePlan[]) {
  const cut = plans.filter((p) => p.spec.removedOn?.startsWith(`${THINNING.firstSeason}-`));
  const residual = plans.filter((p) => p.spec.status === 'active' && p.measurements.length === 9);
  const dbh = (p: TreePlan, season: number) =>
    p.measurements.find((m) => m.season === season)!.dbhCm;
  const end = Math.max(...residual.map((p) => p.measurements[p.measurements.length - 1].season));
  const before = median(
    residual.map(
      (p) =>
        (dbh(p, DROUGHT_SEASON - 1) -
          dbh(p, DROUGHT_SEASON - 2) +
          dbh(p, DROUGHT_SEASON + 1) -
          dbh(p, DROUGHT_SEASON)) /
        2,
    ),
  );
  const after = median(
    residual.map((p) => (dbh(p, end) - dbh(p, THINNING.lastRound)) / (end - THINNING.lastRound)),
  );
  const drought = median(residual.map((p) => dbh(p, DROUGHT_SEASON) - dbh(p, DROUGHT_SEASON - 1)));
  return { cut: cut.length, before, after, drought };
}

/** The consultant's notes on the stand as a whole (no tree). */
export function standNotes(plans: TreePlan[]): Omit<NoteDraft, 'createdAt'>[] {
  const lastHoles = plans.flatMap((p) => holes(p, 2026));
  const hits = lastHoles.filter((t) => t.stainHit).length;
  const unmapped = plans.filter((p) => p.lat === null).length;
  const lateral = DEMO_PROBLEM_TAGS['depleted-zone'];
  const thinning = thinningFigures(plans);
  const stand = (category: NoteCategory, body: string, followUpOn: string | null = null) => ({
    tag: null,
    ...note(category, body, followUpOn),
  });
  return [
    stand(
      'finding',
      `Autumn 2026 walk-through: most crowns rate 0–10 % dieback and growth is steady. The ` +
        `exceptions are listed tree by tree.`,
    ),
    stand(
      'finding',
      `Since the thinning of January ${THINNING.firstSeason} (${thinning.cut} trees cut, mostly ` +
        `those crowding a better sugar maple) the trees left standing have added ` +
        `${thinning.after.toFixed(2)} cm of diameter a year, against ${thinning.before.toFixed(2)} ` +
        `cm in the ordinary summers before it; the ${DROUGHT_SEASON} drought summer added only ` +
        `${thinning.drought.toFixed(1)} cm.`,
    ),
    stand(
      'finding',
      `Stain showed in ${hits} of ${lastHoles.length} holes drilled in 2026 ` +
        `(${((100 * hits) / lastHoles.length).toFixed(1)} %).`,
    ),
    stand(
      'advice',
      `Rest the ledge lateral (${lateral[0]} to ${lateral[lateral.length - 1]}) for 2027, then ` +
        `one tap a tree at most until growth picks up.`,
      '2027-03-01',
    ),
    stand(
      'advice',
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

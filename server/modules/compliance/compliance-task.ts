import type { Knex } from 'knex';
import { seasonCompliance } from '../../../shared/rules/index';
import type { ComplianceReading } from '../../../shared/schemas/compliance';
import { profileOf } from '../advice/stand-guideline';
import { loadStandTrees } from '../plans/plans.repository';

/** A guideline as the stand's columns name it: a profile key, and the custom set when `custom`. */
export interface GuidelineChoice {
  profile: string;
  customJson: string | null;
}

/** A tree tapped in the season, read against each guideline asked for, in their order. */
export interface EvaluatedTree {
  treeId: number;
  tag: string;
  dbhBeforeCm: number | null;
  dbhMeasuredOn: string | null;
  diebackBeforePct: number | null;
  tapsSet: number;
  readings: ComplianceReading[];
}

/**
 * Every tree of the stand tapped in the season, held against each guideline (in a worker
 * thread: it walks every tree's record), in tag order.
 */
export async function evaluateCompliance(
  db: Knex,
  sugarbushId: number,
  season: number,
  guidelines: readonly GuidelineChoice[],
): Promise<EvaluatedTree[]> {
  const profiles = guidelines.map((g) => profileOf(g.profile, g.customJson));
  const trees = await loadStandTrees(db, sugarbushId);
  const out: EvaluatedTree[] = [];
  for (const tree of trees) {
    if (!tree.tapholes.some((h) => h.season === season)) continue;
    const readings = profiles.map((p) => seasonCompliance(tree, season, p));
    const first = readings[0];
    out.push({
      treeId: tree.id,
      tag: tree.tag,
      dbhBeforeCm: first.dbhBeforeCm,
      dbhMeasuredOn: first.dbhMeasuredOn,
      diebackBeforePct: first.diebackBeforePct,
      tapsSet: first.tapsSet,
      readings: readings.map((r) => ({
        tapsAllowed: r.tapsAllowed,
        tapsOver: r.tapsOver,
        holesTooClose: r.holesTooClose,
        findings: r.findings,
      })),
    });
  }
  return out;
}

import type { AppContext } from '../../context';
import { notFound } from '../../errors';
import { MAP_COORD_DECIMALS } from '../../../shared/schemas/map';
import { upcomingSeason } from '../../../shared/schemas/plan';
import type { RoundColumns, TreeRecordAnswer } from '../../../shared/schemas/round';
import { standGuideline } from '../advice/stand-guideline';
import { loadStandTrees } from '../plans/plans.repository';
import { roundRepository } from './round.repository';

const coord = (v: number | null) => (v === null ? null : Number(v.toFixed(MAP_COORD_DECIMALS)));

export function roundService(ctx: AppContext) {
  const repo = roundRepository(ctx.db);
  return {
    /** The round's trees from the stored columns: one query, no advice computed. */
    async round(sugarbushId: number, season: number): Promise<RoundColumns> {
      const [rows, guideline] = await Promise.all([
        repo.trees(sugarbushId, season),
        standGuideline(ctx.db, sugarbushId),
      ]);
      return {
        season,
        adviceSeason: upcomingSeason(),
        count: rows.length,
        ids: rows.map((r) => r.id),
        tags: rows.map((r) => r.tag),
        lat: rows.map((r) => coord(r.lat)),
        lng: rows.map((r) => coord(r.lng)),
        status: rows.map((r) => r.status),
        latestDbhCm: rows.map((r) => (r.latest_dbh_cm === null ? null : Number(r.latest_dbh_cm))),
        latestMeasuredOn: rows.map((r) => r.latest_measured_on),
        measured: rows.map((r) => (Number(r.measured) > 0 ? 1 : 0)),
        guideline: { profile: guideline.profile, sunnyAzimuthDeg: guideline.sunnyAzimuthDeg },
      };
    },

    /** One tree's standing record, as the advisor reads it. */
    async record(sugarbushId: number, treeId: number): Promise<TreeRecordAnswer> {
      const [tree] = await loadStandTrees(ctx.db, sugarbushId, treeId);
      if (!tree) throw notFound('Tree');
      const { recordVersion: _version, ...advisorTree } = tree;
      return { ...advisorTree, sugarbushId };
    },
  };
}

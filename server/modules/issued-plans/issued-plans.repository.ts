import type { Knex } from 'knex';
import type { PlanTotals, VerdictKey } from '../../../shared/rules/index';
import type {
  IssuedItem,
  IssuedPlacement,
  IssuedPlanHeader,
} from '../../../shared/schemas/issued-plan';
import { instant } from '../../lib/timestamps';

const ROWS_PER_STATEMENT = 50;

interface HeaderRow {
  id: number;
  season: number;
  version: number;
  issued_by: number | null;
  issued_by_name: string;
  issued_at: string;
  profile_key: string;
  profile_label: string;
  profile_source: string;
  advice_version: number;
  totals: string;
}

export interface IssuedTreeRow {
  tree_id: number;
  tag: string;
  verdict: string;
  taps: number;
  bit_cm: number | null;
  depth_cm: number | null;
  conductive_share: number;
  warning_mask: number;
  placements: string;
  hazards: string;
}

const header = (r: HeaderRow): IssuedPlanHeader => ({
  id: Number(r.id),
  season: Number(r.season),
  version: Number(r.version),
  issuedAt: instant(r.issued_at),
  issuedBy: { id: r.issued_by === null ? null : Number(r.issued_by), name: r.issued_by_name },
  profile: {
    key: r.profile_key,
    label: r.profile_label,
    source: r.profile_source,
    adviceVersion: Number(r.advice_version),
  },
  totals: JSON.parse(r.totals) as PlanTotals,
});

export const issuedItem = (r: IssuedTreeRow): IssuedItem => ({
  treeId: Number(r.tree_id),
  tag: r.tag,
  verdict: r.verdict as VerdictKey,
  taps: Number(r.taps),
  placements: JSON.parse(r.placements) as IssuedPlacement[],
  bitCm: r.bit_cm === null ? null : Number(r.bit_cm),
  depthCm: r.depth_cm === null ? null : Number(r.depth_cm),
  hazards: JSON.parse(r.hazards) as string[],
});

const headerColumns = [
  'id',
  'season',
  'version',
  'issued_by',
  'issued_by_name',
  'issued_at',
  'profile_key',
  'profile_label',
  'profile_source',
  'advice_version',
  'totals',
];

export function issuedPlansRepository(db: Knex) {
  return {
    /** The season's latest issue, or the version asked for. */
    async header(
      sugarbushId: number,
      season: number,
      version?: number,
    ): Promise<IssuedPlanHeader | null> {
      const row: HeaderRow | undefined = await db('issued_plans')
        .where({ sugarbush_id: sugarbushId, season })
        .modify((q) => {
          if (version !== undefined) q.where({ version });
        })
        .orderBy('version', 'desc')
        .first(headerColumns);
      return row ? header(row) : null;
    },

    async latestVersion(sugarbushId: number, season: number): Promise<number> {
      const row = await db('issued_plans')
        .where({ sugarbush_id: sugarbushId, season })
        .max({ v: 'version' })
        .first();
      return Number(row?.v ?? 0);
    },

    /** Every issue of the stand, newest season and version first. */
    async versions(sugarbushId: number): Promise<IssuedPlanHeader[]> {
      const rows: HeaderRow[] = await db('issued_plans')
        .where({ sugarbush_id: sugarbushId })
        .orderBy([
          { column: 'season', order: 'desc' },
          { column: 'version', order: 'desc' },
        ])
        .select(headerColumns);
      return rows.map(header);
    },

    /** A page of the frozen copy in tag order (the (plan, tag) index gives it). */
    async itemsPage(planId: number, offset: number, limit: number): Promise<IssuedItem[]> {
      const rows: IssuedTreeRow[] = await db('issued_plan_trees')
        .where({ issued_plan_id: planId })
        .orderBy('tag')
        .offset(offset)
        .limit(limit)
        .select('*');
      return rows.map(issuedItem);
    },

    /** These trees' lines of the frozen copy, by tree id. */
    async itemsOf(planId: number, treeIds: readonly number[]): Promise<Map<number, IssuedItem>> {
      if (treeIds.length === 0) return new Map();
      const rows: IssuedTreeRow[] = await db('issued_plan_trees')
        .where({ issued_plan_id: planId })
        .whereIn('tree_id', treeIds)
        .select('*');
      return new Map(rows.map((r) => [Number(r.tree_id), issuedItem(r)]));
    },

    /** Write one issue and its trees; the caller holds the transaction. */
    async insert(
      trx: Knex.Transaction,
      head: Omit<HeaderRow, 'id'> & { sugarbush_id: number },
      trees: readonly IssuedTreeRow[],
    ): Promise<number> {
      const [row] = await trx('issued_plans').insert(head).returning('id');
      const id = Number(typeof row === 'object' ? row.id : row);
      for (let i = 0; i < trees.length; i += ROWS_PER_STATEMENT)
        await trx('issued_plan_trees').insert(
          trees.slice(i, i + ROWS_PER_STATEMENT).map((t) => ({ ...t, issued_plan_id: id })),
        );
      return id;
    },
  };
}

/** Rows of the stand's stored advice made from each tree's current record and this guideline. */
export function currentAdvice(db: Knex, sugarbushId: number, season: number, standVersion: number) {
  return db('trees as t')
    .join('tree_advice as a', function () {
      this.on('a.tree_id', 't.id').andOn('a.season', db.raw('?', [season]));
    })
    .where('t.sugarbush_id', sugarbushId)
    .where('a.stand_version', standVersion)
    .whereRaw('a.tree_version = t.record_version');
}

/** The text of every open hazard note on a tree of the stand, oldest first, by tree. */
export async function standHazards(db: Knex, sugarbushId: number): Promise<Map<number, string[]>> {
  const rows: { tree_id: number; body: string }[] = await db('notes as n')
    .join('trees as t', 't.id', 'n.tree_id')
    .where('t.sugarbush_id', sugarbushId)
    .where('n.category', 'hazard')
    .whereNull('n.resolved_at')
    .orderBy(['n.tree_id', 'n.created_at', 'n.id'])
    .select('n.tree_id', 'n.body');
  const byTree = new Map<number, string[]>();
  for (const r of rows) {
    const id = Number(r.tree_id);
    byTree.set(id, [...(byTree.get(id) ?? []), r.body]);
  }
  return byTree;
}

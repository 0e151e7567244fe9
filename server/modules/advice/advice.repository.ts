import type { Knex } from 'knex';
import { warningCodes, type PlanTotals, type WarningCode } from '../../../shared/rules/index';
import { walkingOrder } from '../../../shared/geo/walking-order';
import { shareBands, sharedVerdicts } from '../../../shared/schemas/share-bands';
import { adviceColumns, warningBit, type AdviceRow } from './advice-rows';

/** Verdicts without a meaningful conductive share: they sort after every tapped tree. */
const untappable = ['too-small', 'retired', 'unmeasured'];

const ROWS_PER_STATEMENT = 100;

export interface AdviceStateRow {
  sugarbush_id: number;
  season: number;
  stand_version: number;
  state: 'current' | 'updating';
  done: number;
  total: number;
}

export interface PlanFilter {
  q?: string;
  verdict?: string;
  warning?: string;
  /** A conductive-share band (`shareBands`): trees big enough to tap whose share lies in it. */
  share?: string;
}

export type PlanSortKey = 'tag' | 'taps' | 'dbh' | 'share' | 'verdict' | 'walk';

/** Where a walking order starts (where the tapper stands); the stand's first tree without it. */
export interface WalkStart {
  lat: number;
  lng: number;
}

export function adviceRepository(db: Knex) {
  /**
   * Stored rows made from the tree's current record and the stand's current guideline. Written
   * from the trees' side, so tag order walks the (stand, tag) index and stops at the page's end.
   */
  const current = (sugarbushId: number, season: number, standVersion: number) =>
    db('trees as t')
      .join('tree_advice as a', function () {
        this.on('a.tree_id', 't.id').andOn('a.season', db.raw('?', [season]));
      })
      .where('t.sugarbush_id', sugarbushId)
      .where('a.stand_version', standVersion)
      .whereRaw('a.tree_version = t.record_version');

  const filtered = (
    sugarbushId: number,
    season: number,
    standVersion: number,
    f: PlanFilter,
  ): Knex.QueryBuilder | null => {
    if (f.warning && !(warningCodes as readonly string[]).includes(f.warning)) return null;
    const band = f.share === undefined ? undefined : shareBands.find((b) => b.key === f.share);
    if (f.share !== undefined && !band) return null;
    return current(sugarbushId, season, standVersion).modify((q) => {
      if (f.q) q.whereRaw('lower(t.tag) like ?', [`%${f.q.toLowerCase()}%`]);
      if (f.verdict) q.where('a.verdict', f.verdict);
      if (f.warning)
        q.whereRaw('(a.warning_mask & ?) <> 0', [warningBit(f.warning as WarningCode)]);
      if (band) {
        q.whereIn('a.verdict', sharedVerdicts).where('a.conductive_share', '>=', band.min);
        if (band.max !== null) q.where('a.conductive_share', '<', band.max);
      }
    });
  };

  return {
    /**
     * Write advice rows; a row never replaces one made from a newer record or guideline (a
     * stand-wide job finishing late cannot undo the advice a write just made).
     */
    async upsert(rows: readonly AdviceRow[]): Promise<void> {
      const set = adviceColumns
        .filter((c) => c !== 'tree_id' && c !== 'season')
        .map((c) => `${c} = excluded.${c}`)
        .join(', ');
      for (let i = 0; i < rows.length; i += ROWS_PER_STATEMENT) {
        const chunk = rows.slice(i, i + ROWS_PER_STATEMENT);
        const values = chunk.map(() => `(${adviceColumns.map(() => '?').join(', ')})`).join(', ');
        await db.raw(
          `insert into tree_advice (${adviceColumns.join(', ')}) values ${values}
           on conflict (tree_id, season) do update set ${set}
           where tree_advice.tree_version <= excluded.tree_version
             and tree_advice.stand_version <= excluded.stand_version`,
          chunk.flatMap((r) => adviceColumns.map((c) => r[c])),
        );
      }
    },

    /** Trees of the stand with no row made from their current record and this guideline version. */
    async staleTreeIds(
      sugarbushId: number,
      season: number,
      standVersion: number,
    ): Promise<number[]> {
      const rows: { id: number }[] = await db('trees as t')
        .leftJoin('tree_advice as a', function () {
          this.on('a.tree_id', 't.id').andOn('a.season', db.raw('?', [season]));
        })
        .where('t.sugarbush_id', sugarbushId)
        .where((w) =>
          w
            .whereNull('a.tree_id')
            .orWhereRaw('a.tree_version <> t.record_version')
            .orWhereNot('a.stand_version', standVersion),
        )
        .orderBy('t.id')
        .select('t.id');
      return rows.map((r) => Number(r.id));
    },

    async state(sugarbushId: number, season: number): Promise<AdviceStateRow | undefined> {
      return db('advice_state').where({ sugarbush_id: sugarbushId, season }).first();
    },

    /** Seasons of the stand whose advice is kept (each write re-advises its tree for these). */
    async keptSeasons(sugarbushId: number): Promise<number[]> {
      const rows = await db('advice_state').where({ sugarbush_id: sugarbushId }).select('season');
      return rows.map((r) => Number(r.season));
    },

    async setState(row: Omit<AdviceStateRow, 'updated_at'>): Promise<void> {
      await db('advice_state')
        .insert({ ...row, updated_at: new Date().toISOString() })
        .onConflict(['sugarbush_id', 'season'])
        .merge();
    },

    /**
     * A page in tag order with no filter: the (stand, tag) index gives the order, so this reads
     * only the page's rows however large the stand.
     */
    async tagPage(
      sugarbushId: number,
      season: number,
      standVersion: number,
      opts: { descending: boolean; offset: number; limit: number },
    ): Promise<{ treeId: number; tag: string; payload: string }[]> {
      const rows: { id: number; tag: string; payload: string }[] = await current(
        sugarbushId,
        season,
        standVersion,
      )
        .orderBy('t.tag', opts.descending ? 'desc' : 'asc')
        .offset(opts.offset)
        .limit(opts.limit)
        .select('t.id', 't.tag', 'a.payload');
      return rows.map((r) => ({ treeId: Number(r.id), tag: r.tag, payload: r.payload }));
    },

    /**
     * Every matching tree in the plan's order (filters, sort, ties by tag): the list a filtered or
     * re-sorted plan pages through. Whole-stand work: run it in a worker and keep the answer.
     */
    async orderedIds(
      sugarbushId: number,
      season: number,
      standVersion: number,
      opts: PlanFilter & { sort?: string; from?: WalkStart | null },
    ): Promise<number[]> {
      const base = filtered(sugarbushId, season, standVersion, opts);
      if (!base) return [];
      const key = (opts.sort ?? 'tag').replace(/^-/, '') as PlanSortKey;
      if (key === 'walk') {
        // The matching trees by tag, then the nearest-neighbour walk through them.
        const placed: { id: number; lat: number | null; lng: number | null }[] = await base
          .orderBy('t.tag')
          .select('t.id', 't.lat', 't.lng');
        return walkingOrder(placed, opts.from).map((r) => Number(r.id));
      }
      const dir = opts.sort?.startsWith('-') ? 'desc' : 'asc';
      const rows: { id: number }[] = await base
        .modify((q) => {
          if (key === 'share')
            q.orderByRaw(
              `case when a.verdict in (${untappable.map(() => '?').join(', ')}) then 1 else 0 end`,
              untappable,
            ).orderBy('a.conductive_share', dir);
          else if (key === 'taps') q.orderBy('a.taps', dir);
          else if (key === 'dbh') q.orderByRaw(`coalesce(a.dbh_cm, -1) ${dir}`);
          else if (key === 'verdict') q.orderBy('a.verdict', dir);
          q.orderBy('t.tag', key === 'tag' ? dir : 'asc');
        })
        .select('t.id');
      return rows.map((r) => Number(r.id));
    },

    /** The stored advice of these trees for the season, by tree id (one primary-key read each). */
    async payloads(
      season: number,
      standVersion: number,
      treeIds: readonly number[],
    ): Promise<Map<number, { tag: string; payload: string }>> {
      if (treeIds.length === 0) return new Map();
      const rows: { id: number; tag: string; payload: string }[] = await db('trees as t')
        .join('tree_advice as a', function () {
          this.on('a.tree_id', 't.id').andOn('a.season', db.raw('?', [season]));
        })
        .whereIn('t.id', treeIds)
        .where('a.stand_version', standVersion)
        .whereRaw('a.tree_version = t.record_version')
        .select('t.id', 't.tag', 'a.payload');
      return new Map(rows.map((r) => [Number(r.id), { tag: r.tag, payload: r.payload }]));
    },

    /** The season's totals over the stand, in one aggregate query. */
    async totals(sugarbushId: number, season: number, standVersion: number): Promise<PlanTotals> {
      const when = (condition: string) => `sum(case when ${condition} then 1 else 0 end)`;
      const verdictCount = (v: string) => when(`a.verdict = '${v}'`);
      const row = await current(sugarbushId, season, standVersion)
        .select(
          db.raw('count(*) as trees'),
          db.raw(`${when('a.taps > 0')} as to_tap`),
          db.raw('coalesce(sum(a.taps), 0) as taps'),
          db.raw(`${verdictCount('tap-reduced')} as reduced`),
          db.raw(`${verdictCount('rest')} as rested`),
          db.raw(`${verdictCount('too-small')} as too_small`),
          db.raw(`${verdictCount('retired')} as retired`),
          db.raw(`${verdictCount('unmeasured')} as unmeasured`),
          ...warningCodes.map((code, i) =>
            db.raw(`${when(`(a.warning_mask & ${warningBit(code)}) <> 0`)} as w${i}`),
          ),
        )
        .first();
      const num = (v: unknown) => Number(v ?? 0);
      return {
        trees: num(row.trees),
        treesToTap: num(row.to_tap),
        taps: num(row.taps),
        reduced: num(row.reduced),
        rested: num(row.rested),
        tooSmall: num(row.too_small),
        retired: num(row.retired),
        unmeasured: num(row.unmeasured),
        warningsByCode: Object.fromEntries(
          warningCodes.map((code, i) => [code, num(row[`w${i}`])]),
        ) as Record<WarningCode, number>,
      };
    },

    /** Every current row's taps and verdict, in tag order: what a guideline preview compares. */
    async all(sugarbushId: number, season: number, standVersion: number) {
      const rows = await current(sugarbushId, season, standVersion)
        .orderBy('t.tag')
        .select('t.id', 't.tag', 'a.verdict', 'a.taps', 'a.dbh_cm');
      return rows as {
        id: number;
        tag: string;
        verdict: string;
        taps: number;
        dbh_cm: number | null;
      }[];
    },
  };
}

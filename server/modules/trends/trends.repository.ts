import type { Knex } from 'knex';
import type { TreeStatus } from '../../../shared/schemas/enums';
import { treeStatuses } from '../../../shared/schemas/enums';

/** A tree of the stand as the trends read it: where it stands and when it was added. */
export interface TrendTreeRow {
  id: number;
  lat: number | null;
  lng: number | null;
  status: TreeStatus;
  createdOn: string;
}

/** A status a tree was given, by the audit trail: at creation or by a later edit. */
export interface StatusEvent {
  treeId: number;
  /** YYYY-MM-DD of the entry (UTC). */
  on: string;
  status: TreeStatus;
  created: boolean;
}

/** The stored columns of one tree's advice for a season (never its JSON). */
export interface TrendAdvice {
  verdict: string;
  taps: number;
  dbhCm: number | null;
  share: number;
  warningMask: number;
}

const isStatus = (s: unknown): s is TreeStatus =>
  typeof s === 'string' && (treeStatuses as readonly string[]).includes(s);

export function trendsRepository(db: Knex) {
  const ofStand = (table: string, alias: string, sugarbushId: number) =>
    db(`${table} as ${alias}`)
      .join('trees as t', 't.id', `${alias}.tree_id`)
      .where('t.sugarbush_id', sugarbushId);

  return {
    /** Seasons with a measurement or a taphole of the stand on record. */
    async recordedSeasons(sugarbushId: number): Promise<number[]> {
      const [measured, tapped] = await Promise.all([
        ofStand('measurements', 'm', sugarbushId).distinct('m.season'),
        ofStand('tapholes', 'h', sugarbushId).distinct('h.season'),
      ]);
      const seasons = new Set([...measured, ...tapped].map((r) => Number(r.season)));
      return [...seasons].sort((a, b) => a - b);
    },

    async trees(sugarbushId: number): Promise<TrendTreeRow[]> {
      const rows = await db('trees')
        .where({ sugarbush_id: sugarbushId })
        .orderBy('id')
        .select('id', 'lat', 'lng', 'status', 'created_at');
      return rows.map((r) => ({
        id: Number(r.id),
        lat: r.lat,
        lng: r.lng,
        status: r.status,
        createdOn: String(r.created_at).slice(0, 10),
      }));
    },

    /** Every status the trail gave the stand's trees, oldest first. */
    async statusEvents(sugarbushId: number): Promise<StatusEvent[]> {
      const rows: { entity_id: number; action: string; detail: string; created_at: string }[] =
        await db('audit_events')
          .where({ sugarbush_id: sugarbushId, entity: 'tree' })
          .whereIn('action', ['create', 'update'])
          .whereNotNull('detail')
          .whereNotNull('entity_id')
          .orderBy([
            { column: 'created_at', order: 'asc' },
            { column: 'id', order: 'asc' },
          ])
          .select('entity_id', 'action', 'detail', 'created_at');
      const events: StatusEvent[] = [];
      for (const r of rows) {
        let status: unknown;
        try {
          status = (JSON.parse(r.detail) as { status?: unknown } | null)?.status;
        } catch {
          continue; // a detail that is not JSON names no status
        }
        if (isStatus(status))
          events.push({
            treeId: Number(r.entity_id),
            on: String(r.created_at).slice(0, 10),
            status,
            created: r.action === 'create',
          });
      }
      return events;
    },

    /** The season's stored advice made from each tree's current record and this guideline version. */
    async advice(
      sugarbushId: number,
      season: number,
      standVersion: number,
    ): Promise<Map<number, TrendAdvice>> {
      const rows = await db('trees as t')
        .join('tree_advice as a', function () {
          this.on('a.tree_id', 't.id').andOn('a.season', db.raw('?', [season]));
        })
        .where('t.sugarbush_id', sugarbushId)
        .where('a.stand_version', standVersion)
        .whereRaw('a.tree_version = t.record_version')
        .select('t.id', 'a.verdict', 'a.taps', 'a.dbh_cm', 'a.conductive_share', 'a.warning_mask');
      return new Map(
        rows.map((r) => [
          Number(r.id),
          {
            verdict: r.verdict,
            taps: Number(r.taps),
            dbhCm: r.dbh_cm === null ? null : Number(r.dbh_cm),
            share: Number(r.conductive_share),
            warningMask: Number(r.warning_mask),
          },
        ]),
      );
    },
  };
}

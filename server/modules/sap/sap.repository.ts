import type { Knex } from 'knex';
import type { Collection } from '../../../shared/schemas/enums';
import type { SapEntryInput, SapListQuery } from '../../../shared/schemas/sap';
import { insertedId } from '../../lib/paging';
import { instant } from '../../lib/timestamps';

/** A sap entry as stored, before the figures worked out from it. */
export interface StoredSap {
  id: number;
  sugarbushId: number;
  season: number;
  collectedOn: string;
  volumeL: number;
  sugarPct: number;
  heldAtC: number | null;
  collection: Collection | null;
  syrupMadeL: number | null;
  note: string | null;
  recordedById: number | null;
  recordedByName: string | null;
  /** The id the recording device gave the entry, when it sent one. */
  clientId: string | null;
  createdAt: string;
}

const num = (v: unknown) => (v === null || v === undefined ? null : Number(v));

const toStored = (r: Record<string, unknown>): StoredSap => ({
  id: Number(r.id),
  sugarbushId: Number(r.sugarbush_id),
  season: Number(r.season),
  collectedOn: String(r.collected_on),
  volumeL: Number(r.volume_l),
  sugarPct: Number(r.sugar_pct),
  heldAtC: num(r.held_at_c),
  collection: (r.collection as Collection | null) ?? null,
  syrupMadeL: num(r.syrup_made_l),
  note: (r.note as string | null) ?? null,
  recordedById: num(r.recorded_by),
  recordedByName: (r.recorded_by_name as string | null) ?? null,
  clientId: (r.client_id as string | null) ?? null,
  createdAt: instant(r.created_at),
});

/** The entry's fields as columns (only those given). */
function columns(v: Partial<SapEntryInput>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  if (v.collectedOn !== undefined) {
    out.collected_on = v.collectedOn;
    out.season = Number(v.collectedOn.slice(0, 4));
  }
  if (v.volumeL !== undefined) out.volume_l = v.volumeL;
  if (v.sugarPct !== undefined) out.sugar_pct = v.sugarPct;
  if (v.heldAtC !== undefined) out.held_at_c = v.heldAtC;
  if (v.collection !== undefined) out.collection = v.collection;
  if (v.syrupMadeL !== undefined) out.syrup_made_l = v.syrupMadeL;
  if (v.note !== undefined) out.note = v.note === '' ? null : v.note;
  return out;
}

type CollectionFilter = SapListQuery['collection'];

export function sapRepository(db: Knex) {
  const ofSeason = (sugarbushId: number, season: number, collection: CollectionFilter) =>
    db('sap_entries as s')
      .where('s.sugarbush_id', sugarbushId)
      .where('s.season', season)
      .modify((q) => {
        if (collection === 'stand') q.whereNull('s.collection');
        else if (collection) q.where('s.collection', collection);
      });
  const withNames = (q: Knex.QueryBuilder) =>
    q.leftJoin('users as u', 'u.id', 's.recorded_by').select('s.*', 'u.name as recorded_by_name');

  return {
    async page(
      sugarbushId: number,
      season: number,
      o: { collection: CollectionFilter; offset: number; limit: number; desc: boolean },
    ): Promise<{ items: StoredSap[]; total: number }> {
      const [{ n }] = await ofSeason(sugarbushId, season, o.collection).count({ n: '*' });
      const order = o.desc ? 'desc' : 'asc';
      const rows = await withNames(ofSeason(sugarbushId, season, o.collection))
        .orderBy([
          { column: 's.collected_on', order },
          { column: 's.id', order },
        ])
        .offset(o.offset)
        .limit(o.limit);
      return { items: rows.map(toStored), total: Number(n) };
    },

    /** What the season's totals need of every entry (of the collection, when one is given). */
    async seasonFigures(sugarbushId: number, season: number, collection: CollectionFilter) {
      const rows: Record<string, unknown>[] = await ofSeason(
        sugarbushId,
        season,
        collection,
      ).select('s.collected_on', 's.volume_l', 's.sugar_pct', 's.syrup_made_l');
      return rows.map((r) => ({
        collectedOn: String(r.collected_on),
        volumeL: Number(r.volume_l),
        sugarPct: Number(r.sugar_pct),
        syrupMadeL: num(r.syrup_made_l),
      }));
    },

    async find(id: number): Promise<StoredSap | undefined> {
      const row = await withNames(db('sap_entries as s').where('s.id', id)).first();
      return row ? toStored(row) : undefined;
    },

    async findByClientId(clientId: string): Promise<StoredSap | undefined> {
      const row = await withNames(db('sap_entries as s').where('s.client_id', clientId)).first();
      return row ? toStored(row) : undefined;
    },

    async create(sugarbushId: number, userId: number, input: SapEntryInput): Promise<number> {
      const now = new Date().toISOString();
      const [row] = await db('sap_entries')
        .insert({
          sugarbush_id: sugarbushId,
          held_at_c: null,
          collection: null,
          syrup_made_l: null,
          note: null,
          ...columns(input),
          recorded_by: userId,
          client_id: input.clientId ?? null,
          created_at: now,
          updated_at: now,
        })
        .returning('id');
      return insertedId(row);
    },

    async update(id: number, patch: Partial<SapEntryInput>): Promise<void> {
      await db('sap_entries')
        .where({ id })
        .update({ ...columns(patch), updated_at: new Date().toISOString() });
    },

    /**
     * Taps recorded in the season: every taphole of that season on the stand's trees, by
     * collection, and all of them.
     */
    async taps(sugarbushId: number, season: number) {
      const rows = await db('tapholes as h')
        .join('trees as t', 't.id', 'h.tree_id')
        .where('t.sugarbush_id', sugarbushId)
        .where('h.season', season)
        .groupBy('h.collection')
        .select('h.collection', db.raw('count(*) as n'));
      const by = new Map<string, number>(rows.map((r) => [String(r.collection), Number(r.n)]));
      const all = [...by.values()].reduce((a, b) => a + b, 0);
      return (collection: Collection | null) => (collection ? (by.get(collection) ?? 0) : all);
    },
  };
}

import type { Knex } from 'knex';
import type { Taphole, TapholeInput } from '../../../shared/schemas/taphole';
import { insertedId } from '../../lib/paging';

/** The columns that say what was drilled, as the CSV of tapholes carries them. */
export const drilledHoleColumns = [
  'tree_id',
  'season',
  'height_cm',
  'azimuth_deg',
  'depth_cm',
  'bit_cm',
  'collection',
] as const;

const toTaphole = (r: Record<string, unknown>): Taphole => ({
  id: r.id as number,
  treeId: r.tree_id as number,
  season: r.season as number,
  heightCm: r.height_cm as number,
  azimuthDeg: r.azimuth_deg as number,
  depthCm: r.depth_cm as number,
  bitCm: r.bit_cm as number,
  collection: r.collection as Taphole['collection'],
  drilledOn: (r.drilled_on as string | null) ?? null,
  stainHit: r.stain_hit === null || r.stain_hit === undefined ? null : Boolean(r.stain_hit),
  recordedBy: (r.recorded_by as number | null) ?? null,
  clientId: (r.client_id as string | null) ?? null,
  createdAt: r.created_at as string,
});

export function tapholesRepository(db: Knex) {
  return {
    async listForTree(treeId: number, range: { offset: number; limit: number }) {
      const [{ n }] = await db('tapholes').where({ tree_id: treeId }).count({ n: '*' });
      const rows = await db('tapholes')
        .where({ tree_id: treeId })
        .orderBy([
          { column: 'season', order: 'desc' },
          { column: 'id', order: 'asc' },
        ])
        .offset(range.offset)
        .limit(range.limit);
      return { items: rows.map(toTaphole), total: Number(n) };
    },
    async findByClientId(clientId: string) {
      const row = await db('tapholes').where({ client_id: clientId }).first();
      return row ? toTaphole(row) : undefined;
    },
    async create(treeId: number, userId: number, t: TapholeInput) {
      const [row] = await db('tapholes')
        .insert({
          tree_id: treeId,
          season: t.season,
          height_cm: t.heightCm,
          azimuth_deg: t.azimuthDeg,
          depth_cm: t.depthCm,
          bit_cm: t.bitCm,
          collection: t.collection,
          drilled_on: t.drilledOn ?? null,
          stain_hit: t.stainHit ?? null,
          recorded_by: userId,
          client_id: t.clientId ?? null,
        })
        .returning('id');
      return toTaphole(
        await db('tapholes')
          .where({ id: insertedId(row) })
          .first(),
      );
    },
  };
}

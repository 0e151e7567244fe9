import type { Knex } from 'knex';
import { validateBoundary, type Boundary } from '../../../shared/geo/boundary';
import type { Species, TreeStatus } from '../../../shared/schemas/enums';

export interface PlacedTree {
  id: number;
  tag: string;
  lat: number | null;
  lng: number | null;
  species: Species;
  status: TreeStatus;
}

export function mapRepository(db: Knex) {
  return {
    /** Every tree of the stand with its position, in tag order. */
    placedTrees: (sugarbushId: number): Promise<PlacedTree[]> =>
      db('trees')
        .where({ sugarbush_id: sugarbushId })
        .orderBy('tag')
        .select('id', 'tag', 'lat', 'lng', 'species', 'status'),

    /**
     * The stand's boundary. Every write is validated, so a stored boundary that fails the check
     * can only be older data; it counts as no boundary rather than putting trees outside a shape
     * that is not one.
     */
    async boundary(sugarbushId: number): Promise<Boundary | null> {
      const row = await db('sugarbushes').where({ id: sugarbushId }).first('boundary');
      if (!row?.boundary) return null;
      const check = validateBoundary(JSON.parse(row.boundary));
      return check.ok ? check.boundary : null;
    },
  };
}

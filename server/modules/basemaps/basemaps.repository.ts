import type { Knex } from 'knex';
import type { Basemap, BasemapFormat } from '../../../shared/schemas/map';
import { insertedId } from '../../lib/paging';

interface Row {
  id: number;
  sugarbush_id: number;
  name: string;
  format: BasemapFormat;
  min_zoom: number;
  max_zoom: number;
  bounds: string;
  center: string | null;
  size_bytes: number;
  created_at: string;
}

const toBasemap = (r: Row): Basemap => ({
  id: r.id,
  sugarbushId: r.sugarbush_id,
  name: r.name,
  format: r.format,
  minZoom: r.min_zoom,
  maxZoom: r.max_zoom,
  bounds: JSON.parse(r.bounds),
  center: r.center ? JSON.parse(r.center) : null,
  sizeBytes: Number(r.size_bytes),
  createdAt: r.created_at,
});

const columns = [
  'id',
  'sugarbush_id',
  'name',
  'format',
  'min_zoom',
  'max_zoom',
  'bounds',
  'center',
  'size_bytes',
  'created_at',
];

export function basemapsRepository(db: Knex) {
  return {
    async insert(b: Omit<Basemap, 'id' | 'createdAt'> & { fileName: string; uploadedBy: number }) {
      const [row] = await db('basemaps')
        .insert({
          sugarbush_id: b.sugarbushId,
          name: b.name,
          file_name: b.fileName,
          format: b.format,
          min_zoom: b.minZoom,
          max_zoom: b.maxZoom,
          bounds: JSON.stringify(b.bounds),
          center: b.center ? JSON.stringify(b.center) : null,
          size_bytes: b.sizeBytes,
          uploaded_by: b.uploadedBy,
        })
        .returning('id');
      return insertedId(row);
    },
    async find(id: number): Promise<Basemap | undefined> {
      const row: Row | undefined = await db('basemaps').where({ id }).first(columns);
      return row ? toBasemap(row) : undefined;
    },
    async list(sugarbushId: number, range: { offset: number; limit: number }) {
      const q = db('basemaps').where({ sugarbush_id: sugarbushId });
      const [{ n }] = await q.clone().count({ n: '*' });
      const rows: Row[] = await q
        .orderBy([
          { column: 'created_at', order: 'desc' },
          { column: 'id', order: 'desc' },
        ])
        .offset(range.offset)
        .limit(range.limit)
        .select(columns);
      return { items: rows.map(toBasemap), total: Number(n) };
    },
  };
}

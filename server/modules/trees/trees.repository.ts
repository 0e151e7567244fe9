import type { Knex } from 'knex';
import type { Tree } from '../../../shared/schemas/tree';

interface Row {
  id: number;
  sugarbush_id: number;
  tag: string;
  species: Tree['species'];
  lat: number | null;
  lng: number | null;
  status: Tree['status'];
  dbh_cm: number | null;
  measured_on: string | null;
  crown_dieback_pct: number | null;
}

const toTree = (r: Row): Tree => ({
  id: r.id,
  sugarbushId: r.sugarbush_id,
  tag: r.tag,
  species: r.species,
  lat: r.lat,
  lng: r.lng,
  status: r.status,
  latestDbhCm: r.dbh_cm,
  latestMeasuredOn: r.measured_on,
  latestCrownDiebackPct: r.crown_dieback_pct,
});

const sortColumns: Record<string, string> = {
  tag: 't.tag',
  dbh: 't.latest_dbh_cm',
  status: 't.status',
  species: 't.species',
};

export interface TreeFilters {
  q?: string;
  status?: string;
  species?: string;
  /** A 5 % crown-dieback class: the tree's latest rating, or its rating of `diebackSeason`. */
  dieback?: number;
  diebackSeason?: number;
  sort?: string;
  offset: number;
  limit: number;
}

const seasonRating = `select m.crown_dieback_pct from measurements m
  where m.tree_id = t.id and m.season = ? and m.crown_dieback_pct is not null
    and not exists (select 1 from measurements c where c.corrects_id = m.id)
  order by m.measured_on desc, m.id desc limit 1`;

export function treesRepository(db: Knex) {
  // The latest standing measurement is kept on the tree row (see refreshTrees), so a page of
  // the register reads only the trees it shows.
  const base = () => db.from('trees as t');
  const columns = [
    't.id',
    't.sugarbush_id',
    't.tag',
    't.species',
    't.lat',
    't.lng',
    't.status',
    't.latest_dbh_cm as dbh_cm',
    't.latest_measured_on as measured_on',
    't.latest_crown_dieback_pct as crown_dieback_pct',
  ];

  return {
    async list(
      sugarbushId: number,
      f: TreeFilters,
      countOf: (count: () => Promise<number>) => Promise<number>,
    ) {
      const q = base()
        .where('t.sugarbush_id', sugarbushId)
        .modify((qb) => {
          if (f.q) qb.whereILike('t.tag', `%${f.q}%`);
          if (f.status) qb.where('t.status', f.status);
          if (f.species) qb.where('t.species', f.species);
          if (f.dieback !== undefined) {
            const range = [f.dieback, f.dieback + 5];
            if (f.diebackSeason === undefined)
              qb.where('t.latest_crown_dieback_pct', '>=', range[0]).where(
                't.latest_crown_dieback_pct',
                '<',
                range[1],
              );
            // The season's own rating: the latest no later row corrects.
            else
              qb.whereRaw(`(${seasonRating}) >= ? and (${seasonRating}) < ?`, [
                f.diebackSeason,
                range[0],
                f.diebackSeason,
                range[1],
              ]);
          }
        });
      const n = await countOf(async () => Number((await q.clone().count({ n: '*' }))[0].n));
      const desc = f.sort?.startsWith('-') ?? false;
      const column = sortColumns[(f.sort ?? 'tag').replace(/^-/, '')] ?? 't.tag';
      const rows: Row[] = await q
        .select(columns)
        .modify((qb) => {
          // Only DBH may be missing; an "is null" term on the others would defeat their index.
          if (column === 't.latest_dbh_cm') qb.orderByRaw(`${column} is null`);
        })
        .orderBy(column, desc ? 'desc' : 'asc')
        .orderBy('t.tag', 'asc')
        .offset(f.offset)
        .limit(f.limit);
      return { items: rows.map(toTree), total: Number(n) };
    },
    async find(id: number) {
      const row: Row | undefined = await base().where('t.id', id).first(columns);
      return row ? toTree(row) : undefined;
    },
    findByTag: (sugarbushId: number, tag: string) =>
      db('trees').where({ sugarbush_id: sugarbushId, tag }).first('id'),
    async create(
      sugarbushId: number,
      t: { tag: string; species: string; lat?: number | null; lng?: number | null; status: string },
    ) {
      const [row] = await db('trees')
        .insert({
          sugarbush_id: sugarbushId,
          tag: t.tag,
          species: t.species,
          lat: t.lat ?? null,
          lng: t.lng ?? null,
          status: t.status,
        })
        .returning('id');
      return typeof row === 'object' ? (row.id as number) : (row as number);
    },
    update: (id: number, patch: Record<string, unknown>) =>
      db('trees')
        .where({ id })
        .update({ ...patch, updated_at: db.fn.now() }),
  };
}

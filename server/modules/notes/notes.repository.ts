import type { Knex } from 'knex';
import type { Note, NoteInput } from '../../../shared/schemas/note';
import { insertedId } from '../../lib/paging';

const toNote = (r: Record<string, unknown>): Note => ({
  id: r.id as number,
  sugarbushId: r.sugarbush_id as number,
  treeId: (r.tree_id as number | null) ?? null,
  authorId: (r.author_id as number | null) ?? null,
  authorName: (r.author_name as string | null) ?? null,
  category: r.category as Note['category'],
  body: r.body as string,
  followUpOn: (r.follow_up_on as string | null) ?? null,
  createdAt: r.created_at as string,
});

export function notesRepository(db: Knex) {
  const base = () =>
    db('notes as n')
      .leftJoin('users as u', 'u.id', 'n.author_id')
      .select('n.*', 'u.name as author_name');
  return {
    async list(
      where: { treeId?: number; sugarbushId?: number },
      range: { offset: number; limit: number },
    ) {
      const q = base().modify((qb) => {
        if (where.treeId) qb.where('n.tree_id', where.treeId);
        if (where.sugarbushId) qb.where('n.sugarbush_id', where.sugarbushId);
      });
      const [{ n }] = await q.clone().clearSelect().count({ n: '*' });
      const rows = await q
        .orderBy('n.created_at', 'desc')
        .orderBy('n.id', 'desc')
        .offset(range.offset)
        .limit(range.limit);
      return { items: rows.map(toNote), total: Number(n) };
    },
    async create(
      row: { sugarbushId: number; treeId: number | null; authorId: number } & NoteInput,
    ) {
      const [r] = await db('notes')
        .insert({
          sugarbush_id: row.sugarbushId,
          tree_id: row.treeId,
          author_id: row.authorId,
          category: row.category,
          body: row.body,
          follow_up_on: row.followUpOn ?? null,
        })
        .returning('id');
      return toNote(await base().where('n.id', insertedId(r)).first());
    },
  };
}

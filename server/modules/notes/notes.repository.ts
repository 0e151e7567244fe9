import type { Knex } from 'knex';
import type { Hazard, Note, NoteFilters, NoteInput } from '../../../shared/schemas/note';
import { insertedId } from '../../lib/paging';
import { instant, instantOrNull } from '../../lib/timestamps';
import { photosRepository } from '../photos/photos.repository';

const nullableId = (v: unknown) => (v === null || v === undefined ? null : Number(v));

const toNote = (r: Record<string, unknown>): Omit<Note, 'photos'> => ({
  id: Number(r.id),
  sugarbushId: Number(r.sugarbush_id),
  treeId: nullableId(r.tree_id),
  treeTag: (r.tree_tag as string | null) ?? null,
  authorId: nullableId(r.author_id),
  authorName: (r.author_name as string | null) ?? null,
  category: r.category as Note['category'],
  body: r.body as string,
  followUpOn: (r.follow_up_on as string | null) ?? null,
  createdAt: instant(r.created_at),
  resolvedAt: instantOrNull(r.resolved_at),
  resolvedById: nullableId(r.resolved_by),
  resolvedByName: (r.resolver_name as string | null) ?? null,
});

/** The days a follow-up filter compares with: today, and the last date that counts as due. */
export interface FollowUpDays {
  today: string;
  dueBy: string;
}

export function notesRepository(db: Knex) {
  const photos = photosRepository(db);
  const base = () =>
    db('notes as n')
      .leftJoin('users as u', 'u.id', 'n.author_id')
      .leftJoin('users as r', 'r.id', 'n.resolved_by')
      .leftJoin('trees as t', 't.id', 'n.tree_id')
      .select('n.*', 'u.name as author_name', 'r.name as resolver_name', 't.tag as tree_tag');

  async function withPhotos(rows: Record<string, unknown>[]): Promise<Note[]> {
    const notes = rows.map(toNote);
    const byNote = await photos.ofNotes(notes.map((n) => n.id));
    return notes.map((n) => ({ ...n, photos: byNote.get(n.id) ?? [] }));
  }

  async function one(id: number): Promise<Note> {
    const [note] = await withPhotos([await base().where('n.id', id).first()]);
    return note;
  }

  return {
    one,

    async list(
      where: { treeId?: number; sugarbushId?: number },
      f: NoteFilters,
      days: FollowUpDays,
      range: { offset: number; limit: number },
    ) {
      const q = base().modify((qb) => {
        if (where.treeId) qb.where('n.tree_id', where.treeId);
        if (where.sugarbushId) qb.where('n.sugarbush_id', where.sugarbushId);
        if (f.scope === 'stand') qb.whereNull('n.tree_id');
        if (f.scope === 'trees') qb.whereNotNull('n.tree_id');
        if (f.category) qb.where('n.category', f.category);
        if (f.status === 'open') qb.whereNull('n.resolved_at');
        if (f.status === 'resolved') qb.whereNotNull('n.resolved_at');
        if (f.followUp === 'scheduled') qb.whereNotNull('n.follow_up_on');
        if (f.followUp === 'due')
          qb.whereNull('n.resolved_at').where('n.follow_up_on', '<=', days.dueBy);
        if (f.followUp === 'overdue')
          qb.whereNull('n.resolved_at').where('n.follow_up_on', '<', days.today);
        if (f.q) {
          const like = `%${f.q}%`;
          qb.where((w) => w.whereILike('n.body', like).orWhereILike('t.tag', like));
        }
      });
      const [{ n }] = await q.clone().clearSelect().count({ n: '*' });
      const sort = f.sort ?? '-created';
      const dir = sort.startsWith('-') ? 'desc' : 'asc';
      if (sort.endsWith('followUp'))
        q.orderByRaw('case when n.follow_up_on is null then 1 else 0 end')
          .orderBy('n.follow_up_on', dir)
          .orderBy('n.created_at', 'desc');
      else q.orderBy('n.created_at', dir);
      const rows = await q.orderBy('n.id', dir).offset(range.offset).limit(range.limit);
      return { items: await withPhotos(rows), total: Number(n) };
    },

    async create(
      row: { sugarbushId: number; treeId: number | null; authorId: number } & NoteInput,
    ): Promise<Note> {
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
      return one(insertedId(r));
    },

    async find(id: number) {
      return db('notes').where({ id }).first('id', 'resolved_at', 'follow_up_on');
    },

    async update(id: number, columns: Record<string, unknown>): Promise<void> {
      await db('notes').where({ id }).update(columns);
    },

    /**
     * The unresolved hazard notes of these trees, oldest first, by tree id: one query for a page
     * of a plan (the tree-id index reads only the page's notes).
     */
    async openHazards(treeIds: readonly number[]): Promise<Map<number, Hazard[]>> {
      const byTree = new Map<number, Hazard[]>();
      if (treeIds.length === 0) return byTree;
      const rows: { id: number; tree_id: number; body: string; created_at: string }[] = await db(
        'notes',
      )
        .whereIn('tree_id', treeIds)
        .where('category', 'hazard')
        .whereNull('resolved_at')
        .orderBy('created_at')
        .orderBy('id')
        .select('id', 'tree_id', 'body', 'created_at');
      for (const r of rows) {
        const list = byTree.get(Number(r.tree_id)) ?? [];
        list.push({ noteId: Number(r.id), body: r.body, createdAt: instant(r.created_at) });
        byTree.set(Number(r.tree_id), list);
      }
      return byTree;
    },
  };
}

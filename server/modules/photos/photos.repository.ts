import type { Knex } from 'knex';
import type { Photo, PhotoContentType } from '../../../shared/schemas/photo';
import { insertedId } from '../../lib/paging';
import { instant } from '../../lib/timestamps';

export interface PhotoRow {
  id: number;
  sugarbush_id: number;
  tree_id: number | null;
  note_id: number | null;
  uploaded_by: number | null;
  uploader_name?: string | null;
  storage_key: string;
  thumb_key: string;
  content_type: PhotoContentType;
  byte_size: number;
  width: number;
  height: number;
  created_at: string;
}

const nullableId = (v: unknown) => (v === null || v === undefined ? null : Number(v));

export const toPhoto = (r: PhotoRow): Photo => ({
  id: Number(r.id),
  sugarbushId: Number(r.sugarbush_id),
  treeId: nullableId(r.tree_id),
  noteId: nullableId(r.note_id),
  contentType: r.content_type,
  width: Number(r.width),
  height: Number(r.height),
  byteSize: Number(r.byte_size),
  uploadedById: nullableId(r.uploaded_by),
  uploadedByName: r.uploader_name ?? null,
  createdAt: instant(r.created_at),
  url: `/api/photos/${r.id}`,
  thumbUrl: `/api/photos/${r.id}?size=thumb`,
});

export function photosRepository(db: Knex) {
  const base = () =>
    db('photos as p')
      .leftJoin('users as u', 'u.id', 'p.uploaded_by')
      .select('p.*', 'u.name as uploader_name');
  return {
    async create(row: Omit<PhotoRow, 'id' | 'created_at' | 'uploader_name'>): Promise<Photo> {
      const [r] = await db('photos').insert(row).returning('id');
      return toPhoto(await base().where('p.id', insertedId(r)).first());
    },

    async find(id: number): Promise<PhotoRow | undefined> {
      return db('photos').where({ id }).first();
    },

    /** Photos taken of the tree itself (not those of its notes), newest first. */
    async ofTree(treeId: number, range: { offset: number; limit: number }) {
      const q = base().where('p.tree_id', treeId).whereNull('p.note_id');
      const [{ n }] = await q.clone().clearSelect().count({ n: '*' });
      const rows: PhotoRow[] = await q
        .orderBy('p.created_at', 'desc')
        .orderBy('p.id', 'desc')
        .offset(range.offset)
        .limit(range.limit);
      return { items: rows.map(toPhoto), total: Number(n) };
    },

    /** The photos of these notes, oldest first, by note id (one query for a page of notes). */
    async ofNotes(noteIds: readonly number[]): Promise<Map<number, Photo[]>> {
      const byNote = new Map<number, Photo[]>();
      if (noteIds.length === 0) return byNote;
      const rows: PhotoRow[] = await base()
        .whereIn('p.note_id', noteIds)
        .orderBy('p.created_at')
        .orderBy('p.id');
      for (const r of rows) {
        const photo = toPhoto(r);
        const list = byNote.get(photo.noteId!) ?? [];
        list.push(photo);
        byNote.set(photo.noteId!, list);
      }
      return byNote;
    },
  };
}

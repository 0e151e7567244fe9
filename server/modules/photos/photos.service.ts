import { randomUUID } from 'node:crypto';
import type { Readable } from 'node:stream';
import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import type { Access } from '../../middleware/auth';
import { pageOf } from '../../lib/paging';
import type { ListQuery } from '../../../shared/schemas/list-query';
import type { Photo, PhotoContentType } from '../../../shared/schemas/photo';
import { auditRepository } from '../audit/audit.repository';
import { photosRepository } from './photos.repository';
import { processPhoto } from './process-photo';

export interface StoredPhoto {
  body: Readable;
  contentType: PhotoContentType | 'image/webp';
  etag: string;
}

export function photosService(ctx: AppContext) {
  const repo = photosRepository(ctx.db);
  const store = ctx.photos;

  return {
    /**
     * Keep an uploaded photo of a tree or of a note: checked, stripped of its metadata, stored
     * with a thumbnail, then recorded. When the record fails the stored files go again.
     */
    async upload(
      access: Access,
      on: { treeId: number | null; noteId: number | null },
      upload: Buffer,
    ): Promise<Photo> {
      const photo = await processPhoto(upload);
      const base = `${access.sugarbushId}/${randomUUID()}`;
      const keys = { full: `${base}.${photo.extension}`, thumb: `${base}-thumb.webp` };
      const forget = () => Promise.allSettled([store.remove(keys.full), store.remove(keys.thumb)]);
      try {
        await store.put(keys.full, photo.full, photo.contentType);
        await store.put(keys.thumb, photo.thumb, 'image/webp');
        // The files are stored before the row commits: a committed row always has its files.
        return await ctx.db.transaction(async (trx) => {
          const saved = await photosRepository(trx).create({
            sugarbush_id: access.sugarbushId,
            tree_id: on.treeId,
            note_id: on.noteId,
            uploaded_by: access.userId,
            storage_key: keys.full,
            thumb_key: keys.thumb,
            content_type: photo.contentType,
            byte_size: photo.full.length,
            width: photo.width,
            height: photo.height,
          });
          await auditRepository(trx).record({
            sugarbushId: access.sugarbushId,
            userId: access.userId,
            action: 'create',
            entity: 'photo',
            entityId: saved.id,
          });
          return saved;
        });
      } catch (err) {
        await forget();
        throw err;
      }
    },

    ofTree(treeId: number, q: ListQuery) {
      return pageOf(q, (range) => repo.ofTree(treeId, range));
    },

    /** The stored image or its thumbnail; the caller has checked the reader is a member. */
    async open(photoId: number, size: 'full' | 'thumb'): Promise<StoredPhoto> {
      const row = await repo.find(photoId);
      if (!row) throw new AppError(404, 'not-found', 'Photo not found');
      const key = size === 'thumb' ? row.thumb_key : row.storage_key;
      const body = await store.get(key);
      if (!body) {
        ctx.log.error(`Photo ${photoId} has no stored ${size} file (${key})`);
        throw new AppError(404, 'not-found', 'Photo not found');
      }
      return {
        body,
        contentType: size === 'thumb' ? 'image/webp' : row.content_type,
        etag: `"photo-${photoId}-${size}"`,
      };
    },
  };
}

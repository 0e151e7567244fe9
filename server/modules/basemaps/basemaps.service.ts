import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import { pageOf } from '../../lib/paging';
import type { Access } from '../../middleware/auth';
import { auditRepository } from '../audit/audit.repository';
import { membersRepository } from '../members/members.repository';
import type { ListQuery, Page } from '../../../shared/schemas/list-query';
import { basemapUploadSchema, type Basemap } from '../../../shared/schemas/map';
import { basemapsRepository } from './basemaps.repository';
import { inspectMbtiles } from './mbtiles';
import { removeQuietly } from './receive-upload';
import { tmsRow, type TileCoords } from './tile-coords';
import type { TileStore } from './tile-store';

const hidden = () => new AppError(404, 'not-found', 'Basemap not found');

export type TileAnswer =
  { status: 200; etag: string; data: Buffer } | { status: 304; etag: string } | { status: 204 };

const etagOf = (id: number, c: TileCoords, mtimeMs: number) =>
  `"${crypto.createHash('sha1').update(`${id}/${c.z}/${c.x}/${c.y}@${mtimeMs}`).digest('base64url').slice(0, 22)}"`;

/** If-None-Match holds this tag (or `*`); weak tags compare by their value. */
const matches = (header: string | undefined, etag: string) =>
  !!header &&
  header
    .split(',')
    .map((t) => t.trim().replace(/^W\//, ''))
    .some((t) => t === etag || t === '*');

export function basemapsService(ctx: AppContext, tiles: TileStore) {
  const repo = basemapsRepository(ctx.db);
  const members = membersRepository(ctx.db);
  const fileOf = (id: number) => path.join(ctx.config.BASEMAP_DIR, `${id}.mbtiles`);

  return {
    list(sugarbushId: number, q: ListQuery): Promise<Page<Basemap>> {
      return pageOf(q, (range) => repo.list(sugarbushId, range));
    },

    /**
     * Check an uploaded file and keep it as `BASEMAP_DIR/<id>.mbtiles`. The temporary file is
     * gone afterwards whether the upload was accepted or refused.
     */
    async upload(
      access: Access,
      file: { path: string; originalname: string; size: number },
      fields: unknown,
    ): Promise<Basemap> {
      try {
        const { name } = basemapUploadSchema.parse(fields ?? {});
        const info = inspectMbtiles(file.path);
        const fallback = printable(path.basename(file.originalname)).replace(/\.mbtiles$/i, '');
        const id = await ctx.db.transaction(async (trx) => {
          const newId = await basemapsRepository(trx).insert({
            sugarbushId: access.sugarbushId,
            name: (name || info.name || fallback || 'Basemap').slice(0, 120),
            fileName: printable(file.originalname).slice(0, 255),
            format: info.format,
            minZoom: info.minZoom,
            maxZoom: info.maxZoom,
            bounds: info.bounds,
            center: info.center,
            sizeBytes: file.size,
            uploadedBy: access.userId,
          });
          await auditRepository(trx).record({
            sugarbushId: access.sugarbushId,
            userId: access.userId,
            action: 'create',
            entity: 'basemap',
            entityId: newId,
          });
          // The file is in place before the row commits, so a committed row always has its file.
          fs.renameSync(file.path, fileOf(newId));
          return newId;
        });
        return (await repo.find(id))!;
      } finally {
        removeQuietly(file.path);
      }
    },

    /** The basemap, when the user is a member of its sugarbush; otherwise 404 as for a missing one. */
    async visible(userId: number, rawId: unknown): Promise<Basemap> {
      const id = Number(rawId);
      if (!Number.isInteger(id) || id <= 0) throw hidden();
      const basemap = await repo.find(id);
      if (!basemap || !(await members.roleOf(userId, basemap.sugarbushId))) throw hidden();
      return basemap;
    },

    /** One tile by XYZ address; the TMS row flip happens here and nowhere else. */
    tile(basemap: Basemap, c: TileCoords, ifNoneMatch?: string): TileAnswer {
      const file = fileOf(basemap.id);
      if (!fs.existsSync(file)) throw new AppError(404, 'not-found', 'The basemap file is missing');
      const mtimeMs = tiles.mtimeOf(file);
      const etag = etagOf(basemap.id, c, mtimeMs);
      if (matches(ifNoneMatch, etag)) return { status: 304, etag };
      const { data } = tiles.read(file, c.z, c.x, tmsRow(c));
      if (!data) return { status: 204 };
      return { status: 200, etag, data };
    },
  };
}

/** A file name as the client sent it, without control characters (a NUL among them). */
function printable(name: string): string {
  // eslint-disable-next-line no-control-regex
  return name.replace(/[\u0000-\u001f\u007f]/g, '').trim();
}

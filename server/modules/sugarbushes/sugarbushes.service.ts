import { pageOf } from '../../lib/paging';
import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import { auditRepository } from '../audit/audit.repository';
import { membersRepository } from '../members/members.repository';
import type { ListQuery, Page } from '../../../shared/schemas/list-query';
import type { Sugarbush } from '../../../shared/schemas/sugarbush';
import { boundaryChanged, guidelineChanged } from '../advice/refresh-trees';
import { profileColumns } from './profile-choice';
import { sugarbushesRepository } from './sugarbushes.repository';
import type { z } from 'zod';
import type { sugarbushInputSchema, sugarbushPatchSchema } from '../../../shared/schemas/sugarbush';

export function sugarbushesService(ctx: AppContext) {
  const repo = sugarbushesRepository(ctx.db);

  return {
    async list(userId: number, q: ListQuery): Promise<Page<Sugarbush>> {
      return pageOf(q, (range) => repo.listFor(userId, { ...range, q: q.q }));
    },

    async get(userId: number, id: number): Promise<Sugarbush> {
      const s = await repo.findFor(userId, id);
      if (!s) throw new AppError(404, 'not-found', 'Sugarbush not found');
      return s;
    },

    /** Whoever creates a sugarbush becomes its owner. */
    async create(userId: number, input: z.output<typeof sugarbushInputSchema>): Promise<Sugarbush> {
      profileColumns({ profile: input.profile }, { profile: input.profile, customProfile: null });
      const id = await ctx.db.transaction(async (trx) => {
        const newId = await sugarbushesRepository(trx).create({
          name: input.name,
          boundary: input.boundary ?? null,
          profile: input.profile,
          sunnyAzimuthDeg: input.sunnyAzimuthDeg,
        });
        await membersRepository(trx).add(userId, newId, 'owner');
        await auditRepository(trx).record({
          sugarbushId: newId,
          userId,
          action: 'create',
          entity: 'sugarbush',
          entityId: newId,
        });
        return newId;
      });
      return this.get(userId, id);
    },

    async update(
      userId: number,
      id: number,
      patch: z.output<typeof sugarbushPatchSchema>,
    ): Promise<Sugarbush> {
      const current = await this.get(userId, id);
      const row: Record<string, unknown> = profileColumns(patch, current);
      if (patch.name !== undefined) row.name = patch.name;
      if (patch.boundary !== undefined)
        row.boundary = patch.boundary ? JSON.stringify(patch.boundary) : null;
      if (patch.sunnyAzimuthDeg !== undefined) row.sunny_azimuth_deg = patch.sunnyAzimuthDeg;
      const changesAdvice = ['profile', 'custom_profile', 'sunny_azimuth_deg'].some(
        (column) => column in row,
      );
      await ctx.db.transaction(async (trx) => {
        const fields = Object.keys(row);
        // The values a change replaces (a boundary, a guideline) stay in its audit entry.
        const earlier: Record<string, unknown> =
          fields.length > 0 ? ((await trx('sugarbushes').where({ id }).first(fields)) ?? {}) : {};
        if (fields.length > 0) await sugarbushesRepository(trx).update(id, row);
        if (changesAdvice) await guidelineChanged(trx, id);
        else if ('boundary' in row) await boundaryChanged(trx, id);
        await auditRepository(trx).record({
          sugarbushId: id,
          userId,
          action: 'update',
          entity: 'sugarbush',
          entityId: id,
          detail: { fields, earlier },
        });
      });
      return this.get(userId, id);
    },
  };
}

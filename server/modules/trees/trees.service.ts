import { keptByStamp } from '../../lib/kept-by-stamp';
import { pageOf } from '../../lib/paging';
import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import { isUniqueViolation } from '../../lib/db-engine';
import { auditRepository } from '../audit/audit.repository';
import type { Page } from '../../../shared/schemas/list-query';
import type { Tree, TreePatch } from '../../../shared/schemas/tree';
import type { TreeListQuery } from './trees.routes';
import { refreshTrees } from '../advice/refresh-trees';
import { treesRepository } from './trees.repository';
import type { z } from 'zod';
import type { treeInputSchema } from '../../../shared/schemas/tree';

const duplicateTag = (tag: string) =>
  new AppError(409, 'duplicate-tag', `Tag ${tag} is already used in this sugarbush`, {
    tag: `Tag ${tag} is already used in this sugarbush`,
  });

export function treesService(ctx: AppContext) {
  const repo = treesRepository(ctx.db);
  // A register page's total counts the whole stand: kept until the stand changes.
  const counts = keptByStamp(ctx.db);

  return {
    async list(sugarbushId: number, q: TreeListQuery): Promise<Page<Tree>> {
      const stamp = await counts.stamp(sugarbushId);
      const filter = JSON.stringify([q.q, q.status, q.species, q.dieback, q.diebackSeason]);
      return pageOf(q, (range) =>
        repo.list(sugarbushId, { ...q, ...range }, (count) =>
          counts.keep(`${stamp}:trees:${filter}`, count),
        ),
      );
    },

    async get(treeId: number): Promise<Tree> {
      const tree = await repo.find(treeId);
      if (!tree) throw new AppError(404, 'not-found', 'Tree not found');
      return tree;
    },

    async create(
      sugarbushId: number,
      userId: number,
      input: z.output<typeof treeInputSchema>,
    ): Promise<Tree> {
      if (await repo.findByTag(sugarbushId, input.tag)) throw duplicateTag(input.tag);
      let id: number;
      try {
        id = await ctx.db.transaction(async (trx) => {
          const newId = await treesRepository(trx).create(sugarbushId, input);
          await auditRepository(trx).record({
            sugarbushId,
            userId,
            action: 'create',
            entity: 'tree',
            entityId: newId,
            detail: input,
          });
          await refreshTrees(trx, sugarbushId, [newId]);
          return newId;
        });
      } catch (err) {
        if (isUniqueViolation(err)) throw duplicateTag(input.tag);
        throw err;
      }
      return this.get(id);
    },

    async update(
      treeId: number,
      sugarbushId: number,
      userId: number,
      patch: TreePatch,
    ): Promise<Tree> {
      if (patch.tag !== undefined) {
        const other = await repo.findByTag(sugarbushId, patch.tag);
        if (other && other.id !== treeId) throw duplicateTag(patch.tag);
      }
      const row = Object.fromEntries(Object.entries(patch).filter(([, v]) => v !== undefined));
      try {
        await ctx.db.transaction(async (trx) => {
          const fields = Object.keys(row);
          // What the change replaces stays in its audit entry: nothing about a tree is lost.
          const earlier: Record<string, unknown> =
            fields.length > 0
              ? ((await trx('trees').where({ id: treeId }).first(fields)) ?? {})
              : {};
          if (fields.length > 0) await treesRepository(trx).update(treeId, row);
          await auditRepository(trx).record({
            sugarbushId,
            userId,
            action: 'update',
            entity: 'tree',
            entityId: treeId,
            detail: { ...row, earlier },
          });
          await refreshTrees(trx, sugarbushId, [treeId]);
        });
      } catch (err) {
        if (isUniqueViolation(err)) throw duplicateTag(String(patch.tag));
        throw err;
      }
      return this.get(treeId);
    },
  };
}

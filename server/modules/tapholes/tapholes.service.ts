import type { AppContext } from '../../context';
import type { Taphole, TapholeInput } from '../../../shared/schemas/taphole';
import { refreshTrees } from '../advice/refresh-trees';
import { auditRepository } from '../audit/audit.repository';
import { refuseRetiredTree, storeOnce } from '../field-entries/store-once';
import { tapholesRepository } from './tapholes.repository';

export function tapholesService(ctx: AppContext) {
  const repo = tapholesRepository(ctx.db);
  return {
    /**
     * Records a drilled hole with its audit entry and the tree's advice. A resend with the same
     * `clientId` answers with the stored hole (`created: false`) and writes nothing.
     */
    async record(
      treeId: number,
      sugarbushId: number,
      userId: number,
      input: TapholeInput,
    ): Promise<{ entry: Taphole; created: boolean }> {
      return storeOnce({
        clientId: input.clientId,
        find: (clientId) => repo.findByClientId(clientId),
        matches: (h) =>
          h.treeId === treeId &&
          h.season === input.season &&
          h.heightCm === input.heightCm &&
          h.azimuthDeg === input.azimuthDeg &&
          h.depthCm === input.depthCm &&
          h.bitCm === input.bitCm &&
          h.collection === input.collection &&
          h.drilledOn === (input.drilledOn ?? null) &&
          h.stainHit === (input.stainHit ?? null),
        check: () => refuseRetiredTree(ctx.db, treeId),
        create: () =>
          ctx.db.transaction(async (trx) => {
            const made = await tapholesRepository(trx).create(treeId, userId, input);
            await auditRepository(trx).record({
              sugarbushId,
              userId,
              action: 'create',
              entity: 'taphole',
              entityId: made.id,
              detail: input,
            });
            await refreshTrees(trx, sugarbushId, [treeId]);
            return made;
          }),
      });
    },
  };
}

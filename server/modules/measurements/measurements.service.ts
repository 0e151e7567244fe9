import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import { auditRepository } from '../audit/audit.repository';
import type { Page } from '../../../shared/schemas/list-query';
import type {
  Measurement,
  MeasurementInput,
  MeasurementListQuery,
} from '../../../shared/schemas/measurement';
import { measurementsRepository } from './measurements.repository';
import { checkNewReading, readingQuestion, seasonOf } from '../../../shared/rules/index';
import { pageOf } from '../../lib/paging';
import { refreshTrees } from '../advice/refresh-trees';
import { refuseRetiredTree, storeOnce } from '../field-entries/store-once';

export function measurementsService(ctx: AppContext) {
  const repo = measurementsRepository(ctx.db);

  async function checkNew(treeId: number, input: MeasurementInput): Promise<void> {
    await refuseRetiredTree(ctx.db, treeId);
    if (input.correctsId) {
      const target = await repo.find(input.correctsId);
      if (!target || target.treeId !== treeId) {
        throw new AppError(400, 'invalid-input', 'Some fields need attention', {
          correctsId: 'That measurement does not belong to this tree',
        });
      }
      if (target.superseded) {
        throw new AppError(
          409,
          'already-corrected',
          'That measurement was already corrected: correct the newer row',
        );
      }
    }
    // A reading far off the tree's one before it must be confirmed (it is an entry error until then).
    const check = checkNewReading(await repo.standing(treeId, input.correctsId), input);
    if (check && input.confirmedOutlier !== true) {
      const question = readingQuestion(check, seasonOf(input.measuredOn));
      const sentence = question[0].toUpperCase() + question.slice(1);
      throw new AppError(400, 'unconfirmed-outlier', `${sentence}.`, {
        confirmedOutlier: sentence,
      });
    }
  }

  async function create(
    treeId: number,
    sugarbushId: number,
    userId: number,
    input: MeasurementInput,
  ): Promise<Measurement> {
    const outlier = checkNewReading(await repo.standing(treeId, input.correctsId), input);
    // The row, its audit entry and the tree's advice change together.
    const id = await ctx.db.transaction(async (trx) => {
      const newId = await measurementsRepository(trx).create(treeId, userId, {
        ...input,
        confirmedOutlier: outlier !== null,
      });
      await auditRepository(trx).record({
        sugarbushId,
        userId,
        action: input.correctsId ? 'correct' : 'create',
        entity: 'measurement',
        entityId: newId,
        detail: input,
      });
      await refreshTrees(trx, sugarbushId, [treeId]);
      return newId;
    });
    return (await repo.find(id))!;
  }

  return {
    async list(treeId: number, q: MeasurementListQuery): Promise<Page<Measurement>> {
      return pageOf(q, (range) =>
        repo.listForTree(treeId, { ...range, desc: q.sort === '-measuredOn' }),
      );
    },

    /**
     * Records a measurement; a correction appends a row naming the one it replaces. A resend
     * with the same `clientId` answers with the stored row (`created: false`) and writes nothing.
     */
    async record(
      treeId: number,
      sugarbushId: number,
      userId: number,
      input: MeasurementInput,
    ): Promise<{ entry: Measurement; created: boolean }> {
      return storeOnce({
        clientId: input.clientId,
        find: (clientId) => repo.findByClientId(clientId),
        matches: (m) =>
          m.treeId === treeId &&
          m.measuredOn === input.measuredOn &&
          m.dbhCm === input.dbhCm &&
          m.crownDiebackPct === (input.crownDiebackPct ?? null) &&
          m.note === (input.note ?? null) &&
          m.correctsId === (input.correctsId ?? null),
        check: () => checkNew(treeId, input),
        create: () => create(treeId, sugarbushId, userId, input),
      });
    },
  };
}

import type { AppContext } from '../../context';
import { AppError } from '../../errors';
import { lockRow } from '../../lib/db-engine';
import { expectedSyrup, sapHoldingCautions, summarizeSap } from '../../../shared/rules/index';
import type { Collection } from '../../../shared/schemas/enums';
import type {
  SapCorrection,
  SapEntry,
  SapEntryInput,
  SapList,
  SapListQuery,
} from '../../../shared/schemas/sap';
import { auditRepository } from '../audit/audit.repository';
import { storeOnce } from '../field-entries/store-once';
import { logSeason } from '../weather/weather.service';
import { sapRepository, type StoredSap } from './sap.repository';

/** The entry with what it should make, its cautions, and its yield per tap (API in °C and litres). */
function sapEntry(s: StoredSap, taps: number): SapEntry {
  const syrup = expectedSyrup(s.volumeL, s.sugarPct);
  return {
    ...s,
    expectedSyrupL: syrup.jones86,
    expectedSyrupLRevised: syrup.revised66,
    cautions: sapHoldingCautions(s.heldAtC, 'C'),
    taps,
    yieldPerTapL: summarizeSap([s], taps).yieldPerTapL,
  };
}

const fields = [
  'collectedOn',
  'volumeL',
  'sugarPct',
  'heldAtC',
  'collection',
  'syrupMadeL',
  'note',
] as const;

/** The entry's fields as they are stored: what was left out is null, an empty note none. */
const sapFields = (
  v: Omit<SapEntryInput, 'clientId'>,
): Pick<StoredSap, (typeof fields)[number]> => ({
  collectedOn: v.collectedOn,
  volumeL: v.volumeL,
  sugarPct: v.sugarPct,
  heldAtC: v.heldAtC ?? null,
  collection: v.collection ?? null,
  syrupMadeL: v.syrupMadeL ?? null,
  note: v.note ? v.note : null,
});

export function sapService(ctx: AppContext) {
  const repo = sapRepository(ctx.db);

  async function answer(id: number): Promise<SapEntry> {
    const stored = (await repo.find(id))!;
    const taps = await repo.taps(stored.sugarbushId, stored.season);
    return sapEntry(stored, taps(stored.collection));
  }

  return {
    async list(sugarbushId: number, q: SapListQuery): Promise<SapList> {
      const season = await logSeason(ctx, sugarbushId, q.season);
      const taps = await repo.taps(sugarbushId, season);
      const { items, total } = await repo.page(sugarbushId, season, {
        collection: q.collection,
        offset: (q.page - 1) * q.pageSize,
        limit: q.pageSize,
        desc: q.sort === '-collectedOn',
      });
      const figures = await repo.seasonFigures(sugarbushId, season, q.collection);
      // The season's taps on the collection asked for; all of them for the whole stand.
      const seasonTaps = taps(q.collection && q.collection !== 'stand' ? q.collection : null);
      const summary = summarizeSap(figures, seasonTaps);
      return {
        items: items.map((s) => sapEntry(s, taps(s.collection))),
        total,
        page: q.page,
        pageSize: q.pageSize,
        season,
        totals: {
          ...summary,
          taps: seasonTaps,
          days: new Set(figures.map((f) => f.collectedOn)).size,
        },
      };
    },

    /**
     * Records a day's sap with its audit entry. A resend with the same `clientId` answers with the
     * stored entry (`created: false`) and writes nothing; the same id with other content is a 409.
     */
    async record(
      sugarbushId: number,
      userId: number,
      input: SapEntryInput,
    ): Promise<{ entry: SapEntry; created: boolean }> {
      const { clientId, ...detail } = input;
      const sent = sapFields(detail);
      const { entry, created } = await storeOnce({
        clientId,
        find: (id) => repo.findByClientId(id),
        matches: (stored) =>
          stored.sugarbushId === sugarbushId && fields.every((f) => stored[f] === sent[f]),
        check: async () => {},
        create: () =>
          ctx.db.transaction(async (trx) => {
            const newId = await sapRepository(trx).create(sugarbushId, userId, input);
            await auditRepository(trx).record({
              sugarbushId,
              userId,
              action: 'create',
              entity: 'sap-entry',
              entityId: newId,
              detail,
            });
            return (await sapRepository(trx).find(newId))!;
          }),
      });
      return { entry: await answer(entry.id), created };
    },

    /** Changes the fields given; the values they replace are kept in the audit trail. */
    async correct(
      id: number,
      sugarbushId: number,
      userId: number,
      patch: SapCorrection,
    ): Promise<SapEntry> {
      await ctx.db.transaction(async (trx) => {
        await lockRow(trx, 'sap_entries', id);
        const stored = sapRepository(trx);
        const before = await stored.find(id);
        if (!before || before.sugarbushId !== sugarbushId)
          throw new AppError(404, 'not-found', 'Sap entry not found');
        const earlier: Record<string, unknown> = {};
        const after: Record<string, unknown> = {};
        for (const f of fields) {
          const value = patch[f];
          if (value === undefined) continue;
          const now = f === 'note' && value === '' ? null : value;
          if (now === before[f]) continue;
          earlier[f] = before[f];
          after[f] = now as string | number | Collection | null;
        }
        if (Object.keys(after).length === 0) return;
        await stored.update(id, patch);
        await auditRepository(trx).record({
          sugarbushId,
          userId,
          action: 'correct',
          entity: 'sap-entry',
          entityId: id,
          detail: { earlier, ...after },
        });
      });
      return answer(id);
    },
  };
}

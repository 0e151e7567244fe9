import type { Knex } from 'knex';
import { warningCodes, type VerdictKey, type WarningCode } from '../../../shared/rules/index';
import type {
  AttentionItem,
  AttentionQuery,
  AttentionReason,
} from '../../../shared/schemas/attention';
import type { TreeStatus } from '../../../shared/schemas/enums';
import { warningBit, warningMask } from '../advice/advice-rows';
import type { FollowUpDays } from './notes.repository';

type Condition = { sql: string; bindings: (string | number)[] };

/** How much each reason weighs in the default order: a hazard first, a warning alone last. */
const weight: Record<AttentionReason, number> = { hazard: 8, overdue: 4, due: 2, warning: 1 };

interface Row {
  id: number;
  tag: string;
  status: TreeStatus;
  verdict: VerdictKey | null;
  taps: number | null;
  warning_mask: number | null;
  hazards: number | null;
  next_follow_up: string | null;
}

/**
 * The "needs a look" queue in SQL: a stand's trees with an unresolved hazard note, a follow-up
 * past or coming due, or a warning in the season's stored advice. Filtered, ordered and paged in
 * the database; the notes are summed per tree first (a stand has far fewer notes than trees).
 */
export function attentionRepository(db: Knex) {
  return {
    async page(
      at: { sugarbushId: number; season: number; standVersion: number },
      q: AttentionQuery,
      days: FollowUpDays,
      range: { offset: number; limit: number },
    ): Promise<{ items: AttentionItem[]; total: number }> {
      const openNotes = db('notes')
        .where('sugarbush_id', at.sugarbushId)
        .whereNotNull('tree_id')
        .whereNull('resolved_at')
        .groupBy('tree_id')
        .select(
          'tree_id',
          db.raw(`sum(case when category = 'hazard' then 1 else 0 end) as hazards`),
          db.raw('min(follow_up_on) as next_follow_up'),
        );

      const mask = q.warning ? warningBit(q.warning) : warningMask(warningCodes);
      const when: Record<AttentionReason, Condition> = {
        hazard: { sql: 'coalesce(n.hazards, 0) > 0', bindings: [] },
        overdue: { sql: 'n.next_follow_up < ?', bindings: [days.today] },
        due: {
          sql: '(n.next_follow_up >= ? and n.next_follow_up <= ?)',
          bindings: [days.today, days.dueBy],
        },
        warning: { sql: '(coalesce(a.warning_mask, 0) & ?) <> 0', bindings: [mask] },
      };
      const reasons = q.reason ? [q.reason] : (Object.keys(when) as AttentionReason[]);
      const priority: Condition = {
        sql: reasons
          .map((r) => `case when ${when[r].sql} then ${weight[r]} else 0 end`)
          .join(' + '),
        bindings: reasons.flatMap((r) => when[r].bindings),
      };

      const base = db('trees as t')
        .leftJoin('tree_advice as a', function () {
          this.on('a.tree_id', 't.id')
            .andOn('a.season', db.raw('?', [at.season]))
            .andOn('a.stand_version', db.raw('?', [at.standVersion]))
            .andOn('a.tree_version', 't.record_version');
        })
        .leftJoin(openNotes.as('n'), 'n.tree_id', 't.id')
        .where('t.sugarbush_id', at.sugarbushId)
        .where((w) => {
          for (const r of reasons) w.orWhereRaw(when[r].sql, when[r].bindings);
        })
        .modify((b) => {
          if (q.warning) b.whereRaw(when.warning.sql, when.warning.bindings);
          if (q.q) b.whereRaw('lower(t.tag) like ?', [`%${q.q.toLowerCase()}%`]);
        });

      const [{ n }] = await db.from(base.clone().select('t.id').as('queue')).count({ n: '*' });

      const sort = q.sort ?? 'priority';
      const dir = sort.startsWith('-') ? 'desc' : 'asc';
      const followUpOrder = (b: Knex.QueryBuilder) =>
        b
          .orderByRaw('case when n.next_follow_up is null then 1 else 0 end')
          .orderBy('n.next_follow_up', sort === 'priority' ? 'asc' : dir);
      const rows: Row[] = await base
        .modify((b) => {
          if (sort === 'priority')
            followUpOrder(b.orderByRaw(`${priority.sql} desc`, priority.bindings));
          if (sort.endsWith('followUp')) followUpOrder(b);
        })
        .orderBy('t.tag', sort.endsWith('tag') ? dir : 'asc')
        .offset(range.offset)
        .limit(range.limit)
        .select(
          't.id',
          't.tag',
          't.status',
          'a.verdict',
          'a.taps',
          'a.warning_mask',
          'n.hazards',
          'n.next_follow_up',
        );

      return { items: rows.map((r) => toItem(r, days)), total: Number(n) };
    },
  };
}

function toItem(r: Row, days: FollowUpDays): AttentionItem {
  const maskOf = Number(r.warning_mask ?? 0);
  const warnings = warningCodes.filter((c: WarningCode) => (maskOf & warningBit(c)) !== 0);
  const hazards = Number(r.hazards ?? 0);
  const next = r.next_follow_up ?? null;
  const reasons: AttentionReason[] = [];
  if (hazards > 0) reasons.push('hazard');
  if (next !== null && next < days.today) reasons.push('overdue');
  else if (next !== null && next <= days.dueBy) reasons.push('due');
  if (warnings.length > 0) reasons.push('warning');
  return {
    treeId: Number(r.id),
    tag: r.tag,
    status: r.status,
    verdict: r.verdict ?? null,
    taps: r.taps === null || r.taps === undefined ? null : Number(r.taps),
    warnings,
    openHazards: hazards,
    nextFollowUpOn: next,
    reasons,
  };
}

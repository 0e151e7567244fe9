import type { Knex } from 'knex';
import { warningCodes, type VerdictKey, type WarningCode } from '../../../shared/rules/index';
import {
  attentionWarnings,
  type AttentionItem,
  type AttentionQuery,
  type AttentionReason,
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
 * the database.
 */
export function attentionRepository(db: Knex) {
  return {
    async page(
      at: { sugarbushId: number; season: number; standVersion: number },
      q: AttentionQuery,
      days: FollowUpDays,
      range: { offset: number; limit: number },
    ): Promise<{ items: AttentionItem[]; total: number }> {
      const hazards = `sum(case when n.category = 'hazard' then 1 else 0 end)`;
      const next = 'min(n.follow_up_on)';
      const mask = q.warning ? warningBit(q.warning) : warningMask(attentionWarnings);
      const when: Record<AttentionReason, Condition> = {
        hazard: { sql: `${hazards} > 0`, bindings: [] },
        overdue: { sql: `${next} < ?`, bindings: [days.today] },
        due: { sql: `(${next} >= ? and ${next} <= ?)`, bindings: [days.today, days.dueBy] },
        warning: { sql: '(coalesce(a.warning_mask, 0) & ?) <> 0', bindings: [mask] },
      };
      const reasons = q.reason ? [q.reason] : (Object.keys(when) as AttentionReason[]);
      const priority: Condition = {
        sql: reasons
          .map((r) => `case when ${when[r].sql} then ${weight[r]} else 0 end`)
          .join(' + '),
        bindings: reasons.flatMap((r) => when[r].bindings),
      };

      // Each tree with its open notes (through the notes' tree index), summed per tree.
      const base = db('trees as t')
        .leftJoin('tree_advice as a', function () {
          this.on('a.tree_id', 't.id')
            .andOn('a.season', db.raw('?', [at.season]))
            .andOn('a.stand_version', db.raw('?', [at.standVersion]))
            .andOn('a.tree_version', 't.record_version');
        })
        .leftJoin('notes as n', function () {
          this.on('n.tree_id', 't.id').andOnNull('n.resolved_at');
        })
        .where('t.sugarbush_id', at.sugarbushId)
        .modify((b) => {
          if (q.warning) b.whereRaw(when.warning.sql, when.warning.bindings);
          if (q.q) b.whereRaw('lower(t.tag) like ?', [`%${q.q.toLowerCase()}%`]);
        })
        .groupBy('t.id', 't.tag', 't.status', 'a.verdict', 'a.taps', 'a.warning_mask')
        .havingRaw(
          reasons.map((r) => `(${when[r].sql})`).join(' or '),
          reasons.flatMap((r) => when[r].bindings),
        );
      const [{ n }] = await db
        .with('queue', base.clone().select('t.id'))
        .from('queue')
        .count({ n: '*' });

      const sort = q.sort ?? 'priority';
      const dir = sort.startsWith('-') ? 'desc' : 'asc';
      const followUpOrder = (b: Knex.QueryBuilder) =>
        b
          .orderByRaw(`case when ${next} is null then 1 else 0 end`)
          .orderByRaw(`${next} ${sort === 'priority' ? 'asc' : dir}`);
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
          db.raw(`${hazards} as hazards`),
          db.raw(`${next} as next_follow_up`),
        );

      return { items: rows.map((r) => toItem(r, days, mask)), total: Number(n) };
    },
  };
}

/** One tree of the queue; `counted` is the warnings' mask that puts a tree in it. */
function toItem(r: Row, days: FollowUpDays, counted: number): AttentionItem {
  const maskOf = Number(r.warning_mask ?? 0);
  const warnings = warningCodes.filter((c: WarningCode) => (maskOf & warningBit(c)) !== 0);
  const hazards = Number(r.hazards ?? 0);
  const next = r.next_follow_up ?? null;
  const reasons: AttentionReason[] = [];
  if (hazards > 0) reasons.push('hazard');
  if (next !== null && next < days.today) reasons.push('overdue');
  else if (next !== null && next <= days.dueBy) reasons.push('due');
  if ((maskOf & counted) !== 0) reasons.push('warning');
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

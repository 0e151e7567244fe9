import type { Knex } from 'knex';
import {
  warningCodes,
  type Advice,
  type PlanTotals,
  type VerdictKey,
  type WarningCode,
} from '../../../shared/rules/index';
import type {
  PlanChange,
  PlanChangeKind,
  SeasonProgress,
} from '../../../shared/schemas/issued-plan';
import { shareBands, sharedVerdicts } from '../../../shared/schemas/share-bands';
import { walkingOrder } from '../../../shared/geo/walking-order';
import { isUniqueViolation } from '../../lib/db-engine';
import type { PlanFilter } from '../advice/advice.repository';
import { warningBit } from '../advice/advice-rows';
import { profileOf } from '../advice/stand-guideline';
import { planChanges, type CalledTree } from './plan-changes';
import {
  currentAdvice,
  issuedPlansRepository,
  standHazards,
  type IssuedTreeRow,
} from './issued-plans.repository';

interface OnSeason {
  sugarbushId: number;
  season: number;
  /** The stand's guideline version whose rows are complete for the season. */
  standVersion: number;
}

/** Whole-stand work on issued plans, run in the advice worker pool on its own connection. */
export type IssuedPlanTask =
  | (OnSeason & { kind: 'issue'; issuedBy: { id: number; name: string } })
  | (OnSeason & { kind: 'changes'; issuedPlanId: number })
  | (OnSeason & { kind: 'progress'; issuedPlanId: number | null })
  | (OnSeason & { kind: 'sheet-order'; issuedPlanId: number | null; filter: PlanFilter });

/** `stale`: the stored advice moved while it was read; ensure it again and retry. */
export type IssueResult = { issued: { id: number; version: number } } | { stale: true };
export type ChangesResult = { changes: PlanChange[]; byKind: Record<PlanChangeKind, number> };
export type SheetOrder = { ids: number[]; taps: number };
export type ProgressResult = Omit<SeasonProgress, 'season' | 'plannedFrom' | 'issuedVersion'>;

export async function runIssuedPlanTask(
  db: Knex,
  task: IssuedPlanTask,
): Promise<IssueResult | ChangesResult | SheetOrder | ProgressResult> {
  if (task.kind === 'issue') return issue(db, task);
  if (task.kind === 'changes') return changes(db, task);
  if (task.kind === 'progress') return progress(db, task);
  return sheetOrder(db, task);
}

type StoredAdvice = Pick<
  Advice,
  'verdict' | 'taps' | 'placements' | 'bitCm' | 'depthCm' | 'conductiveShare' | 'warnings'
>;

function totalsOf(rows: readonly { verdict: string; taps: number; codes: Set<string> }[]) {
  const count = (v: VerdictKey) => rows.filter((r) => r.verdict === v).length;
  const totals: PlanTotals = {
    trees: rows.length,
    treesToTap: rows.filter((r) => r.taps > 0).length,
    taps: rows.reduce((n, r) => n + r.taps, 0),
    reduced: count('tap-reduced'),
    rested: count('rest'),
    tooSmall: count('too-small'),
    retired: count('retired'),
    unmeasured: count('unmeasured'),
    warningsByCode: Object.fromEntries(
      warningCodes.map((code) => [code, rows.filter((r) => r.codes.has(code)).length]),
    ) as Record<WarningCode, number>,
  };
  return totals;
}

/** Freeze the season's stored advice, with the open hazard notes' text, as the next version. */
async function issue(
  db: Knex,
  task: Extract<IssuedPlanTask, { kind: 'issue' }>,
): Promise<IssueResult> {
  for (let attempt = 0; ; attempt++) {
    try {
      return await db.transaction(async (trx) => {
        const stand = await trx('sugarbushes')
          .where({ id: task.sugarbushId })
          .first('profile', 'custom_profile', 'advice_version');
        if (Number(stand.advice_version) !== task.standVersion) return { stale: true as const };
        const profile = profileOf(stand.profile, stand.custom_profile);
        // One after another: a transaction is one connection, which takes one query at a time.
        const rows = await currentAdvice(trx, task.sugarbushId, task.season, task.standVersion)
          .orderBy('t.tag')
          .select<{ id: number; tag: string; payload: string }[]>('t.id', 't.tag', 'a.payload');
        const count = await trx('trees')
          .where({ sugarbush_id: task.sugarbushId })
          .count({ n: '*' })
          .first();
        const hazards = await standHazards(trx, task.sugarbushId);
        // A tree changed or was added after the rows were made current.
        if (rows.length !== Number(count?.n ?? 0)) return { stale: true as const };
        const trees: (IssuedTreeRow & { codes: Set<string> })[] = rows.map((r) => {
          const a = JSON.parse(r.payload) as StoredAdvice;
          const codes = new Set<string>(a.warnings.map((w) => w.code));
          return {
            tree_id: Number(r.id),
            tag: r.tag,
            verdict: a.verdict,
            taps: a.taps,
            bit_cm: a.taps > 0 ? a.bitCm : null,
            depth_cm: a.taps > 0 ? a.depthCm : null,
            conductive_share: a.conductiveShare,
            warning_mask: [...codes].reduce((m, c) => m | warningBit(c as WarningCode), 0),
            placements: JSON.stringify(
              a.placements.map((p) => ({ azimuthDeg: p.azimuthDeg, heightCm: p.heightCm })),
            ),
            hazards: JSON.stringify(hazards.get(Number(r.id)) ?? []),
            codes,
          };
        });
        const repo = issuedPlansRepository(trx);
        const version = (await repo.latestVersion(task.sugarbushId, task.season)) + 1;
        const id = await repo.insert(
          trx,
          {
            sugarbush_id: task.sugarbushId,
            season: task.season,
            version,
            issued_by: task.issuedBy.id,
            issued_by_name: task.issuedBy.name,
            issued_at: new Date().toISOString(),
            profile_key: profile.key,
            profile_label: profile.label,
            profile_source: profile.source,
            advice_version: task.standVersion,
            totals: JSON.stringify(totalsOf(trees)),
          },
          trees.map(({ codes: _codes, ...row }) => row),
        );
        return { issued: { id, version } };
      });
    } catch (err) {
      // Two owners issued at once: the other took this version number; take the next.
      if (isUniqueViolation(err) && attempt < 3) continue;
      throw err;
    }
  }
}

type AdviceLine = { id: number; tag: string; verdict: string; taps: number; payload: string };

async function changes(
  db: Knex,
  task: Extract<IssuedPlanTask, { kind: 'changes' }>,
): Promise<ChangesResult> {
  const [issuedRows, currentRows] = await Promise.all([
    db('issued_plan_trees')
      .where({ issued_plan_id: task.issuedPlanId })
      .select<IssuedTreeRow[]>('tree_id', 'tag', 'verdict', 'taps', 'placements'),
    currentAdvice(db, task.sugarbushId, task.season, task.standVersion).select<AdviceLine[]>(
      't.id',
      't.tag',
      'a.verdict',
      'a.taps',
      'a.payload',
    ),
  ]);
  const issued: CalledTree[] = issuedRows.map((r) => ({
    treeId: Number(r.tree_id),
    tag: r.tag,
    verdict: r.verdict as VerdictKey,
    taps: Number(r.taps),
    placements: JSON.parse(r.placements),
  }));
  const current: CalledTree[] = currentRows.map((r) => ({
    treeId: Number(r.id),
    tag: r.tag,
    verdict: r.verdict as VerdictKey,
    taps: Number(r.taps),
    placements: Number(r.taps) > 0 ? (JSON.parse(r.payload) as StoredAdvice).placements : [],
  }));
  return planChanges(issued, current);
}

/** Each planned tree's taps: from the issued copy, or from today's stored advice. */
async function plannedTaps(
  db: Knex,
  task: OnSeason & { issuedPlanId: number | null },
): Promise<
  {
    id: number;
    tag: string;
    verdict: string;
    taps: number;
    warning_mask: number;
    conductive_share: number;
  }[]
> {
  const rows = task.issuedPlanId
    ? await db('issued_plan_trees')
        .where({ issued_plan_id: task.issuedPlanId })
        .where('taps', '>', 0)
        .orderBy('tag')
        .select('tree_id as id', 'tag', 'verdict', 'taps', 'warning_mask', 'conductive_share')
    : await currentAdvice(db, task.sugarbushId, task.season, task.standVersion)
        .where('a.taps', '>', 0)
        .orderBy('t.tag')
        .select('t.id', 't.tag', 'a.verdict', 'a.taps', 'a.warning_mask', 'a.conductive_share');
  return rows.map((r) => ({
    ...r,
    id: Number(r.id),
    taps: Number(r.taps),
    warning_mask: Number(r.warning_mask),
    conductive_share: Number(r.conductive_share),
  }));
}

async function progress(
  db: Knex,
  task: Extract<IssuedPlanTask, { kind: 'progress' }>,
): Promise<ProgressResult> {
  const [planned, drilled] = await Promise.all([
    plannedTaps(db, task),
    db('tapholes as h')
      .join('trees as t', 't.id', 'h.tree_id')
      .where('t.sugarbush_id', task.sugarbushId)
      .where('h.season', task.season)
      .groupBy('h.tree_id')
      .select<{ tree_id: number; n: number }[]>('h.tree_id', db.raw('count(*) as n')),
  ]);
  const holes = new Map(drilled.map((d) => [Number(d.tree_id), Number(d.n)]));
  return {
    plannedTaps: planned.reduce((n, p) => n + p.taps, 0),
    drilledTaps: drilled.reduce((n, d) => n + Number(d.n), 0),
    treesToTap: planned.length,
    treesDone: planned.filter((p) => (holes.get(p.id) ?? 0) >= p.taps).length,
  };
}

/** The trees the sheet lists (to tap, through the plan's filters), in walking order. */
async function sheetOrder(
  db: Knex,
  task: Extract<IssuedPlanTask, { kind: 'sheet-order' }>,
): Promise<SheetOrder> {
  const f = task.filter;
  const band = f.share === undefined ? undefined : shareBands.find((b) => b.key === f.share);
  if (f.warning && !(warningCodes as readonly string[]).includes(f.warning))
    return { ids: [], taps: 0 };
  const q = f.q?.toLowerCase();
  const lines = (await plannedTaps(db, task)).filter(
    (r) =>
      (!q || r.tag.toLowerCase().includes(q)) &&
      (!f.verdict || r.verdict === f.verdict) &&
      (!f.warning || (r.warning_mask & warningBit(f.warning as WarningCode)) !== 0) &&
      (!band ||
        ((sharedVerdicts as readonly string[]).includes(r.verdict) &&
          r.conductive_share >= band.min &&
          (band.max === null || r.conductive_share < band.max))),
  );
  const spots: { id: number; lat: number | null; lng: number | null }[] = await db('trees')
    .where({ sugarbush_id: task.sugarbushId })
    .select('id', 'lat', 'lng');
  const at = new Map(spots.map((s) => [Number(s.id), s]));
  const ordered = walkingOrder(
    lines.map((l) => ({
      id: l.id,
      lat: at.get(l.id)?.lat ?? null,
      lng: at.get(l.id)?.lng ?? null,
    })),
  );
  return { ids: ordered.map((o) => o.id), taps: lines.reduce((n, l) => n + l.taps, 0) };
}

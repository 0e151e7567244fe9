import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { warningCodes } from '../../shared/rules/index';
import {
  attentionWarnings,
  type AttentionItem,
  type AttentionReason,
} from '../../shared/schemas/attention';
import { isoDay } from '../../shared/schemas/iso-date';
import { upcomingSeason } from '../../shared/schemas/plan';
import { warningBit, warningMask } from '../../server/modules/advice/advice-rows';
import { addTree, makeTestApp, recordsWritten, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let consultant: Awaited<ReturnType<typeof signIn>>;
let tapper: Awaited<ReturnType<typeof signIn>>;
const season = upcomingSeason();
const day = (offset: number) => isoDay(new Date(), offset);

/** A healthy, measured maple: two readings a few seasons apart, growing well, a sound crown. */
async function measuredTree(tag: string, dbhCm = 45) {
  const id = await addTree(t.db, team.standId, tag);
  await t.db('measurements').insert([
    {
      tree_id: id,
      measured_on: `${season - 4}-10-01`,
      season: season - 4,
      dbh_cm: dbhCm - 3,
      crown_dieback_pct: 5,
    },
    {
      tree_id: id,
      measured_on: `${season - 1}-10-01`,
      season: season - 1,
      dbh_cm: dbhCm,
      crown_dieback_pct: 5,
    },
  ]);
  return id;
}

async function note(treeId: number | null, category: string, extra: Record<string, unknown> = {}) {
  await t.db('notes').insert({
    sugarbush_id: team.standId,
    tree_id: treeId,
    category,
    body: `${category} note`,
    ...extra,
  });
}

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  consultant = await signIn(t.app, team.users.consultant);
  tapper = await signIn(t.app, team.users.tapper);

  const healthy = await measuredTree('A-01');
  const hazard = await measuredTree('A-02');
  const overdue = await measuredTree('A-03');
  const due = await measuredTree('A-04');
  const later = await measuredTree('A-05');
  const resolved = await measuredTree('A-06');
  await measuredTree('A-07', 20);
  const smallWithHazard = await measuredTree('A-08', 21);
  const both = await measuredTree('A-09');
  await note(healthy, 'health');
  await note(hazard, 'hazard');
  await note(overdue, 'follow-up', { follow_up_on: day(-2) });
  await note(due, 'tapping', { follow_up_on: day(3) });
  await note(later, 'follow-up', { follow_up_on: day(60) });
  await note(resolved, 'hazard', { resolved_at: t.db.fn.now() });
  await note(resolved, 'follow-up', { follow_up_on: day(-5), resolved_at: t.db.fn.now() });
  await note(smallWithHazard, 'hazard');
  await note(both, 'follow-up', { follow_up_on: day(1) });
  await note(both, 'follow-up', { follow_up_on: day(-1) });
  await note(null, 'hazard');
  await note(null, 'follow-up', { follow_up_on: day(-1) });
  await recordsWritten(t.db, team.standId);
});
afterAll(() => t.close());

const weight: Record<AttentionReason, number> = { hazard: 8, overdue: 4, due: 2, warning: 1 };

/**
 * The queue worked out here from the stored rows: advice, notes and trees as the tables hold them.
 * `counted`: the warnings that put a tree in it (by default all but those the verdict answers).
 */
async function expectedQueue(
  today: string,
  dueBy: string,
  counted = warningMask(attentionWarnings),
) {
  const trees = await t.db('trees').where({ sugarbush_id: team.standId });
  const advice = await t.db('tree_advice').where({ sugarbush_id: team.standId, season });
  const notes = await t
    .db('notes')
    .where({ sugarbush_id: team.standId })
    .whereNotNull('tree_id')
    .whereNull('resolved_at');
  const items: (AttentionItem & { score: number })[] = [];
  for (const tree of trees) {
    const row = advice.find((a) => a.tree_id === tree.id && a.tree_version === tree.record_version);
    const mask = row ? Number(row.warning_mask) : 0;
    const own = notes.filter((n) => n.tree_id === tree.id);
    const hazards = own.filter((n) => n.category === 'hazard').length;
    const dates = own.map((n) => n.follow_up_on).filter((d): d is string => d !== null);
    const next = dates.length ? dates.sort()[0] : null;
    const reasons: AttentionReason[] = [];
    if (hazards > 0) reasons.push('hazard');
    if (next !== null && next < today) reasons.push('overdue');
    else if (next !== null && next <= dueBy) reasons.push('due');
    if ((mask & counted) !== 0) reasons.push('warning');
    if (reasons.length === 0) continue;
    items.push({
      treeId: tree.id,
      tag: tree.tag,
      status: tree.status,
      verdict: row?.verdict ?? null,
      taps: row ? Number(row.taps) : null,
      warnings: warningCodes.filter((c) => (mask & warningBit(c)) !== 0),
      openHazards: hazards,
      nextFollowUpOn: next,
      reasons,
      score: reasons.reduce((sum, r) => sum + weight[r], 0),
    });
  }
  // Most pressing first, then the earliest follow-up (none last), then by tag.
  items.sort(
    (a, b) =>
      b.score - a.score ||
      (a.nextFollowUpOn ?? '9999').localeCompare(b.nextFollowUpOn ?? '9999') ||
      (a.tag < b.tag ? -1 : a.tag > b.tag ? 1 : 0),
  );
  return items.map(({ score: _score, ...item }) => item);
}

const queue = (query: Record<string, string> = {}, who = tapper) =>
  who.agent.get(`/api/sugarbushes/${team.standId}/attention`).query(query);

describe('the needs-a-look queue', () => {
  it('when anyone of the stand opens it, then it holds exactly the trees with a warning, a follow-up due or overdue, or an open hazard note, most pressing first', async () => {
    const res = await queue();
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({
      season,
      page: 1,
      pageSize: 50,
      today: day(0),
      dueBy: day(14),
    });
    const expected = await expectedQueue(res.body.today, res.body.dueBy);
    expect(res.body.items).toEqual(expected);
    expect(res.body.total).toBe(expected.length);
    // The fixture means something: every reason shows, and some trees are left out.
    const reasons = new Set(expected.flatMap((i) => i.reasons));
    expect(reasons).toEqual(new Set(['hazard', 'overdue', 'due', 'warning']));
    const tags = expected.map((i) => i.tag);
    expect(tags).not.toContain('A-05');
    expect(tags).not.toContain('A-06');
    expect(tags).toContain('A-02');
  });

  it('when it is filtered by reason or warning, then only those trees come back', async () => {
    const res = await queue();
    const all = await expectedQueue(res.body.today, res.body.dueBy);
    for (const reason of ['hazard', 'overdue', 'due', 'warning'] as const) {
      const page = await queue({ reason });
      expect(page.status).toBe(200);
      expect(page.body.items.map((i: AttentionItem) => i.treeId).sort()).toEqual(
        all
          .filter((i) => i.reasons.includes(reason))
          .map((i) => i.treeId)
          .sort(),
      );
    }
    // A warning the queue leaves out by itself can still be asked for.
    const undersized = await queue({ warning: 'undersized' });
    const small = await expectedQueue(res.body.today, res.body.dueBy, warningBit('undersized'));
    expect(undersized.body.items.map((i: AttentionItem) => i.tag).sort()).toEqual(
      small
        .filter((i) => i.warnings.includes('undersized'))
        .map((i) => i.tag)
        .sort(),
    );
    expect(all.some((i) => i.tag === 'A-07')).toBe(false);
    expect(undersized.body.items.map((i: AttentionItem) => i.tag)).toContain('A-07');
    expect(undersized.body.total).toBeGreaterThan(0);
    expect((await queue({ q: 'a-0' })).body.total).toBe(
      all.filter((i) => i.tag.startsWith('A-0')).length,
    );
    expect((await queue({ q: 'A-02' })).body.items.map((i: AttentionItem) => i.tag)).toEqual([
      'A-02',
    ]);
  });

  it('when it is sorted and paged, then the pages follow the order', async () => {
    const res = await queue();
    const all = await expectedQueue(res.body.today, res.body.dueBy);
    const byTag = await queue({ sort: '-tag' });
    expect(byTag.body.items.map((i: AttentionItem) => i.tag)).toEqual(
      all
        .map((i) => i.tag)
        .sort()
        .reverse(),
    );
    const byFollowUp = await queue({ sort: 'followUp' });
    const dated = all.filter((i) => i.nextFollowUpOn !== null);
    expect(
      byFollowUp.body.items.slice(0, dated.length).map((i: AttentionItem) => i.nextFollowUpOn),
    ).toEqual(dated.map((i) => i.nextFollowUpOn).sort());
    const second = await queue({ page: '2', pageSize: '2' });
    expect(second.body.items).toEqual(all.slice(2, 4));
    expect(second.body.total).toBe(all.length);
  });

  it('when a hazard is resolved, then the tree leaves the queue unless something else keeps it there', async () => {
    const treeId = (await t.db('trees').where({ tag: 'A-02' }).first()).id;
    const hazardNote = await t.db('notes').where({ tree_id: treeId, category: 'hazard' }).first();
    const res = await consultant.agent
      .patch(`/api/notes/${hazardNote.id}`)
      .set('x-csrf-token', consultant.csrf)
      .send({ resolved: true });
    expect(res.status).toBe(200);
    const after = await queue();
    expect(after.body.items.map((i: AttentionItem) => i.tag)).not.toContain('A-02');
    expect(after.body.items).toEqual(await expectedQueue(after.body.today, after.body.dueBy));
  });

  it('when an outsider asks for it, then 404; a bad filter is 400', async () => {
    const outsider = await signIn(t.app, team.users.outsider);
    expect((await queue({}, outsider)).status).toBe(404);
    const bad = await queue({ reason: 'boredom' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.reason).toBeDefined();
  });
});

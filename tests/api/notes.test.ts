import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { isoDay } from '../../shared/schemas/iso-date';
import { FOLLOW_UP_DUE_DAYS } from '../../shared/schemas/note';
import { renameNoteCategories } from '../../migrations/20261205120000_notes_resolved_and_photos';
import { addTree, makeTestApp, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
type Agent = Awaited<ReturnType<typeof signIn>>;
const who = {} as Record<'owner' | 'forester' | 'tapper' | 'consultant' | 'outsider', Agent>;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  for (const role of Object.keys(team.users) as (keyof typeof who)[])
    who[role] = await signIn(t.app, team.users[role]);
});
afterAll(() => t.close());

const post = (a: Agent, url: string, body: object) =>
  a.agent.post(url).set('x-csrf-token', a.csrf).send(body);
const patch = (a: Agent, url: string, body: object) =>
  a.agent.patch(url).set('x-csrf-token', a.csrf).send(body);

describe('writing notes', () => {
  it('when the consultant writes a note on a tree, then it comes back with who wrote it and when', async () => {
    const before = Date.now();
    const res = await post(who.consultant, `/api/trees/${team.treeId}/notes`, {
      category: 'health',
      body: 'Frost crack on the north face, about 40 cm long.',
      followUpOn: '2027-06-01',
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({
      treeId: team.treeId,
      treeTag: 'T-001',
      sugarbushId: team.standId,
      category: 'health',
      body: 'Frost crack on the north face, about 40 cm long.',
      followUpOn: '2027-06-01',
      authorName: 'consultant',
      resolvedAt: null,
      photos: [],
    });
    // An instant, to the second, written now.
    expect(new Date(res.body.createdAt).getTime()).toBeGreaterThanOrEqual(
      Math.floor(before / 1000) * 1000,
    );
    const audit = await t.db('audit_events').where({ entity: 'note', entity_id: res.body.id });
    expect(audit.map((e) => e.action)).toEqual(['create']);
  });

  it('when the owner writes a note on the whole stand, then it has no tree', async () => {
    const res = await post(who.owner, `/api/sugarbushes/${team.standId}/notes`, {
      category: 'management',
      body: 'Thin the beech along the east lateral next winter.',
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ treeId: null, treeTag: null, followUpOn: null });
  });

  it('when a tapper or a forester writes a note, then it is refused with 403, and an outsider gets 404', async () => {
    const body = { category: 'hazard', body: 'Hanger over the lateral.' };
    for (const a of [who.tapper, who.forester]) {
      expect((await post(a, `/api/trees/${team.treeId}/notes`, body)).status).toBe(403);
      expect((await post(a, `/api/sugarbushes/${team.standId}/notes`, body)).status).toBe(403);
    }
    const outsider = await post(who.outsider, `/api/trees/${team.treeId}/notes`, body);
    expect(outsider.status).toBe(404);
    expect(outsider.body.error.code).toBe('not-found');
    expect((await post(who.outsider, `/api/sugarbushes/${team.standId}/notes`, body)).status).toBe(
      404,
    );
  });

  it('when a note has an unknown category, no text or a date that does not exist, then 400 names the fields', async () => {
    const res = await post(who.consultant, `/api/trees/${team.treeId}/notes`, {
      category: 'finding',
      body: '   ',
      followUpOn: '2027-02-30',
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['body', 'category', 'followUpOn']);
  });
});

describe('resolving and reopening', () => {
  it('when the consultant resolves a note, then it says who and when; resolving again keeps the first; reopening clears both', async () => {
    const { body: note } = await post(who.consultant, `/api/trees/${team.treeId}/notes`, {
      category: 'hazard',
      body: 'Dead limb over the tubing.',
    });
    const resolved = await patch(who.consultant, `/api/notes/${note.id}`, { resolved: true });
    expect(resolved.status, JSON.stringify(resolved.body)).toBe(200);
    expect(resolved.body.resolvedByName).toBe('consultant');
    expect(typeof resolved.body.resolvedAt).toBe('string');

    const again = await patch(who.owner, `/api/notes/${note.id}`, { resolved: true });
    expect(again.body.resolvedByName).toBe('consultant');
    expect(again.body.resolvedAt).toBe(resolved.body.resolvedAt);

    const reopened = await patch(who.owner, `/api/notes/${note.id}`, { resolved: false });
    expect(reopened.status).toBe(200);
    expect(reopened.body).toMatchObject({ resolvedAt: null, resolvedById: null });
    const actions = await t
      .db('audit_events')
      .where({ entity: 'note', entity_id: note.id })
      .orderBy('id')
      .pluck('action');
    expect(actions).toEqual(['create', 'resolve', 'reopen']);
  });

  it('when a tapper resolves a note, then 403; an outsider, or a note that does not exist, 404', async () => {
    const { body: note } = await post(who.consultant, `/api/trees/${team.treeId}/notes`, {
      category: 'follow-up',
      body: 'Re-rate the crown in July.',
    });
    expect((await patch(who.tapper, `/api/notes/${note.id}`, { resolved: true })).status).toBe(403);
    const outsider = await patch(who.outsider, `/api/notes/${note.id}`, { resolved: true });
    const missing = await patch(who.outsider, `/api/notes/99999`, { resolved: true });
    expect([outsider.status, missing.status]).toEqual([404, 404]);
    expect(outsider.body).toEqual(missing.body);
    const row = await t.db('notes').where({ id: note.id }).first();
    expect(row.resolved_at).toBeNull();
  });

  it('when a change says nothing, then 400', async () => {
    const { body: note } = await post(who.consultant, `/api/trees/${team.treeId}/notes`, {
      category: 'health',
      body: 'Sapsucker holes at breast height.',
    });
    expect((await patch(who.consultant, `/api/notes/${note.id}`, {})).status).toBe(400);
    expect((await patch(who.consultant, `/api/notes/${note.id}`, { body: 'x' })).status).toBe(400);
  });
});

describe('listing notes', () => {
  let standId: number;
  let treeA: number;
  let treeB: number;
  const ids: Record<string, number> = {};

  beforeAll(async () => {
    // A stand of its own, so the other tests' notes do not show here.
    const [row] = await t.db('sugarbushes').insert({ name: 'List Hollow' }).returning('id');
    standId = typeof row === 'object' ? row.id : row;
    const consultantId = who.consultant.me.user.id;
    await t.db('memberships').insert([
      { user_id: consultantId, sugarbush_id: standId, role: 'consultant' },
      { user_id: who.tapper.me.user.id, sugarbush_id: standId, role: 'tapper' },
    ]);
    treeA = await addTree(t.db, standId, 'L-001');
    treeB = await addTree(t.db, standId, 'L-002');
    const write = async (key: string, url: string, body: object) => {
      const res = await post(who.consultant, url, body);
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      ids[key] = res.body.id;
    };
    await write('overdue', `/api/trees/${treeA}/notes`, {
      category: 'follow-up',
      body: 'Check the canker on the root collar.',
      followUpOn: isoDay(new Date(), -3),
    });
    await write('soon', `/api/trees/${treeB}/notes`, {
      category: 'follow-up',
      body: 'Tape it again before tapping.',
      followUpOn: isoDay(new Date(), FOLLOW_UP_DUE_DAYS),
    });
    await write('later', `/api/trees/${treeB}/notes`, {
      category: 'tapping',
      body: 'One tap only next season.',
      followUpOn: isoDay(new Date(), FOLLOW_UP_DUE_DAYS + 1),
    });
    await write('hazard', `/api/trees/${treeA}/notes`, {
      category: 'hazard',
      body: 'Widow-maker over the mainline.',
    });
    await write('stand', `/api/sugarbushes/${standId}/notes`, {
      category: 'management',
      body: 'Walk the mainline after every storm.',
    });
    await write('resolvedOverdue', `/api/trees/${treeA}/notes`, {
      category: 'follow-up',
      body: 'Flag the tree.',
      followUpOn: isoDay(new Date(), -10),
    });
    await patch(who.consultant, `/api/notes/${ids.resolvedOverdue}`, { resolved: true });
  });

  const list = async (url: string, query: Record<string, string> = {}) => {
    const res = await who.tapper.agent.get(url).query(query);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    return res.body as { items: { id: number }[]; total: number; page: number; pageSize: number };
  };
  const idsOf = (page: { items: { id: number }[] }) => page.items.map((n) => n.id);

  it('when anyone of the stand lists its notes, then every note shows, newest first, paged', async () => {
    const all = await list(`/api/sugarbushes/${standId}/notes`);
    expect(all.total).toBe(6);
    expect(idsOf(all)).toEqual(Object.values(ids).sort((a, b) => b - a));
    const second = await list(`/api/sugarbushes/${standId}/notes`, { page: '2', pageSize: '4' });
    expect(second).toMatchObject({ total: 6, page: 2, pageSize: 4 });
    expect(idsOf(second)).toEqual(idsOf(all).slice(4));
  });

  it('when the list is filtered, then only the notes of that category, state, follow-up or scope come back', async () => {
    const url = `/api/sugarbushes/${standId}/notes`;
    expect(idsOf(await list(url, { category: 'hazard' }))).toEqual([ids.hazard]);
    expect(idsOf(await list(url, { status: 'resolved' }))).toEqual([ids.resolvedOverdue]);
    expect((await list(url, { status: 'open' })).total).toBe(5);
    expect(new Set(idsOf(await list(url, { followUp: 'due' })))).toEqual(
      new Set([ids.overdue, ids.soon]),
    );
    expect(idsOf(await list(url, { followUp: 'overdue' }))).toEqual([ids.overdue]);
    expect(idsOf(await list(url, { scope: 'stand' }))).toEqual([ids.stand]);
    expect((await list(url, { scope: 'trees' })).total).toBe(5);
    expect(idsOf(await list(url, { q: 'MAINLINE' })).sort()).toEqual(
      [ids.hazard, ids.stand].sort(),
    );
    expect((await list(url, { q: 'L-002' })).total).toBe(2);
  });

  it('when sorted by follow-up, then the earliest date comes first and notes without one last', async () => {
    const page = await list(`/api/sugarbushes/${standId}/notes`, { sort: 'followUp' });
    expect(idsOf(page).slice(0, 4)).toEqual([
      ids.resolvedOverdue,
      ids.overdue,
      ids.soon,
      ids.later,
    ]);
    const reversed = await list(`/api/sugarbushes/${standId}/notes`, { sort: '-followUp' });
    expect(idsOf(reversed).slice(0, 4)).toEqual([
      ids.later,
      ids.soon,
      ids.overdue,
      ids.resolvedOverdue,
    ]);
  });

  it('when a tree’s notes are listed, then only that tree’s come back', async () => {
    const page = await list(`/api/trees/${treeB}/notes`);
    expect(new Set(idsOf(page))).toEqual(new Set([ids.soon, ids.later]));
  });

  it('when the sort is not one the list knows, then 400', async () => {
    const res = await who.tapper.agent.get(`/api/sugarbushes/${standId}/notes?sort=body`);
    expect(res.status).toBe(400);
    expect(res.body.error.fields.sort).toBeDefined();
  });
});

describe('notes written before the categories had their names', () => {
  it('when the names move on, then a finding is about health, advice on a tree is tapping advice and advice on the stand is management', async () => {
    const [row] = await t.db('sugarbushes').insert({ name: 'Old Notes' }).returning('id');
    const standId = typeof row === 'object' ? row.id : row;
    const treeId = await addTree(t.db, standId, 'O-1');
    const add = async (category: string, tree: number | null) => {
      const [r] = await t
        .db('notes')
        .insert({ sugarbush_id: standId, tree_id: tree, category, body: category })
        .returning('id');
      return typeof r === 'object' ? r.id : r;
    };
    const before = {
      finding: await add('finding', treeId),
      treeAdvice: await add('advice', treeId),
      standAdvice: await add('advice', null),
      hazard: await add('hazard', treeId),
      followUp: await add('follow-up', null),
    };
    await renameNoteCategories(t.db);
    const after = Object.fromEntries(
      (await t.db('notes').where({ sugarbush_id: standId })).map((n) => [n.id, n.category]),
    );
    expect(after).toEqual({
      [before.finding]: 'health',
      [before.treeAdvice]: 'tapping',
      [before.standAdvice]: 'management',
      [before.hazard]: 'hazard',
      [before.followUp]: 'follow-up',
    });
  });
});

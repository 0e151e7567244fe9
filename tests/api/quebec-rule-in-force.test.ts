import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as moveToRuleInForce from '../../migrations/20261202140100_quebec_public_rule_in_force';
import {
  addSugarbush,
  addTree,
  makeTestApp,
  recordsWritten,
  signIn,
  standWithTeam,
} from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let owner: Awaited<ReturnType<typeof signIn>>;
let conservativeStand: number;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  owner = await signIn(t.app, team.users.owner);
  // The database as it was: the stand on the repealed public-land table, before the move.
  await moveToRuleInForce.down(t.db);
  await t.db('sugarbushes').where({ id: team.standId }).update({ profile: 'quebec-public' });
  conservativeStand = await addSugarbush(t.db, 'Other Ridge');
  await moveToRuleInForce.up(t.db);
  // A 60 cm maple: three taps by the repealed 2004 table, two by the rule in force.
  const treeId = await addTree(t.db, team.standId, 'Q-060');
  await t.db('measurements').insert([
    { tree_id: treeId, measured_on: '2024-10-01', season: 2024, dbh_cm: 59.2 },
    { tree_id: treeId, measured_on: '2025-10-01', season: 2025, dbh_cm: 60 },
  ]);
  await recordsWritten(t.db, team.standId, [treeId]);
});
afterAll(() => t.close());

const plan = () => owner.agent.get(`/api/sugarbushes/${team.standId}/plan?season=2027&q=Q-060`);

// Quebec public land: r.2 (2004) was replaced on 2018-08-16 by r.8.1; s.24 is the
// rule in force (table from memory where its current text could not be read, 2026-12-01) — P.
describe('a stand that followed the repealed Quebec public-land table', () => {
  it('moves to the rule in force, and the plan tells the owner so', async () => {
    const res = await plan();
    expect(res.status).toBe(200);
    expect(res.body.profile.key).toBe('quebec-public');
    expect(res.body.profile.source).toContain('A-18.1 r.8.1 s.24');
    expect(res.body.profile.notice).toContain('replaced on 2018-08-16');
    expect(res.body.items[0].tableTaps).toBe(2);
    const other = await t.db('sugarbushes').where({ id: conservativeStand }).first();
    expect(other.profile_notice).toBeNull();
  });

  it('carries the season rules with the plan: 1 January – 30 April, spouts out by 1 June', async () => {
    const rules = (await plan()).body.profile.seasonRules.map((r: { text: string }) => r.text);
    expect(rules.join(' ')).toContain('1 January and 30 April');
    expect(rules.join(' ')).toContain('1 June');
  });

  it('when the owner chooses the guideline again, then the notice is gone', async () => {
    const res = await owner.agent
      .patch(`/api/sugarbushes/${team.standId}`)
      .set('x-csrf-token', owner.csrf)
      .send({ profile: 'quebec-public' });
    expect(res.status).toBe(200);
    expect((await plan()).body.profile.notice).toBeNull();
  });
});

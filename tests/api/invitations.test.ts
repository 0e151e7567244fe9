import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import {
  addUser,
  csrfAgent,
  lastMailTo,
  linkToken,
  makeTestApp,
  signIn,
  standWithTeam,
} from './test-app';

const closers: (() => Promise<void>)[] = [];
afterEach(async () => {
  while (closers.length) await closers.pop()!();
});

async function setup() {
  const t = await makeTestApp();
  closers.push(t.close);
  const team = await standWithTeam(t.db);
  const owner = await signIn(t.app, team.users.owner);
  /** The owner invites; the link is read from the invitee's mail. */
  const invite = async (email: string, role = 'consultant') => {
    const res = await owner.agent
      .post(`/api/sugarbushes/${team.standId}/invitations`)
      .set('x-csrf-token', owner.csrf)
      .send({ email, role });
    await t.ctx.background.idle();
    const token =
      res.status === 201
        ? linkToken((await lastMailTo(t.db, email.toLowerCase())).body, '/invitations')
        : '';
    return { res, token };
  };
  return { ...t, ...team, owner, invite };
}

const membershipCount = async (db: Awaited<ReturnType<typeof makeTestApp>>['db']) =>
  Number((await db('memberships').count({ n: '*' }))[0].n);

describe('inviting someone new', () => {
  it('when the owner invites a new address, then the link shows the stand and creates the account that joins it, once', async () => {
    const { app, db, standId, owner, invite } = await setup();
    const { res, token } = await invite('New.Consultant@Test.example');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      email: 'new.consultant@test.example',
      role: 'consultant',
      status: 'pending',
    });
    const listed = await owner.agent.get(`/api/sugarbushes/${standId}/invitations`);
    expect(listed.body.items.map((i: { email: string }) => i.email)).toEqual([
      'new.consultant@test.example',
    ]);
    const stored = await db('invitations').first();
    expect(stored.token_hash).not.toBe(token);
    const days = (new Date(stored.expires_at).getTime() - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThanOrEqual(7);

    const visitor = await csrfAgent(app);
    const preview = await visitor.agent.get(`/api/invitations/${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({
      sugarbushName: 'Test Ridge',
      role: 'consultant',
      email: 'new.consultant@test.example',
      invitedByName: 'owner',
      accountExists: false,
      signedInEmail: null,
    });

    const accepted = await visitor.agent
      .post(`/api/invitations/${token}/accept`)
      .set('x-csrf-token', visitor.csrf)
      .send({ name: 'Nia Consultant', password: 'consulting-pw-2027' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.sugarbushId).toBe(standId);
    expect(accepted.body.me.user.email).toBe('new.consultant@test.example');
    expect(accepted.body.me.memberships).toEqual([{ sugarbushId: standId, role: 'consultant' }]);
    const me = await visitor.agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect((await visitor.agent.get(`/api/sugarbushes/${standId}`)).status).toBe(200);

    const before = await membershipCount(db);
    const second = await csrfAgent(app);
    const again = await second.agent
      .post(`/api/invitations/${token}/accept`)
      .set('x-csrf-token', second.csrf)
      .send({ name: 'Someone Else', password: 'another-pw-2027' });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('invitation-used');
    expect(await membershipCount(db)).toBe(before);
    expect((await owner.agent.get(`/api/sugarbushes/${standId}/invitations`)).body.total).toBe(0);
  });

  it('when the new account’s password is only spaces or missing, then nothing is created', async () => {
    const { app, db, invite } = await setup();
    const { token } = await invite('spaces@test.example');
    const visitor = await csrfAgent(app);
    for (const body of [{ name: 'S', password: '             ' }, { name: 'S' }, {}]) {
      const res = await visitor.agent
        .post(`/api/invitations/${token}/accept`)
        .set('x-csrf-token', visitor.csrf)
        .send(body);
      expect(res.status).toBe(400);
    }
    expect(await db('users').where({ email: 'spaces@test.example' })).toEqual([]);
    expect((await db('invitations').first()).accepted_at).toBeNull();
  });
});

describe('an existing account joins', () => {
  it('when the invited address has an account, then it must sign in and then joins with the invited role', async () => {
    const { app, db, standId, invite } = await setup();
    await addUser(db, 'grower@test.example');
    const { token } = await invite('grower@test.example', 'tapper');
    const visitor = await csrfAgent(app);
    expect((await visitor.agent.get(`/api/invitations/${token}`)).body.accountExists).toBe(true);
    const unsigned = await visitor.agent
      .post(`/api/invitations/${token}/accept`)
      .set('x-csrf-token', visitor.csrf)
      .send({ name: 'Taking over', password: 'takeover-attempt-pw' });
    expect(unsigned.status).toBe(409);
    expect(unsigned.body.error.code).toBe('account-exists');

    const grower = await signIn(app, 'grower@test.example');
    const joined = await grower.agent
      .post(`/api/invitations/${token}/accept`)
      .set('x-csrf-token', grower.csrf)
      .send({});
    expect(joined.status).toBe(200);
    expect(joined.body.me.memberships).toContainEqual({ sugarbushId: standId, role: 'tapper' });
  });

  it('when someone else is signed in, then the link refuses them and changes nothing', async () => {
    const { app, db, users, invite } = await setup();
    const { token } = await invite('meant-for@test.example');
    const other = await signIn(app, users.outsider);
    const before = await membershipCount(db);
    const res = await other.agent
      .post(`/api/invitations/${token}/accept`)
      .set('x-csrf-token', other.csrf)
      .send({});
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('invitation-other-account');
    expect(await membershipCount(db)).toBe(before);
    expect((await db('invitations').first()).accepted_at).toBeNull();
  });
});

describe('links that no longer work', () => {
  it('when an invitation is revoked, then its link answers 410 and nobody joins', async () => {
    const { app, db, standId, owner, invite } = await setup();
    const { res, token } = await invite('revoked@test.example');
    const revoke = await owner.agent
      .delete(`/api/sugarbushes/${standId}/invitations/${res.body.id}`)
      .set('x-csrf-token', owner.csrf);
    expect(revoke.status).toBe(204);
    const visitor = await csrfAgent(app);
    expect((await visitor.agent.get(`/api/invitations/${token}`)).status).toBe(410);
    const accept = await visitor.agent
      .post(`/api/invitations/${token}/accept`)
      .set('x-csrf-token', visitor.csrf)
      .send({ name: 'Late', password: 'late-password-2027' });
    expect(accept.status).toBe(410);
    expect(accept.body.error.code).toBe('invitation-revoked');
    expect(await db('users').where({ email: 'revoked@test.example' })).toEqual([]);
  });

  it('when an invitation has expired, then its link answers 410, and a resend mails a new link while the old stays dead', async () => {
    const { app, db, ctx, standId, owner, invite } = await setup();
    const { res, token } = await invite('slow@test.example');
    await db('invitations').update({ expires_at: new Date(Date.now() - 60_000).toISOString() });
    const listed = await owner.agent.get(`/api/sugarbushes/${standId}/invitations`);
    expect(listed.body.items[0].status).toBe('expired');
    const visitor = await csrfAgent(app);
    const expired = await visitor.agent
      .post(`/api/invitations/${token}/accept`)
      .set('x-csrf-token', visitor.csrf)
      .send({ name: 'Slow', password: 'slow-password-2027' });
    expect(expired.status).toBe(410);
    expect(expired.body.error.code).toBe('invitation-expired');

    const resent = await owner.agent
      .post(`/api/sugarbushes/${standId}/invitations/${res.body.id}/resend`)
      .set('x-csrf-token', owner.csrf);
    expect(resent.status).toBe(200);
    expect(resent.body.status).toBe('pending');
    await ctx.background.idle();
    const fresh = linkToken((await lastMailTo(db, 'slow@test.example')).body, '/invitations');
    expect(fresh).not.toBe(token);
    expect((await visitor.agent.get(`/api/invitations/${token}`)).status).toBe(404);
    const ok = await visitor.agent
      .post(`/api/invitations/${fresh}/accept`)
      .set('x-csrf-token', visitor.csrf)
      .send({ name: 'Slow', password: 'slow-password-2027' });
    expect(ok.status).toBe(200);
  });

  it('when a link is made up, then it is unknown', async () => {
    const { app } = await setup();
    const res = await request(app).get('/api/invitations/made-up-token-of-some-length');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('invitation-unknown');
  });

  it('when the same address is invited twice, then only the newer link works', async () => {
    const { app, invite } = await setup();
    const first = await invite('twice@test.example');
    const second = await invite('twice@test.example', 'tapper');
    const visitor = await csrfAgent(app);
    expect((await visitor.agent.get(`/api/invitations/${first.token}`)).status).toBe(410);
    const preview = await visitor.agent.get(`/api/invitations/${second.token}`);
    expect(preview.body.role).toBe('tapper');
  });
});

describe('who may invite', () => {
  it('when a forester invites, then 403; when the outsider does, then 404; and no mail goes out', async () => {
    const { app, db, ctx, standId, users } = await setup();
    for (const [who, status] of [
      [users.forester, 403],
      [users.outsider, 404],
    ] as const) {
      const { agent, csrf } = await signIn(app, who);
      const res = await agent
        .post(`/api/sugarbushes/${standId}/invitations`)
        .set('x-csrf-token', csrf)
        .send({ email: 'sneaky@test.example', role: 'owner' });
      expect(res.status).toBe(status);
    }
    await ctx.background.idle();
    expect(await db('invitations').count({ n: '*' })).toEqual([{ n: 0 }]);
    expect(await db('outbox').where({ to_address: 'sneaky@test.example' })).toEqual([]);
  });

  it('when the owner invites a current member, then 409 names the e-mail field', async () => {
    const { users, invite } = await setup();
    const { res } = await invite(users.tapper, 'forester');
    expect(res.status).toBe(409);
    expect(res.body.error.fields.email).toMatch(/on the team/);
  });

  it('when an invitation of the other stand is revoked through this one, then it is not found', async () => {
    const { app, db, otherStandId, users, standId } = await setup();
    const outsider = await signIn(app, users.outsider);
    const made = await outsider.agent
      .post(`/api/sugarbushes/${otherStandId}/invitations`)
      .set('x-csrf-token', outsider.csrf)
      .send({ email: 'theirs@test.example', role: 'tapper' });
    expect(made.status).toBe(201);
    const owner = await signIn(app, users.owner);
    const res = await owner.agent
      .delete(`/api/sugarbushes/${standId}/invitations/${made.body.id}`)
      .set('x-csrf-token', owner.csrf);
    expect(res.status).toBe(404);
    expect((await db('invitations').where({ id: made.body.id }).first()).revoked_at).toBeNull();
  });
});

import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import {
  PASSWORD,
  csrfAgent,
  lastMailTo,
  linkToken,
  makeTestApp,
  signIn,
  standWithTeam,
  storedTime,
} from './test-app';

const closers: (() => Promise<void>)[] = [];
afterEach(async () => {
  while (closers.length) await closers.pop()!();
});

async function setup(env: Record<string, string> = {}) {
  const t = await makeTestApp(env);
  closers.push(t.close);
  const team = await standWithTeam(t.db);
  return { ...t, ...team };
}

describe('signing in and out', () => {
  it('when the password is right, then me lists the user and their memberships', async () => {
    const { app, users, standId } = await setup();
    const { agent } = await signIn(app, users.forester);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(users.forester);
    expect(me.body.user).not.toHaveProperty('password_hash');
    expect(me.body.memberships).toEqual([{ sugarbushId: standId, role: 'forester' }]);
  });

  it('when the password is wrong, then sign-in is refused with 401 and no session', async () => {
    const { app, users } = await setup();
    const agent = request.agent(app);
    const { body } = await agent.get('/api/auth/csrf');
    const res = await agent
      .post('/api/auth/login')
      .set('x-csrf-token', body.token)
      .send({ email: users.owner, password: 'wrong-password' });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('invalid-credentials');
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('when nobody is signed in, then the API answers 401', async () => {
    const { app, standId } = await setup();
    const res = await request(app).get(`/api/sugarbushes/${standId}/trees`);
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('when a user signs out, then the session no longer works', async () => {
    const { app, users } = await setup();
    const { agent, csrf } = await signIn(app, users.owner);
    expect((await agent.post('/api/auth/logout').set('x-csrf-token', csrf)).status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('when the app restarts on the same database, then the session survives', async () => {
    const first = await makeTestApp();
    const { users } = await standWithTeam(first.db);
    const { agent } = await signIn(first.app, users.owner);
    const cookies = (await agent.get('/api/auth/me')).request.cookies as unknown as string;
    await first.close();

    const second = await makeTestApp({}, first.database);
    closers.push(second.close);
    const me = await request(second.app).get('/api/auth/me').set('Cookie', cookies);
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(users.owner);
  });

  it('when a state-changing request has no CSRF token, then it is refused with 403 and nothing is written', async () => {
    const { app, db, users, treeId } = await setup();
    const { agent } = await signIn(app, users.forester);
    const res = await agent
      .post(`/api/trees/${treeId}/measurements`)
      .send({ measuredOn: '2026-10-01', dbhCm: 40 });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf-invalid');
    const bad = await agent
      .post(`/api/trees/${treeId}/measurements`)
      .set('x-csrf-token', 'forged')
      .send({ measuredOn: '2026-10-01', dbhCm: 40 });
    expect(bad.status).toBe(403);
    expect(await db('measurements').count({ n: '*' })).toEqual([{ n: 0 }]);
  });

  it('when sign-in is tried too often, then it is throttled with 429', async () => {
    const { app, users } = await setup({ LOGIN_RATE_LIMIT: '3' });
    const agent = request.agent(app);
    const { body } = await agent.get('/api/auth/csrf');
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) {
      const res = await agent
        .post('/api/auth/login')
        .set('x-csrf-token', body.token)
        .send({ email: users.owner, password: 'nope-nope' });
      statuses.push(res.status);
    }
    expect(statuses).toEqual([401, 401, 401, 429, 429]);
  });
});

describe('signing up', () => {
  it('when a new address signs up, then the answer says to check the inbox and the mailed link makes the account, signed in', async () => {
    const { app, db, ctx } = await setup();
    const { agent, csrf } = await csrfAgent(app);
    const res = await agent
      .post('/api/auth/register')
      .set('x-csrf-token', csrf)
      .send({ email: 'New@Test.example', name: 'New Person', password: 'long-enough-pw' });
    expect(res.status).toBe(202);
    expect(res.body.message).toMatch(/inbox/);
    expect(await db('users').where({ email: 'new@test.example' }).first()).toBeUndefined();
    expect((await agent.get('/api/auth/me')).status).toBe(401);

    await ctx.background.idle();
    const mail = await lastMailTo(db, 'new@test.example');
    expect(mail.subject).toMatch(/Finish signing up/);
    const token = linkToken(mail.body, '/sign-up');
    const confirmed = await agent
      .post('/api/auth/register/confirm')
      .set('x-csrf-token', (await agent.get('/api/auth/csrf')).body.token)
      .send({ token });
    expect(confirmed.status).toBe(201);
    expect(confirmed.body.user).toMatchObject({ email: 'new@test.example', name: 'New Person' });
    expect(confirmed.body.memberships).toEqual([]);
    expect((await agent.get('/api/auth/me')).status).toBe(200);

    const again = await request
      .agent(app)
      .post('/api/auth/register/confirm')
      .set('x-csrf-token', csrf)
      .send({ token });
    expect(again.status).toBe(403); // another visitor's CSRF token does not carry over
    const fresh = await csrfAgent(app);
    const reused = await fresh.agent
      .post('/api/auth/register/confirm')
      .set('x-csrf-token', fresh.csrf)
      .send({ token });
    expect(reused.status).toBe(400);
    expect(reused.body.error.code).toBe('token-invalid');
  });

  it('when a known address signs up, then the answer is the same as for a new one and the owner of the address is told by mail', async () => {
    const { app, db, ctx, users } = await setup();
    const { agent, csrf } = await csrfAgent(app);
    const send = (email: string) =>
      agent
        .post('/api/auth/register')
        .set('x-csrf-token', csrf)
        .send({ email, name: 'Someone', password: 'long-enough-pw' });
    const known = await send(users.owner);
    const unknown = await send('nobody-yet@test.example');
    expect(known.status).toBe(unknown.status);
    expect(known.body).toEqual(unknown.body);
    await ctx.background.idle();
    const mail = await lastMailTo(db, users.owner);
    expect(mail.subject).toMatch(/already have/);
    expect(mail.body).not.toMatch(/token=/);
    const owner = await db('users').where({ email: users.owner }).first();
    expect(owner.name).toBe('owner');
  });

  it('when the password is short or only spaces, then registration names the password field', async () => {
    const { app } = await setup();
    const { agent, csrf } = await csrfAgent(app);
    for (const password of ['short', '            ']) {
      const res = await agent
        .post('/api/auth/register')
        .set('x-csrf-token', csrf)
        .send({ email: 'a@b.example', name: 'X', password });
      expect(res.status).toBe(400);
      expect(res.body.error.fields.password).toMatch(/10 characters|spaces/);
    }
  });
});

describe('signing in alike for known and unknown addresses', () => {
  it('when the address is unknown, then the answer matches a wrong password and takes a comparable time', async () => {
    const { app, users } = await setup();
    const { agent, csrf } = await csrfAgent(app);
    const attempt = async (email: string) => {
      const t0 = performance.now();
      const res = await agent
        .post('/api/auth/login')
        .set('x-csrf-token', csrf)
        .send({ email, password: 'not-the-password' });
      return { res, ms: performance.now() - t0 };
    };
    await attempt(users.owner); // warm up the password hashing
    const known: number[] = [];
    const unknown: number[] = [];
    for (let i = 0; i < 4; i++) {
      const a = await attempt(users.owner);
      const b = await attempt(`stranger${i}@test.example`);
      expect(b.res.status).toBe(a.res.status);
      expect(b.res.body).toEqual(a.res.body);
      known.push(a.ms);
      unknown.push(b.ms);
    }
    const median = (xs: number[]) => [...xs].sort((x, y) => x - y)[Math.floor(xs.length / 2)];
    // Without a dummy hash the unknown address answers in a fraction of a millisecond.
    expect(median(unknown)).toBeGreaterThan(median(known) * 0.3);
  });
});

describe('resetting a password', () => {
  async function askReset(app: Parameters<typeof csrfAgent>[0], email: string) {
    const { agent, csrf } = await csrfAgent(app);
    return agent.post('/api/auth/password-reset').set('x-csrf-token', csrf).send({ email });
  }
  async function confirm(app: Parameters<typeof csrfAgent>[0], token: string, password: string) {
    const { agent, csrf } = await csrfAgent(app);
    return agent
      .post('/api/auth/password-reset/confirm')
      .set('x-csrf-token', csrf)
      .send({ token, password });
  }

  it('when a reset is asked for, then the answer is alike for every address and the link sets a new password once', async () => {
    const { app, db, ctx, users } = await setup();
    const known = await askReset(app, users.tapper);
    const unknown = await askReset(app, 'nobody@test.example');
    expect([known.status, unknown.status]).toEqual([202, 202]);
    expect(known.body).toEqual(unknown.body);
    await ctx.background.idle();
    expect(await db('outbox').where({ to_address: 'nobody@test.example' })).toEqual([]);
    const token = linkToken((await lastMailTo(db, users.tapper)).body, '/reset-password');

    expect((await confirm(app, token, 'a-brand-new-password')).status).toBe(200);
    const reused = await confirm(app, token, 'yet-another-password');
    expect(reused.status).toBe(400);
    expect(reused.body.error.code).toBe('token-invalid');
    await expect(signIn(app, users.tapper, PASSWORD)).rejects.toThrow(/401/);
    await expect(signIn(app, users.tapper, 'a-brand-new-password')).resolves.toBeTruthy();
  });

  it('when a newer link is sent or one is used, then every earlier link of that user is dead', async () => {
    const { app, db, ctx, users } = await setup();
    await askReset(app, users.owner);
    await ctx.background.idle();
    const first = linkToken((await lastMailTo(db, users.owner)).body, '/reset-password');
    await askReset(app, users.owner);
    await ctx.background.idle();
    const second = linkToken((await lastMailTo(db, users.owner)).body, '/reset-password');
    expect(second).not.toBe(first);
    expect((await confirm(app, first, 'first-new-password')).status).toBe(400);
    expect((await confirm(app, second, 'second-new-password')).status).toBe(200);
    await expect(signIn(app, users.owner, 'second-new-password')).resolves.toBeTruthy();
  });

  it('when the link is older than an hour, then it is refused and the password stays', async () => {
    const { app, db, ctx, users } = await setup();
    await askReset(app, users.forester);
    await ctx.background.idle();
    const token = linkToken((await lastMailTo(db, users.forester)).body, '/reset-password');
    const row = await db('tokens').where({ purpose: 'password-reset' }).first();
    const lifetime = storedTime(row.expires_at) - storedTime(row.created_at);
    expect(lifetime).toBeLessThanOrEqual(3600_000 + 5000);
    await db('tokens')
      .where({ id: row.id })
      .update({ expires_at: new Date(Date.now() - 1000).toISOString() });
    const res = await confirm(app, token, 'too-late-password');
    expect(res.status).toBe(400);
    await expect(signIn(app, users.forester)).resolves.toBeTruthy();
  });

  it('when a password is reset, then the sessions signed in with the old one end', async () => {
    const { app, db, ctx, users } = await setup();
    const { agent } = await signIn(app, users.consultant);
    await askReset(app, users.consultant);
    await ctx.background.idle();
    const token = linkToken((await lastMailTo(db, users.consultant)).body, '/reset-password');
    expect((await confirm(app, token, 'consultant-new-pw')).status).toBe(200);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('when the token is stored, then only its hash is kept', async () => {
    const { app, db, ctx, users } = await setup();
    await askReset(app, users.owner);
    await ctx.background.idle();
    const token = linkToken((await lastMailTo(db, users.owner)).body, '/reset-password');
    const rows = await db('tokens').select('token_hash');
    expect(rows.some((r) => r.token_hash === token)).toBe(false);
    expect(rows[0].token_hash).toMatch(/^[0-9a-f]{64}$/);
  });
});

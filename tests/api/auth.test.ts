import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import { PASSWORD, makeTestApp, signIn, standWithTeam } from './test-app';

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

    const second = await makeTestApp({}, first.dbFile);
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

describe('accounts', () => {
  it('when someone registers, then they are signed in and belong to no sugarbush yet', async () => {
    const { app } = await setup();
    const agent = request.agent(app);
    const { body } = await agent.get('/api/auth/csrf');
    const res = await agent
      .post('/api/auth/register')
      .set('x-csrf-token', body.token)
      .send({ email: 'New@Test.example', name: 'New Person', password: 'long-enough-pw' });
    expect(res.status).toBe(201);
    expect(res.body.user.email).toBe('new@test.example');
    expect(res.body.memberships).toEqual([]);
    expect((await agent.get('/api/auth/me')).status).toBe(200);
  });

  it('when the e-mail is taken or the password short, then registration says which field is wrong', async () => {
    const { app, users } = await setup();
    const agent = request.agent(app);
    const { body } = await agent.get('/api/auth/csrf');
    const taken = await agent
      .post('/api/auth/register')
      .set('x-csrf-token', body.token)
      .send({ email: users.owner, name: 'X', password: 'long-enough-pw' });
    expect(taken.status).toBe(409);
    expect(taken.body.error.fields.email).toBeTruthy();
    const short = await agent
      .post('/api/auth/register')
      .set('x-csrf-token', body.token)
      .send({ email: 'a@b.example', name: 'X', password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.password).toMatch(/10 characters/);
  });

  it('when a password reset is asked for, then a mail lands in the outbox and its link sets a new password once', async () => {
    const { app, users } = await setup();
    const agent = request.agent(app);
    const { body } = await agent.get('/api/auth/csrf');
    expect(
      (
        await agent
          .post('/api/auth/password-reset')
          .set('x-csrf-token', body.token)
          .send({ email: users.tapper })
      ).status,
    ).toBe(202);
    const outbox = await agent.get('/api/dev/outbox');
    expect(outbox.body.items[0].to).toBe(users.tapper);
    const token = /token=([\w-]+)/.exec(outbox.body.items[0].text)![1];
    const confirm = () =>
      agent
        .post('/api/auth/password-reset/confirm')
        .set('x-csrf-token', body.token)
        .send({ token, password: 'a-brand-new-password' });
    expect((await confirm()).status).toBe(200);
    expect((await confirm()).status).toBe(400);
    await expect(signIn(app, users.tapper, PASSWORD)).rejects.toThrow(/401/);
    await expect(signIn(app, users.tapper, 'a-brand-new-password')).resolves.toBeTruthy();
  });
});

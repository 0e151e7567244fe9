import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import { csrfAgent, makeTestApp, signIn, standWithTeam } from './test-app';

const closers: (() => Promise<void>)[] = [];
afterEach(async () => {
  while (closers.length) await closers.pop()!();
});

async function setup(env: Record<string, string> = {}) {
  const t = await makeTestApp({ LOGIN_RATE_LIMIT: '3', ...env });
  closers.push(t.close);
  return { ...t, ...(await standWithTeam(t.db)) };
}

async function attempts(
  app: Parameters<typeof csrfAgent>[0],
  tries: { email: string; from?: string }[],
) {
  const { agent, csrf } = await csrfAgent(app);
  const statuses: number[] = [];
  for (const { email, from } of tries) {
    let req = agent.post('/api/auth/login').set('x-csrf-token', csrf);
    if (from) req = req.set('X-Forwarded-For', from);
    statuses.push((await req.send({ email, password: 'wrong-password' })).status);
  }
  return statuses;
}

describe('sign-in throttles that hold', () => {
  it('when a client varies X-Forwarded-For, then its count does not reset', async () => {
    const { app, users } = await setup();
    const tries = ['10.0.0.1', '10.0.0.2', '10.0.0.3', '10.0.0.4', '10.0.0.5'].map((from, i) => ({
      email: i % 2 ? users.owner : users.tapper,
      from,
    }));
    expect(await attempts(app, tries)).toEqual([401, 401, 401, 429, 429]);
  });

  it('when a sign-in or reset names an address far too long, or not text, then 400 and its count still holds', async () => {
    const { app, db } = await setup();
    const { agent, csrf } = await csrfAgent(app);
    const long = `${'x'.repeat(100_000)}@test.example`;
    for (const email of [long, long, { nested: ['x'.repeat(1_000)] }]) {
      const login = await agent
        .post('/api/auth/login')
        .set('x-csrf-token', csrf)
        .send({ email, password: 'wrong-password' });
      expect(login.status, JSON.stringify(login.body)).toBe(400);
      expect(login.body.error.fields.email).toBeDefined();
    }
    const reset = await agent
      .post('/api/auth/password-reset')
      .set('x-csrf-token', csrf)
      .send({ email: long });
    expect(reset.status, JSON.stringify(reset.body)).toBe(400);
    // Every key the limits keep fits the column, however long the name sent.
    const buckets = (await db('rate_limits').pluck('bucket')) as string[];
    expect(Math.max(...buckets.map((b) => b.length))).toBeLessThanOrEqual(400);
    expect(buckets.filter((b) => b.includes('account-digest:')).length).toBeGreaterThan(0);
  });

  it('when many accounts are tried from one address, then the address is throttled', async () => {
    const { app } = await setup();
    const tries = [1, 2, 3, 4].map((i) => ({ email: `guess${i}@test.example` }));
    expect(await attempts(app, tries)).toEqual([401, 401, 401, 429]);
  });

  it('when one account is tried from many addresses behind a trusted proxy, then the account is throttled', async () => {
    const { app, users } = await setup({ TRUST_PROXY: 'loopback' });
    const tries = ['10.0.0.1', '10.0.1.1', '10.0.2.1', '10.0.3.1'].map((from) => ({
      email: users.owner,
      from,
    }));
    expect(await attempts(app, tries)).toEqual([401, 401, 401, 429]);
    // The owner's colleague, at an address of their own, is not held up by it.
    const other = await attempts(app, [{ email: users.forester, from: '10.9.9.9' }]);
    expect(other).toEqual([401]);
  });

  it('when a person signs in successfully, then that does not count against them', async () => {
    const { app, users } = await setup();
    for (let i = 0; i < 5; i++) await signIn(app, users.owner);
    expect(await attempts(app, [{ email: users.owner }])).toEqual([401]);
  });
});

describe('visitors who are not signed in', () => {
  it('when they ask for CSRF tokens, then no session row is stored, and the token still guards sign-in', async () => {
    const { app, db, users } = await setup();
    for (let i = 0; i < 10; i++) await request(app).get('/api/auth/csrf');
    const visitor = await csrfAgent(app);
    await visitor.agent.get('/api/auth/csrf');
    expect(await db('sessions').count({ n: '*' })).toEqual([{ n: 0 }]);

    const forged = await request(app)
      .post('/api/auth/login')
      .set('x-csrf-token', visitor.csrf)
      .send({ email: users.owner, password: 'correct-horse-battery' });
    expect(forged.status).toBe(403);
    const ok = await visitor.agent
      .post('/api/auth/login')
      .set('x-csrf-token', visitor.csrf)
      .send({ email: users.owner, password: 'correct-horse-battery' });
    expect(ok.status).toBe(200);
    expect(await db('sessions').count({ n: '*' })).toEqual([{ n: 1 }]);
  });

  it('when a signed-in session sends the token it had before signing in, then it is refused', async () => {
    const { app, users } = await setup();
    const visitor = await csrfAgent(app);
    await visitor.agent
      .post('/api/auth/login')
      .set('x-csrf-token', visitor.csrf)
      .send({ email: users.owner, password: 'correct-horse-battery' });
    const stale = await visitor.agent.post('/api/auth/logout').set('x-csrf-token', visitor.csrf);
    expect(stale.status).toBe(403);
  });
});

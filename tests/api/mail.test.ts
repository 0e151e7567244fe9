import http from 'node:http';
import os from 'node:os';
import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import type { Logger } from '../../server/lib/logger';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { migrateLatest, openDb } from '../../server/db';
import { csrfAgent, lastMailTo, linkToken, makeTestApp, standWithTeam } from './test-app';

const closers: (() => Promise<void>)[] = [];
afterEach(async () => {
  while (closers.length) await closers.pop()!();
});

async function setup(env: Record<string, string> = {}) {
  const t = await makeTestApp(env);
  closers.push(t.close);
  return { ...t, ...(await standWithTeam(t.db)) };
}

/** A non-loopback address of this machine, if it has one. */
function outsideAddress(): string | undefined {
  for (const list of Object.values(os.networkInterfaces()))
    for (const a of list ?? []) if (a.family === 'IPv4' && !a.internal) return a.address;
  return undefined;
}

describe('mail only its recipient reads', () => {
  it('when a stranger asks for the owner’s reset on a default start, then no route shows the link and the takeover fails', async () => {
    const { app, db, ctx, users } = await setup();
    const stranger = await csrfAgent(app);
    const asked = await stranger.agent
      .post('/api/auth/password-reset')
      .set('x-csrf-token', stranger.csrf)
      .send({ email: users.owner });
    expect(asked.status).toBe(202);
    await ctx.background.idle();

    // The mail exists (the owner would get it) …
    const token = linkToken((await lastMailTo(db, users.owner)).body, '/reset-password');
    // … but nothing over HTTP reveals it, with or without a session.
    for (const path of ['/api/outbox', '/api/dev/mail', '/api/mail']) {
      const res = await stranger.agent.get(path);
      expect(res.status).toBe(401);
      expect(JSON.stringify(res.body)).not.toContain(token);
    }
    const res = await request(app).get('/api/dev/outbox');
    expect(JSON.stringify(res.body)).not.toContain(token);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not-found');
    // Guessing is hopeless: a made-up token is refused and the password stays.
    const guess = await stranger.agent
      .post('/api/auth/password-reset/confirm')
      .set('x-csrf-token', stranger.csrf)
      .send({ token: 'AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA', password: 'stranger-chosen-pw' });
    expect(guess.status).toBe(400);
    const me = await stranger.agent.get('/api/auth/me');
    expect(me.status).toBe(401);
  });

  it('when mail goes to the local outbox, then the server log carries recipient, subject and link', async () => {
    const lines: string[] = [];
    const log: Logger = { info: (m) => lines.push(m), error: (m) => lines.push(m) };
    const t = await makeTestApp();
    closers.push(t.close);
    const { users } = await standWithTeam(t.db);
    const app = createApp({ config: t.config, db: t.db, clientDir: null, log });
    const { agent, csrf } = await csrfAgent(app);
    await agent
      .post('/api/auth/password-reset')
      .set('x-csrf-token', csrf)
      .send({ email: users.tapper });
    await app.ctx.background.idle();
    const line = lines.find((l) => l.includes(users.tapper));
    expect(line).toMatch(/Choose a new Clearwood password/);
    expect(line).toMatch(/\/reset-password\?token=[\w-]{20,}/);
  });

  it('when the development view is switched on, then it answers loopback only', async () => {
    const { app, ctx, users } = await setup({ DEV_OUTBOX_VIEW: 'true' });
    const { agent, csrf } = await csrfAgent(app);
    await agent
      .post('/api/auth/password-reset')
      .set('x-csrf-token', csrf)
      .send({ email: users.owner });
    await ctx.background.idle();
    const local = await request(app).get('/api/dev/outbox');
    expect(local.status).toBe(200);
    expect(local.body.items[0].to).toBe(users.owner);
    // A forwarded-for header naming loopback changes nothing: the socket's address counts.
    const spoofed = await request(app).get('/api/dev/outbox').set('X-Forwarded-For', '127.0.0.1');
    expect(spoofed.status).toBe(200);

    const address = outsideAddress();
    expect(address, 'this machine has a non-loopback IPv4 address').toBeTruthy();
    const server = http.createServer(app).listen(0, '0.0.0.0');
    closers.push(() => new Promise((r) => server.close(() => r())));
    await new Promise((r) => server.once('listening', r));
    const { port } = server.address() as AddressInfo;
    const remote = await fetch(`http://${address}:${port}/api/dev/outbox`);
    expect(remote.status).toBe(404);
    const body = await remote.text();
    expect(body).not.toContain(users.owner);
    expect(JSON.parse(body).error.code).toBe('not-found');
  });

  it('when the development view is asked for in production, then the server refuses to start', () => {
    expect(() =>
      loadConfig({
        NODE_ENV: 'production',
        SESSION_SECRET: 'a-production-secret-long-enough',
        DEV_OUTBOX_VIEW: 'true',
      }),
    ).toThrow(/DEV_OUTBOX_VIEW/);
  });
});

describe('mail by SMTP', () => {
  it('when MAIL_TRANSPORT=smtp, then a reset mail crosses a real SMTP conversation with its recipient, subject and link', async () => {
    const received: { from?: string; to: string[]; raw: Buffer }[] = [];
    const smtp = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS'],
      logger: false,
      onData(stream, session, callback) {
        const chunks: Buffer[] = [];
        stream.on('data', (c: Buffer) => chunks.push(c));
        stream.on('end', () => {
          received.push({
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : undefined,
            to: session.envelope.rcptTo.map((r) => r.address),
            raw: Buffer.concat(chunks),
          });
          callback();
        });
      },
    });
    await new Promise<void>((r) => smtp.listen(0, '127.0.0.1', () => r()));
    closers.push(() => new Promise((r) => smtp.close(() => r())));
    const { port } = smtp.server.address() as AddressInfo;

    const t = await makeTestApp({
      MAIL_TRANSPORT: 'smtp',
      SMTP_URL: `smtp://127.0.0.1:${port}`,
      APP_URL: 'http://clearwood.test',
    });
    closers.push(t.close);
    const { users } = await standWithTeam(t.db);
    const { agent, csrf } = await csrfAgent(t.app);
    const res = await agent
      .post('/api/auth/password-reset')
      .set('x-csrf-token', csrf)
      .send({ email: users.owner });
    expect(res.status).toBe(202);
    await t.ctx.background.idle();

    expect(received).toHaveLength(1);
    expect(received[0].to).toEqual([users.owner]);
    const mail = await simpleParser(received[0].raw);
    expect(mail.subject).toBe('Choose a new Clearwood password');
    expect((mail.to as { text: string }).text).toContain(users.owner);
    const token = linkToken(mail.text ?? '', 'http://clearwood.test/reset-password');
    expect(token.length).toBeGreaterThan(20);
    // SMTP mail is not kept in the local outbox.
    expect(await t.db('outbox').count({ n: '*' })).toEqual([{ n: 0 }]);
    // The mailed link works.
    const fresh = await csrfAgent(t.app);
    const confirmed = await fresh.agent
      .post('/api/auth/password-reset/confirm')
      .set('x-csrf-token', fresh.csrf)
      .send({ token, password: 'mailed-new-password' });
    expect(confirmed.status).toBe(200);
  });
});

describe('a second app on the same database', () => {
  it('when a database is shared, then its outbox is only in the table', async () => {
    const t = await makeTestApp();
    closers.push(t.close);
    const db = openDb(t.config.database);
    closers.push(() => db.destroy());
    await migrateLatest(db);
    expect(await db('outbox').count({ n: '*' })).toEqual([{ n: 0 }]);
  });
});

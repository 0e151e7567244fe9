import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { can, permissions, type Permission } from '../../shared/schemas/permissions';
import { roles, type Role } from '../../shared/schemas/enums';
import type { PermissionRule } from '../../server/middleware/auth';
import { anonymousClient, multipart, serve, type Client, type Send } from './http-client';
import { apiRouteTable, type RouteInfo } from './route-table';
import { makeTestApp } from './test-app';
import { twoStands, type StandRows, type TwoStands } from './two-stands';

/**
 * Routes anyone may call signed out, each with the reason. Every other route must name its rule
 * in its own chain (an access middleware, see route-table.ts), or this file fails.
 */
const publicRoutes: Record<string, string> = {
  'GET /api/auth/csrf': 'the token a visitor needs before signing in',
  'POST /api/auth/login': 'signing in',
  'POST /api/auth/logout': 'signing out ends whatever session there is, or none',
  'POST /api/auth/register': 'signing up',
  'POST /api/auth/register/confirm': 'the link from the sign-up mail',
  'POST /api/auth/password-reset': 'asking for a reset link (answers alike for any address)',
  'POST /api/auth/password-reset/confirm': 'the link from the reset mail',
  'GET /api/invitations/:token': 'the invitation link, opened before the account exists',
  'POST /api/invitations/:token/accept': 'accepting creates the account when there is none',
  'GET /api/dev/outbox':
    'a development view, off unless DEV_OUTBOX_VIEW and from loopback only: 404 otherwise',
};

const t = await makeTestApp();
const routes = apiRouteTable(t.app);
const guarded = routes.filter((r) => !(r.key in publicRoutes));

let served: Awaited<ReturnType<typeof serve>>;
let world: TwoStands;
let signedOut: Client;

beforeAll(async () => {
  served = await serve(t.app);
  world = await twoStands(t.db, served, new Set(routes.map((r) => r.key)));
  signedOut = await anonymousClient(served);
}, 60_000);
afterAll(async () => {
  await served.close();
  await t.close();
});

/** The value of a path parameter, naming a row of `stand` (fresh rows for what a write removes). */
async function paramValue(name: string, stand: StandRows): Promise<string> {
  const values: Record<string, () => Promise<number | string> | number | string> = {
    id: stand.id,
    treeId: stand.treeId,
    noteId: stand.noteId,
    photoId: stand.photoId,
    basemapId: stand.basemapId,
    z: 0,
    x: 0,
    y: 0,
    season: stand.season,
    token: 'an-invitation-token-nobody-was-sent',
    importId: '3f0c6a52-8d1e-4b7a-9c2f-5e4d3b2a1f00',
    userId: () => world.freshMember(stand.id),
    invitationId: () => world.freshInvitation(stand.id),
    ...stand.extra,
  } as unknown as Record<string, () => Promise<number | string>>;
  const v = values[name];
  if (v === undefined)
    throw new Error(`No value for :${name}: add one to paramValue (access-matrix.test.ts)`);
  return String(typeof v === 'function' ? await v() : v);
}

async function pathFor(route: RouteInfo, stand: StandRows) {
  let path = route.path;
  for (const name of route.params)
    path = path.replace(`:${name}`, encodeURIComponent(await paramValue(name, stand)));
  return path;
}

/**
 * What an allowed member sends: a body that fails validation where the route takes one (a JSON
 * array is no route's payload; a form without its file), so a request let through changes
 * nothing and the order of the requests does not matter.
 */
const defaultSend = (route: RouteInfo): Send =>
  route.method === 'get' || route.method === 'delete'
    ? {}
    : route.body === 'multipart'
      ? multipart({})
      : { json: [] };

interface Variant {
  label: string;
  send: Send;
  permitted: (role: Role) => boolean;
}

/** One request per way the route decides: a field-by-field check gets one per field. */
function variants(route: RouteInfo): Variant[] {
  const rule: PermissionRule | undefined = route.permission;
  const send = defaultSend(route);
  if (!rule) return [{ label: 'read by every member', send, permitted: () => true }];
  if ('action' in rule)
    return [{ label: rule.action, send, permitted: (role) => can(role, rule.action) }];
  const actions = [...new Set(Object.values(rule.byField))] as Permission[];
  return [
    {
      label: `no field (${actions.join(' or ')})`,
      send: { json: [] },
      permitted: (role) => actions.some((a) => can(role, a)),
    },
    // `true` is the wrong type for every field, so an allowed member's change is refused as invalid.
    ...Object.entries(rule.byField).map(([field, action]) => ({
      label: `${field} (${action})`,
      send: { json: { [field]: true } },
      permitted: (role: Role) => can(role, action),
    })),
  ];
}

/** docs/route-access.md: every route and who may call it, as the walk reads it. */
const ROUTE_DOC = path.resolve(import.meta.dirname, '../../docs/route-access.md');
const scopeWords: Record<string, string> = {
  'signed-in': 'anyone signed in, about their own',
  sugarbush: 'members of the stand in `:id`',
  tree: 'members of the tree’s stand',
  note: 'members of the note’s stand',
  photo: 'members of the photo’s stand',
  'sap-entry': 'members of the sap entry’s stand',
  basemap: 'members of the basemap’s stand',
};
const whoMay = (action: Permission) => `\`${action}\` (${permissions[action].join(', ')})`;
function routeDoc(): string {
  const line = (r: RouteInfo) => {
    if (r.key in publicRoutes) return `| \`${r.key}\` | anyone | ${publicRoutes[r.key]} |`;
    const rule = r.permission;
    const role = !rule
      ? 'every member'
      : 'action' in rule
        ? whoMay(rule.action)
        : Object.entries(rule.byField)
            .map(([field, action]) => `\`${field}\`: ${whoMay(action)}`)
            .join('; ');
    return `| \`${r.key}\` | ${scopeWords[r.access?.scope ?? ''] ?? '**none**'} | ${r.access?.scope === 'signed-in' ? '–' : role} |`;
  };
  return [
    '# Who may call each route',
    '',
    'Written by `tests/api/access-matrix.test.ts` from the router itself (`tests/api/route-table.ts`);',
    'do not edit by hand: after adding or changing a route, run',
    '`UPDATE_ROUTE_DOC=1 npx vitest run --project server tests/api/access-matrix.test.ts`',
    'and read the difference in review. Signed out, every route but the public ones answers 401;',
    'a non-member 404; a member whose role lacks the action 403 (`shared/schemas/permissions.ts`).',
    '',
    '| route | who reaches it | whose role may |',
    '|---|---|---|',
    ...routes.map(line),
    '',
  ].join('\n');
}

/**
 * Routes about something of one member's own inside the stand: a member whose role may call them
 * still gets 404 for another member's (or an unknown) id, so the matrix takes 404 from them too.
 */
const ownRowRoutes: Record<string, string> = {
  'GET /api/sugarbushes/:id/imports/:importId/progress':
    'an import’s steps are read only by the member who started it; anyone else gets 404, as for an id never used (tests/api/import-large.test.ts)',
};

const errorCode = (json: unknown) => (json as { error?: { code?: string } })?.error?.code;

describe('the route table', () => {
  it('when the router is walked, then it finds the API routes of every module', () => {
    const keys = routes.map((r) => r.key);
    expect(keys).toContain('GET /api/sugarbushes/:id/trees');
    expect(keys).toContain('PATCH /api/notes/:noteId');
    expect(keys).toContain('POST /api/trees/:treeId/photos');
    expect(keys).toContain('GET /api/basemaps/:basemapId/:z/:x/:y');
    expect(routes.length).toBeGreaterThan(50);
  });

  it('when a route is neither public nor names its access rule, then it is named here', () => {
    expect(guarded.filter((r) => !r.access).map((r) => r.key)).toEqual([]);
  });

  it('when a route is listed as public, then it exists and names no member rule', () => {
    const keys = new Set(routes.map((r) => r.key));
    expect(Object.keys(publicRoutes).filter((k) => !keys.has(k))).toEqual([]);
    expect(
      routes
        .filter(
          (r) =>
            r.key in publicRoutes &&
            r.access?.scope !== undefined &&
            r.access.scope !== 'signed-in',
        )
        .map((r) => r.key),
    ).toEqual([]);
  });

  it('when the routes or their rules change, then docs/route-access.md says so', () => {
    const doc = routeDoc();
    if (process.env.UPDATE_ROUTE_DOC) fs.writeFileSync(ROUTE_DOC, doc);
    const kept = fs.existsSync(ROUTE_DOC) ? fs.readFileSync(ROUTE_DOC, 'utf8') : '';
    expect(kept, 'run with UPDATE_ROUTE_DOC=1 and review the difference').toBe(doc);
  });

  it('when a member route changes something, then it names the action that allows it', () => {
    // Writes every member may make would be listed here with their reason (there are none); any
    // other write without an action of the permission table fails, so a check dropped from a
    // route cannot pass unseen.
    const everyMemberWrites: Record<string, string> = {};
    const unnamed = guarded
      .filter((r) => r.method !== 'get' && r.access?.scope !== 'signed-in' && !r.permission)
      .map((r) => r.key)
      .filter((k) => !(k in everyMemberWrites));
    expect(unnamed).toEqual([]);
  });

  it('when a route is for anyone signed in, then it checks no role and names no stand', () => {
    const odd = guarded.filter(
      (r) => r.access?.scope === 'signed-in' && (r.permission || r.params.length > 0),
    );
    expect(odd.map((r) => r.key)).toEqual([]);
  });
});

describe.each(Object.keys(publicRoutes).map((key) => ({ key })))('public: $key', ({ key }) => {
  it('when called signed out, then it is not refused for want of a session', async () => {
    const route = routes.find((r) => r.key === key)!;
    const res = await signedOut.request(
      route.method.toUpperCase(),
      await pathFor(route, world.A),
      route.key === 'POST /api/auth/logout' ? {} : defaultSend(route),
    );
    expect(res.status, res.text).toBeLessThan(500);
    expect([401, 403]).not.toContain(res.status);
  });
});

describe.each(guarded)('$key', (route) => {
  const method = route.method.toUpperCase();
  const scope = route.access?.scope;

  it('when signed out, then 401', async () => {
    const res = await signedOut.request(method, await pathFor(route, world.A), defaultSend(route));
    expect(res.status, res.text).toBe(401);
    expect(errorCode(res.json)).toBe('unauthenticated');
  });

  it.skipIf(scope === 'signed-in')(
    'when a member of another stand, or an outsider, names its rows, then 404',
    async () => {
      for (const who of [...roles, 'outsider'] as const) {
        const client = world.clients[who];
        const stand = who === 'outsider' ? world.A : world.B;
        for (const v of variants(route)) {
          const res = await client.request(method, await pathFor(route, stand), v.send);
          expect(res.status, `${who} ${v.label}: ${res.text}`).toBe(404);
          expect(errorCode(res.json)).toBe('not-found');
        }
      }
    },
  );

  it('when each member calls it, then those without the permission get 403 and the others through', async () => {
    const seen: string[] = [];
    for (const role of roles)
      for (const v of variants(route)) {
        const res = await world.clients[role].request(
          method,
          await pathFor(route, world.A),
          v.send,
        );
        const permitted = scope === 'signed-in' || v.permitted(role);
        seen.push(`${role} ${v.label}: ${res.status}`);
        if (process.env.ACCESS_MATRIX_LOG)
          console.log(`${route.key} ${role} ${v.label}: ${res.status}`);
        if (permitted) {
          const refusals = route.key in ownRowRoutes ? [401, 403] : [401, 403, 404];
          expect(refusals, `${role} ${v.label}: ${res.text}`).not.toContain(res.status);
          expect(res.status, `${role} ${v.label}: ${res.text}`).toBeLessThan(500);
        } else {
          expect(res.status, `${role} ${v.label}: ${res.text}`).toBe(403);
          expect(errorCode(res.json)).toBe('forbidden');
        }
      }
    expect(seen.length).toBeGreaterThanOrEqual(roles.length);
  });

  it.runIf(scope === 'signed-in')(
    'when the outsider calls it, then it answers about their own things',
    async () => {
      const res = await world.clients.outsider.request(
        method,
        await pathFor(route, world.A),
        defaultSend(route),
      );
      expect([401, 403, 404], res.text).not.toContain(res.status);
      expect(res.status, res.text).toBeLessThan(500);
    },
  );
});

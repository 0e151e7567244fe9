import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTestApp, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
type Agent = Awaited<ReturnType<typeof signIn>>;
let tapper: Agent;
let owner: Agent;
let outsider: Agent;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  tapper = await signIn(t.app, team.users.tapper);
  owner = await signIn(t.app, team.users.owner);
  outsider = await signIn(t.app, team.users.outsider);
});
afterAll(() => t.close());

const send = (who: Agent, what: 'sap' | 'weather', body: object, standId = team.standId) =>
  who.agent.post(`/api/sugarbushes/${standId}/${what}`).set('x-csrf-token', who.csrf).send(body);

const count = async (table: string, where: Record<string, unknown>) =>
  Number((await t.db(table).where(where).count({ n: '*' }))[0].n);

const auditOf = (entity: string) => count('audit_events', { sugarbush_id: team.standId, entity });

describe('a day’s sap sent again with its client id', () => {
  const clientId = randomUUID();
  const sap = {
    collectedOn: '2025-03-14',
    volumeL: 12.9,
    sugarPct: 3,
    heldAtC: 6,
    collection: 'vacuum',
    note: 'Line 3',
    clientId,
  };

  it('when it is sent twice, then the first answers 201, the resend 200 with the same entry, and one row and one audit entry are kept', async () => {
    const first = await send(tapper, 'sap', sap);
    expect(first.status, JSON.stringify(first.body)).toBe(201);
    expect(first.body.clientId).toBe(clientId);
    const again = await send(tapper, 'sap', sap);
    expect(again.status, JSON.stringify(again.body)).toBe(200);
    expect(again.body).toEqual(first.body);
    expect(await count('sap_entries', { client_id: clientId })).toBe(1);
    expect(await count('sap_entries', { sugarbush_id: team.standId })).toBe(1);
    expect(await auditOf('sap-entry')).toBe(1);
  });

  it('when the same id comes with another volume or for another stand, then 409 client-id-conflict and nothing is written', async () => {
    const other = await send(tapper, 'sap', { ...sap, volumeL: 13 });
    expect(other.status).toBe(409);
    expect(other.body.error.code).toBe('client-id-conflict');
    const elsewhere = await send(outsider, 'sap', sap, team.otherStandId);
    expect(elsewhere.status).toBe(409);
    expect(elsewhere.body.error.code).toBe('client-id-conflict');
    expect(await count('sap_entries', {})).toBe(1);
    expect(await auditOf('sap-entry')).toBe(1);
  });

  it('when entries come without an id, then each is stored as before (201 each)', async () => {
    const { clientId: _, ...plain } = sap;
    expect((await send(tapper, 'sap', plain)).status).toBe(201);
    expect((await send(tapper, 'sap', plain)).status).toBe(201);
    expect(await count('sap_entries', { sugarbush_id: team.standId })).toBe(3);
  });

  it('when the id is not a UUID, then 400 names the field', async () => {
    const res = await send(tapper, 'sap', { ...sap, clientId: 'twelve' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('clientId');
  });

  it('when a correction carries a client id, then it is refused as an unknown field', async () => {
    const [row] = await t.db('sap_entries').where({ client_id: clientId }).select('id');
    const res = await tapper.agent
      .patch(`/api/sap/${row.id}`)
      .set('x-csrf-token', tapper.csrf)
      .send({ clientId: randomUUID() });
    expect(res.status).toBe(400);
  });
});

describe('a day’s weather sent again with its client id', () => {
  const clientId = randomUUID();
  const day = { date: '2025-03-14', minC: -4, maxC: 5, clientId };

  it('when it is sent twice, then 201 then 200 with the same day, one row and one audit entry', async () => {
    const first = await send(tapper, 'weather', day);
    expect(first.status, JSON.stringify(first.body)).toBe(201);
    expect(first.body).toMatchObject({ date: '2025-03-14', minC: -4, maxC: 5, source: 'manual' });
    const again = await send(tapper, 'weather', day);
    expect(again.status, JSON.stringify(again.body)).toBe(200);
    expect(again.body).toEqual(first.body);
    expect(await count('weather_days', { sugarbush_id: team.standId })).toBe(1);
    expect(await auditOf('weather-day')).toBe(1);
  });

  it('when the same id comes with another reading, then 409 client-id-conflict and the day stays', async () => {
    const res = await send(tapper, 'weather', { ...day, maxC: 6 });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('client-id-conflict');
    const [row] = await t.db('weather_days').where({ sugarbush_id: team.standId }).select('max_c');
    expect(Number(row.max_c)).toBe(5);
    expect(await auditOf('weather-day')).toBe(1);
  });

  it('when the day was replaced by a later reading, then a late resend of the earlier one answers the day as it stands and writes nothing', async () => {
    const later = await send(owner, 'weather', {
      date: '2025-03-14',
      minC: -6,
      maxC: 2,
      clientId: randomUUID(),
    });
    expect(later.status).toBe(201);
    expect(await auditOf('weather-day')).toBe(2);
    const resend = await send(tapper, 'weather', day);
    expect(resend.status).toBe(200);
    expect(resend.body).toMatchObject({ date: '2025-03-14', minC: -6, maxC: 2 });
    expect(await auditOf('weather-day')).toBe(2);
  });
});

import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { solidPng, writeMbtiles, type FixtureTile } from '../api/mbtiles-fixture';
import { recordHosts, signInAs, demoServerAndBrowser, offSite } from './harness';

const env = demoServerAndBrowser();
let standId: number;
let treeTotal: number;

/** XYZ tile numbers of a point (Web Mercator). */
function tileOf(lat: number, lng: number, z: number) {
  const n = 2 ** z;
  const x = Math.floor(((lng + 180) / 360) * n);
  const r = (lat * Math.PI) / 180;
  const y = Math.floor(((1 - Math.log(Math.tan(r) + 1 / Math.cos(r)) / Math.PI) / 2) * n);
  return { x, y };
}

/** A raster MBTiles covering the stand at zooms 14–19, each tile a solid colour, rows in TMS. */
async function standMbtiles(): Promise<Buffer> {
  const box = await env.server
    .db('trees')
    .where({ sugarbush_id: standId })
    .whereNotNull('lat')
    .first(env.server.db.raw('min(lat) as s, max(lat) as n, min(lng) as w, max(lng) as e'));
  const tiles: FixtureTile[] = [];
  const png = solidPng([120, 160, 110], 256);
  for (let z = 14; z <= 19; z++) {
    const nw = tileOf(box.n, box.w, z);
    const se = tileOf(box.s, box.e, z);
    for (let x = nw.x; x <= se.x; x++)
      for (let y = nw.y; y <= se.y; y++) tiles.push({ z, x, row: 2 ** z - 1 - y, data: png });
  }
  const file = path.join(
    fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-e2e-tiles-')),
    'stand.mbtiles',
  );
  writeMbtiles(file, {
    metadata: {
      name: 'Survey flight 2026',
      format: 'png',
      minzoom: '14',
      maxzoom: '19',
      bounds: [box.w - 0.002, box.s - 0.002, box.e + 0.002, box.n + 0.002].join(','),
    },
    tiles,
  });
  return fs.readFileSync(file);
}

async function openMap(context: BrowserContext): Promise<Page> {
  const page = await context.newPage();
  await signInAs(page, env.server.url, 'forester@fernside.example');
  await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
  await page.goto(`${env.server.url}/sugarbushes/${standId}/map`);
  await page.locator('.leaflet-container').waitFor();
  return page;
}

beforeAll(async () => {
  standId = (await env.server.db('sugarbushes').where({ name: 'Owl Ledge' }).first('id')).id;
  treeTotal = Number(
    (await env.server.db('trees').where({ sugarbush_id: standId }).count({ n: '*' }))[0].n,
  );
});

describe('the woods map in a real browser', () => {
  it("draws the demo's trees: the legend's total is the API's, and a click on a tree opens its card", async () => {
    const context = await env.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await openMap(context);
    const hosts = recordHosts(page);
    const legend = page.getByRole('region', { name: 'Legend' });
    await legend
      .getByRole('heading', { name: `${treeTotal.toLocaleString('en-US')} trees` })
      .waitFor();
    const api = await context.request.get(
      `${env.server.url}/api/sugarbushes/${standId}/map?season=2027`,
    );
    const columns = await api.json();
    expect(columns.count).toBe(treeTotal);
    expect(columns.ids).toHaveLength(treeTotal);
    const counts = await legend.locator('[data-testid^="legend-count-"]').allTextContents();
    expect(counts.reduce((sum, c) => sum + Number(c.replace(/,/g, '')), 0)).toBe(treeTotal);

    // Find a tree by tag: the map zooms to it and centres it; close the card, then click the tree.
    await page.getByLabel('Find tree by tag').fill('OL-0001');
    await page.getByRole('button', { name: 'Find', exact: true }).click();
    const card = page
      .getByRole('region', { name: 'Tree OL-0001' })
      .or(page.getByLabel('Tree OL-0001'));
    await card.first().waitFor();
    await page.getByRole('button', { name: 'Close tree card' }).click();
    await expect.poll(() => card.count()).toBe(0);
    await page.waitForTimeout(600); // let the zoom animation settle
    const box = (await page.locator('.leaflet-container').boundingBox())!;
    await page.mouse.click(box.x + box.width / 2, box.y + box.height / 2);
    await card.first().waitFor();
    await expect.poll(() => card.first().getByRole('link').count()).toBeGreaterThan(0);
    // The DBH and where to drill come with the card, asked for when the tree is chosen.
    await expect
      .poll(() => card.first().locator('dt:text-is("DBH") + dd').textContent())
      .toMatch(/^\d+(\.\d)? (cm|in)$/);
    expect(offSite(hosts)).toEqual([]);
    await context.close();
  });

  it('shows each background: plain grid, demo tiles and an uploaded MBTiles file', async () => {
    const context = await env.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const { token } = await (await context.request.get(`${env.server.url}/api/auth/csrf`)).json();
    const page = await openMap(context);
    const hosts = recordHosts(page);
    const tileStatuses = new Map<string, number[]>();
    page.on('response', (res) => {
      const kind = res.url().includes('/tiles/owl-ledge/')
        ? 'demo'
        : res.url().includes('/api/basemaps/')
          ? 'uploaded'
          : null;
      if (kind) tileStatuses.set(kind, [...(tileStatuses.get(kind) ?? []), res.status()]);
    });
    const background = page.getByRole('radiogroup', { name: 'Background' });

    await background.getByLabel('Plain').check();
    await expect.poll(() => page.locator('.leaflet-tile').count()).toBe(0);

    await background.getByLabel('Demo tiles').check();
    await expect
      .poll(() => (tileStatuses.get('demo') ?? []).filter((s) => s === 200).length, {
        timeout: 10000,
      })
      .toBeGreaterThan(0);

    const csrf =
      (await (await context.request.get(`${env.server.url}/api/auth/csrf`)).json()).token ?? token;
    const upload = await context.request.post(
      `${env.server.url}/api/sugarbushes/${standId}/basemaps`,
      {
        headers: { 'x-csrf-token': csrf },
        multipart: {
          file: {
            name: 'stand.mbtiles',
            mimeType: 'application/octet-stream',
            buffer: await standMbtiles(),
          },
        },
      },
    );
    expect(upload.status()).toBe(201);
    await page.reload();
    await page.locator('.leaflet-container').waitFor();
    await background.getByLabel('Survey flight 2026').check();
    await expect
      .poll(() => (tileStatuses.get('uploaded') ?? []).filter((s) => s === 200).length, {
        timeout: 10000,
      })
      .toBeGreaterThan(0);
    expect(offSite(hosts)).toEqual([]);
    await context.close();
  });

  it('switched to plain, the map reloads with every host but localhost cut off, and asks no other host', async () => {
    const context = await env.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const asked = new Set<string>();
    await context.route('**/*', (route) => {
      const host = new URL(route.request().url()).hostname;
      asked.add(host);
      return offSite(new Set([host])).length === 0
        ? route.continue()
        : route.abort('internetdisconnected');
    });
    const page = await openMap(context);
    await page.getByRole('radiogroup', { name: 'Background' }).getByLabel('Plain').check();
    await page.reload();
    await page.locator('.leaflet-container').waitFor();
    await page
      .getByRole('region', { name: 'Legend' })
      .getByRole('heading', { name: `${treeTotal.toLocaleString('en-US')} trees` })
      .waitFor();
    expect(
      await page.getByRole('radiogroup', { name: 'Background' }).getByLabel('Plain').isChecked(),
    ).toBe(true);
    expect(await page.locator('.leaflet-tile').count()).toBe(0);
    expect(offSite(asked)).toEqual([]);
    await context.close();
  });

  it('opened again with nothing changed, the map is confirmed by its tag and not sent again', async () => {
    const context = await env.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await openMap(context);
    const legend = page.getByRole('region', { name: 'Legend' });
    await legend
      .getByRole('heading', { name: `${treeTotal.toLocaleString('en-US')} trees` })
      .waitFor();
    const answers: { status: number; tag?: string; size: number }[] = [];
    page.on('requestfinished', async (req) => {
      if (new URL(req.url()).pathname !== `/api/sugarbushes/${standId}/map`) return;
      const res = await req.response();
      answers.push({
        status: res?.status() ?? 0,
        tag: (await req.allHeaders())['if-none-match'],
        size: (await req.sizes()).responseBodySize,
      });
    });
    await page.reload();
    await legend
      .getByRole('heading', { name: `${treeTotal.toLocaleString('en-US')} trees` })
      .waitFor();
    await expect.poll(() => answers.length).toBe(1);
    const current = await context.request.get(`${env.server.url}/api/sugarbushes/${standId}/map`);
    // The browser sent the tag of the copy it holds, and the server answered without a body.
    expect(answers[0].tag).toBe(current.headers()['etag']);
    expect(answers[0].size).toBe(0);
    await context.close();
  });
});

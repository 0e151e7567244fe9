import { resolve } from 'node:path';
import { readFileSync } from 'node:fs';
import { area, distance } from '@turf/turf';
import { describe, expect, it } from 'vitest';
import { recordHosts, signInAs, demoServerAndBrowser, offSite } from './harness';
import { axeContext, cutOffElements, expectReadable, shortButtons } from './page-checks';

const env = demoServerAndBrowser();
const fixture = (name: string) => resolve(process.cwd(), 'tests/fixtures/boundaries', name);
const wgs84Ring: [number, number][] = JSON.parse(
  readFileSync(fixture('lantern-hollow.geojson'), 'utf8'),
).features[0].geometry.coordinates[0];

describe('a boundary from a GIS file, in the browser', () => {
  it('when a forester imports a zipped UTM Shapefile, a KML and a file of two lots merged, then each boundary is stored in WGS 84', async () => {
    const stand = await env.server.db('sugarbushes').where({ name: 'Owl Ledge' }).first('id');
    const stored = async () =>
      JSON.parse(
        (await env.server.db('sugarbushes').where({ id: stand.id }).first('boundary')).boundary,
      );
    const context = await env.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    const hosts = recordHosts(page);
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(String(e)));

    await signInAs(page, env.server.url, 'forester@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await page.goto(`${env.server.url}/sugarbushes/${stand.id}/map`);
    await page.locator('.leaflet-container').waitFor();
    const input = page.getByLabel('Boundary file');

    // A Shapefile in UTM zone 18N: unzipped and reprojected by its .prj in the browser.
    await input.setInputFiles(fixture('lantern-hollow-utm18n-shp.zip'));
    await page.getByText('Boundary imported from lantern-hollow-utm18n-shp.zip.').waitFor();
    const fromShapefile = await stored();
    expect(fromShapefile.type).toBe('Polygon');
    for (const p of fromShapefile.coordinates[0] as [number, number][]) {
      const nearest = Math.min(...wgs84Ring.map((q) => distance(p, q, { units: 'meters' })));
      expect(nearest).toBeLessThan(0.5);
    }

    // A KML, read by the browser's own DOMParser.
    await input.setInputFiles(fixture('lantern-hollow.kml'));
    await page.getByText('Boundary imported from lantern-hollow.kml.').waitFor();
    expect((await stored()).coordinates[0]).toEqual(wgs84Ring);

    // Two lots: listed with their areas, merged into one outline.
    await input.setInputFiles(fixture('two-lots.geojson'));
    const list = page.getByRole('group', { name: /two-lots.geojson holds 2 outlines/ });
    await list.getByRole('checkbox', { name: /Upper Lot/ }).check();
    await list.getByRole('checkbox', { name: /Lower Lot/ }).check();
    await page.getByRole('button', { name: 'Merge 2 outlines and save' }).click();
    await page.getByText('Boundary imported from two-lots.geojson.').waitFor();
    const lots = JSON.parse(readFileSync(fixture('two-lots.geojson'), 'utf8')).features;
    const merged = await stored();
    expect(merged.type).toBe('Polygon');
    expect(area(merged)).toBeCloseTo(area(lots[0].geometry) + area(lots[1].geometry), -1);

    expect(errors).toEqual([]);
    expect(offSite(hosts)).toEqual([]);
    await context.close();
  });

  it('when a file of two lots is opened on a phone, then the choice fits the screen, its buttons are 44 px and axe finds nothing serious', async () => {
    const stand = await env.server.db('sugarbushes').where({ name: 'Owl Ledge' }).first('id');
    const viewport = { width: 390, height: 844 };
    const context = await env.browser.newContext({ viewport, ...axeContext });
    const page = await context.newPage();
    await signInAs(page, env.server.url, 'owner@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await page.goto(`${env.server.url}/sugarbushes/${stand.id}/map`);
    await page.locator('.leaflet-container').waitFor();
    await page.getByLabel('Boundary file').setInputFiles(fixture('two-lots.geojson'));
    const list = page.getByRole('group', { name: /two-lots.geojson holds 2 outlines/ });
    await list.waitFor();
    const form = page.locator('form', { has: list });
    await form.scrollIntoViewIfNeeded();
    expect(await cutOffElements(form)).toEqual([]);
    expect(await shortButtons(form)).toEqual([]);
    await expectReadable(page, viewport);
    await context.close();
  });
});

import { describe, expect, it } from 'vitest';
import { demoServerAndBrowser, offSite, recordHosts, signInAs } from './harness';

const env = demoServerAndBrowser();

describe('importing new trees from a spreadsheet, in a real browser', () => {
  it('the owner sees the bad row and column, leaves the wrong column out, imports, and finds the new trees on the map', async () => {
    const stand = await env.server.db('sugarbushes').where({ name: 'Owl Ledge' }).first('id');
    // New trees a few metres from one already mapped, so they fall inside the stand.
    const near = await env.server
      .db('trees')
      .where({ sugarbush_id: stand.id })
      .whereNotNull('lat')
      .orderBy('tag')
      .first('lat', 'lng');
    const at = (i: number) =>
      `${(near.lat + 0.00005 * i).toFixed(6)},${(near.lng + 0.00005 * i).toFixed(6)}`;
    // The crew's "Status" column says whether the tree was tapped, not its register status.
    const csv = [
      'Tag,Species,Latitude,Longitude,Status',
      `NW-01,Sugar maple,${at(1)},active`,
      `NW-02,Sugar maple,${at(2)},active`,
      `NW-03,Red maple,${at(3)},tapped 2026`,
    ].join('\n');

    const page = await env.browser.newPage({ viewport: { width: 1280, height: 900 } });
    const hosts = recordHosts(page);
    await signInAs(page, env.server.url, 'owner@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await page.getByRole('link', { name: 'Import from CSV' }).click();
    await page.getByRole('heading', { name: 'Import records' }).waitFor();
    await page.getByLabel('What the file holds').selectOption('trees');
    await page.getByLabel('CSV or GPX file').setInputFiles({
      name: 'new-trees.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(`${csv}\n`, 'utf8'),
    });

    // The report names the row as the spreadsheet numbers it (header = 1) and the column.
    const problems = page.getByRole('table', { name: 'Rows that cannot be imported' });
    await problems.waitFor();
    const cells = await problems.locator('tbody tr').first().locator('td').allTextContents();
    expect(cells.slice(0, 2)).toEqual(['4', 'Status']);
    await expect.poll(() => problems.locator('tbody tr').count()).toBe(1);
    expect(await page.getByRole('button', { name: 'Import', exact: true }).isDisabled()).toBe(true);

    await page.getByLabel('What “Status” holds').selectOption({ label: 'Leave out' });
    await page.getByText(/The mapping changed since this check/).waitFor();
    await page.getByRole('button', { name: 'Check again' }).click();
    await page.getByText('Every row can be imported.').waitFor();
    await page.getByRole('button', { name: 'Import 3 rows' }).click();
    await page.getByText(/Imported: 3 new/).waitFor({ timeout: 20000 });

    const rows = await env.server
      .db('trees')
      .where({ sugarbush_id: stand.id })
      .whereIn('tag', ['NW-01', 'NW-02', 'NW-03'])
      .orderBy('tag');
    expect(rows.map((r) => [r.tag, r.species, r.status])).toEqual([
      ['NW-01', 'sugar-maple', 'active'],
      ['NW-02', 'sugar-maple', 'active'],
      ['NW-03', 'red-maple', 'active'],
    ]);

    // On the map: its data holds the new trees, and finding one by tag opens its card.
    await page.goto(`${env.server.url}/sugarbushes/${stand.id}/map`);
    await page.locator('.leaflet-container').waitFor();
    const map = await page.request.get(
      `${env.server.url}/api/sugarbushes/${stand.id}/map?season=2027`,
    );
    const columns = await map.json();
    for (const r of rows) expect(columns.ids).toContain(r.id);
    await page.getByLabel('Find tree by tag').fill('NW-03');
    await page.getByRole('button', { name: 'Find', exact: true }).click();
    const card = page.getByRole('region', { name: 'Tree NW-03' }).or(page.getByLabel('Tree NW-03'));
    await card.first().waitFor();
    await expect.poll(() => card.first().textContent()).toMatch(/Red maple/);
    expect(offSite(hosts)).toEqual([]);
    await page.close();
  });
});

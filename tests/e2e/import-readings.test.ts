import { describe, expect, it } from 'vitest';
import { demoServerAndBrowser, offSite, recordHosts, signInAs } from './harness';

const env = demoServerAndBrowser();

describe('importing readings from a spreadsheet, in a real browser', () => {
  it('the forester opens the import from the register, maps a DBH column in inches, sees the report and imports', async () => {
    const tree = await env.server
      .db('trees as t')
      .join('sugarbushes as s', 's.id', 't.sugarbush_id')
      .where({ 's.name': 'Owl Ledge', 't.tag': 'OL-0003' })
      .first('t.id');
    const page = await env.browser.newPage({ viewport: { width: 1280, height: 900 } });
    const hosts = recordHosts(page);
    await signInAs(page, env.server.url, 'forester@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await page.getByRole('link', { name: 'Import from CSV' }).click();
    await page.getByRole('heading', { name: 'Import records' }).waitFor();
    await page.getByLabel('What the file holds').selectOption('measurements');
    // A spreadsheet in a decimal-comma language: semicolons, a byte-order mark, no unit in the header.
    await page.getByLabel('CSV or GPX file').setInputFiles({
      name: 'readings.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from('\uFEFFTag;Date;DBH\nOL-0003;2026-11-02;14,5\n', 'utf8'),
    });
    await page.getByText(/No column holds dbhCm/).waitFor();
    await page.getByLabel('What “DBH” holds').selectOption('dbhIn');
    await page.getByRole('button', { name: 'Check again' }).click();
    await page.getByText('Every row can be imported.').waitFor();
    await page.getByRole('button', { name: 'Import 1 row' }).click();
    await page.getByText(/Imported: 1 new/).waitFor({ timeout: 15000 });
    const m = await env.server
      .db('measurements')
      .where({ tree_id: tree.id, measured_on: '2026-11-02' })
      .first();
    expect(m.dbh_cm).toBeCloseTo(36.83, 2);
    expect(offSite(hosts)).toEqual([]);
    await page.close();
  });
});

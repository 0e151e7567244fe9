import fs from 'node:fs';
import { parse } from 'csv-parse/sync';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { complianceCsvColumns, type ComplianceReport } from '../../shared/schemas/compliance';
import { demoServerAndBrowser, offSite, recordHosts, signInAs } from './harness';

const env = demoServerAndBrowser();

/** Every row of a season's report, asked through the page's own signed-in session. */
const wholeReport = (page: Page, sugarbushId: number, season: number) =>
  page.evaluate(
    async ({ id, season }) => {
      const get = async (n: number) =>
        (await (
          await fetch(`/api/sugarbushes/${id}/compliance?season=${season}&pageSize=500&page=${n}`)
        ).json()) as ComplianceReport;
      const first = await get(1);
      for (let n = 2; (n - 1) * 500 < first.total; n++) first.items.push(...(await get(n)).items);
      return first;
    },
    { id: sugarbushId, season },
  );

/** The figure in a row of the totals table, as the page shows it. */
async function shownTotal(page: Page, label: string): Promise<number> {
  const text = await page
    .getByRole('table', { name: 'Compliance totals' })
    .getByRole('row', { name: label })
    .locator('td')
    .first()
    .innerText();
  return Number(text.replace(/,/g, ''));
}

describe('the owner reviews the lease, in a real browser', () => {
  it('opens the overview, reads the 2026 compliance report, downloads its CSV and prints the report', async () => {
    const page = await env.browser.newPage({
      viewport: { width: 1280, height: 900 },
      acceptDownloads: true,
    });
    const hosts = recordHosts(page);
    await signInAs(page, env.server.url, 'owner@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    const sugarbushId = Number(/\/sugarbushes\/(\d+)\//.exec(page.url())![1]);

    await page
      .getByRole('navigation', { name: 'Sections' })
      .first()
      .getByRole('link', { name: 'Overview' })
      .click();
    await page.waitForURL(/\/overview$/);
    await page
      .getByRole('img', { name: /^Basal area per acre (rose|fell|held|was)/ })
      .waitFor({ timeout: 60_000 });

    const report = page.getByRole('region', { name: 'Did the tapping keep to the guideline?' });
    await report.getByLabel('Season').selectOption('2026');
    await report.getByRole('table', { name: 'Compliance totals' }).waitFor({ timeout: 60_000 });
    const api = await wholeReport(page, sugarbushId, 2026);
    expect(api.profile.key).toBe('conservative');
    await page
      .getByText(`In 2026, ${api.totals.treesTapped.toLocaleString('en-US')} trees were tapped`)
      .waitFor();
    expect(await shownTotal(page, 'Trees tapped')).toBe(api.totals.treesTapped);
    expect(await shownTotal(page, 'Taps set')).toBe(api.totals.tapsSet);
    expect(await shownTotal(page, 'Taps allowed')).toBe(api.totals.tapsAllowed);
    expect(await shownTotal(page, 'Taps over')).toBe(api.totals.tapsOver);
    expect(await shownTotal(page, 'Trees tapped while declining')).toBe(api.totals.treesDeclining);

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      report.getByRole('link', { name: 'Download CSV' }).click(),
    ]);
    expect(download.suggestedFilename()).toBe('owl-ledge-compliance-2026-conservative.csv');
    const text = fs.readFileSync((await download.path())!, 'utf8');
    expect(text.split('\n')[0]).toBe(complianceCsvColumns.join(','));
    const rows: Record<string, string>[] = parse(text, { columns: true });
    expect(rows).toHaveLength(api.totals.treesTapped);
    expect(rows.map((r) => r.tag)).toEqual(api.items.map((i) => i.tag));
    rows.forEach((row, n) => {
      const item = api.items[n];
      expect(row).toMatchObject({
        season: '2026',
        profile: 'conservative',
        tapsSet: String(item.tapsSet),
        tapsAllowed: item.tapsAllowed === null ? '' : String(item.tapsAllowed),
        tapsOver: String(item.tapsOver),
        findings: item.findings.join(' '),
      });
    });
    const over = rows.filter((r) => r.findings.split(' ').includes('over'));
    expect(over).toHaveLength(api.totals.treesOver);
    expect(over.reduce((n, r) => n + Number(r.tapsOver), 0)).toBe(api.totals.tapsOver);

    await report.getByRole('link', { name: 'Printable report for a lease review' }).click();
    await page
      .getByRole('heading', { name: 'Tapping against the guideline, season 2026' })
      .waitFor();
    const article = page.getByRole('article');
    expect(await article.innerText()).toContain('Owl Ledge');
    expect(await article.innerText()).toContain(api.profile.source);
    await page.getByRole('complementary', { name: 'Cautions' }).waitFor();
    const listed = page.getByRole('table', { name: 'Tapped trees against the guideline' });
    expect(await listed.locator('tbody tr').count()).toBe(api.totals.treesWithFindings);

    expect(offSite(hosts)).toEqual([]);
    await page.close();
  });

  it('reads the overview at phone width: every chart fits the screen and keeps its sentence', async () => {
    const page = await env.browser.newPage({ viewport: { width: 390, height: 844 } });
    await signInAs(page, env.server.url, 'owner@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await page.goto(page.url().replace(/\/trees.*$/, '/overview'));
    await page.getByRole('img', { name: /^Basal area per acre/ }).waitFor({ timeout: 60_000 });
    const charts = page.locator('figure [role="img"]');
    expect(await charts.count()).toBe(9);
    for (const chart of await charts.all()) {
      const box = (await chart.boundingBox())!;
      expect(box.x).toBeGreaterThanOrEqual(0);
      expect(box.x + box.width).toBeLessThanOrEqual(390);
      expect(await chart.locator('svg').count()).toBeGreaterThan(0);
    }
    const wide = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(wide).toBeLessThanOrEqual(390);
    await page.close();
  });
});

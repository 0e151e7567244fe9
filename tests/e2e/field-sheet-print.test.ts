import type { Page } from 'playwright-core';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { describe, expect, it } from 'vitest';
import type { PlanItem, StandPlanResponse } from '../../shared/schemas/plan';
import { demoServerAndBrowser, offSite, recordHosts, signInAs } from './harness';
import { checkedViewports, expectReadable, signedInForChecks } from './page-checks';

const env = demoServerAndBrowser();

/** Every item of today's plan, asked through the page's own signed-in session. */
const wholePlan = (page: Page, sugarbushId: number) =>
  page.evaluate(async (id) => {
    const items: PlanItem[] = [];
    for (let n = 1; ; n++) {
      const res = await fetch(`/api/sugarbushes/${id}/plan?pageSize=500&page=${n}`);
      const body = (await res.json()) as StandPlanResponse;
      items.push(...body.items);
      if (n * 500 >= body.total) return items;
    }
  }, sugarbushId);

/** The PDF's text as lines: text runs grouped by page and height on the page, left to right. */
async function pdfLines(pdf: Buffer): Promise<string[]> {
  const doc = await getDocument({ data: new Uint8Array(pdf), disableFontFace: true }).promise;
  const lines: string[] = [];
  for (let p = 1; p <= doc.numPages; p++) {
    const content = await (await doc.getPage(p)).getTextContent();
    const rows = new Map<number, { x: number; text: string }[]>();
    for (const item of content.items) {
      if (!('str' in item) || item.str.trim() === '') continue;
      const y = Math.round(item.transform[5]);
      rows.set(y, [...(rows.get(y) ?? []), { x: item.transform[4], text: item.str }]);
    }
    for (const y of [...rows.keys()].sort((a, b) => b - a))
      lines.push(
        rows
          .get(y)!
          .sort((a, b) => a.x - b.x)
          .map((r) => r.text)
          .join(' '),
      );
  }
  await doc.destroy();
  return lines;
}

/** The sheet has every line loaded: its Print button is enabled. */
const sheetComplete = (page: Page) =>
  page.waitForFunction(
    () =>
      !(document.querySelector('article button') as HTMLButtonElement | null)?.disabled &&
      document.querySelector('table[aria-label="Field sheet"] tbody tr') !== null,
    undefined,
    { timeout: 60_000 },
  );

describe('the printed field sheet, in a real browser', () => {
  it('the owner issues the plan, then prints the whole stand’s sheet: one line for every tree the plan taps, and the cautions', async () => {
    const page = await env.browser.newPage({ viewport: { width: 1280, height: 900 } });
    const hosts = recordHosts(page);
    await signInAs(page, env.server.url, 'owner@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    const sugarbushId = Number(/\/sugarbushes\/(\d+)\//.exec(page.url())![1]);

    await page.goto(`${env.server.url}/sugarbushes/${sugarbushId}/plan`);
    const copy = page.getByRole('region', { name: 'The crew’s copy' });
    await copy.getByText(/Not issued yet/).waitFor({ timeout: 60_000 });
    await copy.getByRole('button', { name: 'Issue this plan to the crew' }).click();
    await copy.getByRole('button', { name: 'Issue version 1' }).click();
    await copy
      .getByText(/^Issued to the crew on .+ by Hollis Pembrook — version 1, /)
      .waitFor({ timeout: 60_000 });
    await copy.getByText('Nothing has changed since it was issued', { exact: false }).waitFor();

    const toTap = (await wholePlan(page, sugarbushId)).filter((i) => i.taps > 0);
    expect(toTap.length).toBeGreaterThan(100);

    await page.getByRole('link', { name: 'Print field sheet' }).click();
    await page.waitForURL(/\/plan\/field-sheet/);
    const print = page.getByRole('button', { name: 'Print' });
    await print.waitFor();
    await sheetComplete(page);
    expect(await page.locator('table[aria-label="Field sheet"] tbody tr').count()).toBe(
      toTap.length,
    );

    const pdf = await page.pdf({ format: 'Letter', printBackground: false });
    const lines = await pdfLines(pdf);
    const text = lines.join('\n');
    expect(text).toContain('Owl Ledge');
    expect(text).toMatch(/The issued plan, version 1/);
    const tokens = new Set(lines.flatMap((l) => l.split(/\s+/)));
    const missing = toTap.map((i) => i.tag).filter((tag) => !tokens.has(tag));
    expect(missing).toEqual([]);
    // The table's header is printed again on every page the sheet runs to.
    const pages = (await getDocument({ data: new Uint8Array(pdf) }).promise).numPages;
    expect(pages).toBeGreaterThan(1);
    expect(
      lines.filter((l) => /^Done # Tag Taps Where to drill Bit and depth$/.test(l)),
    ).toHaveLength(pages);
    expect(text).toMatch(/eye protection/);
    expect(text).toMatch(/Bits are sharp/);
    expect(text).toMatch(/Ladders only on firm/);
    expect(text).toMatch(/local codes/);
    // Navigation and buttons stay off the paper.
    expect(text).not.toMatch(/Back to the plan/);

    expect(offSite(hosts)).toEqual([]);
    await page.close();
  });

  it('reads on a phone and a laptop: no serious accessibility findings, nothing wider than the window', async () => {
    for (const viewport of checkedViewports) {
      const { context, page, sugarbushId } = await signedInForChecks(
        env.browser,
        env.server.url,
        'tapper@fernside.example',
        viewport,
      );
      await page.goto(`${env.server.url}/sugarbushes/${sugarbushId}/plan/field-sheet`);
      await sheetComplete(page);
      await expectReadable(page, viewport);
      await context.close();
    }
  });
});

import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import type { GuidelinePreview } from '../../shared/schemas/guideline-preview';
import { upcomingSeason, type StandPlanResponse } from '../../shared/schemas/plan';
import { recordHosts, signInAs, demoServerAndBrowser, offSite } from './harness';

const env = demoServerAndBrowser();

/** The season plan's totals, asked through the page's own signed-in session. */
const planTotals = (page: Page, sugarbushId: number, season: number) =>
  page.evaluate(
    async ({ id, season }) => {
      const response = await fetch(`/api/sugarbushes/${id}/plan?season=${season}&pageSize=1`);
      return (await response.json()) as StandPlanResponse;
    },
    { id: sugarbushId, season },
  );

/** The figure under a label in the preview, as the page shows it, read back as a number. */
async function shownFigure(page: Page, label: string): Promise<number> {
  const text = await page
    .getByRole('region', { name: /What this changes in/ })
    .locator('dt', { hasText: label })
    .locator('xpath=following-sibling::dd[1]')
    .innerText();
  return Number(text.replace(/,/g, ''));
}

describe('the owner changes the guideline, in a real browser', () => {
  it('previews traditional on Owl Ledge, the figures match the plan before and after saving, and the season plan follows', async () => {
    const season = upcomingSeason();
    const page = await env.browser.newPage({ viewport: { width: 1280, height: 900 } });
    const hosts = recordHosts(page);
    await signInAs(page, env.server.url, 'owner@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    const sugarbushId = Number(/\/sugarbushes\/(\d+)\//.exec(page.url())![1]);

    const before = await planTotals(page, sugarbushId, season);
    expect(before.profile.key).toBe('conservative');

    await page
      .getByRole('navigation', { name: 'Sections' })
      .first()
      .getByRole('link', { name: 'Settings' })
      .click();
    await page.waitForURL(/\/settings$/);
    await page.getByRole('heading', { name: 'The guideline' }).waitFor();
    expect(await page.getByRole('radio', { name: /^Conservative/ }).isChecked()).toBe(true);

    await page.getByRole('radio', { name: /^Traditional/ }).check();
    const answer = page.waitForResponse(
      (r) => r.url().endsWith(`/api/sugarbushes/${sugarbushId}/guideline-preview`) && r.ok(),
    );
    await page.getByRole('button', { name: `See what this changes in ${season}` }).click();
    const preview = (await (await answer).json()) as GuidelinePreview;
    await page.getByRole('region', { name: `What this changes in ${season}` }).waitFor();

    // The preview starts from the plan as it stands.
    expect(preview.season).toBe(season);
    expect(preview.from.taps).toBe(before.totals.taps);
    expect(preview.from.tappedTrees).toBe(before.totals.treesToTap);
    expect(preview.to.taps).toBeGreaterThan(preview.from.taps);
    expect(preview.to.taps - preview.from.taps).toBe(preview.tapsAdded - preview.tapsRemoved);

    // The page shows the API's figures.
    expect(await shownFigure(page, 'Taps now')).toBe(preview.from.taps);
    expect(await shownFigure(page, 'Taps after')).toBe(preview.to.taps);
    expect(await shownFigure(page, 'Trees whose taps change')).toBe(preview.treesChanged);
    expect(await shownFigure(page, 'Taps added')).toBe(preview.tapsAdded);
    expect(await shownFigure(page, 'Taps removed')).toBe(preview.tapsRemoved);
    expect(await shownFigure(page, 'Trees become too small')).toBe(preview.treesBecomeTooSmall);
    const rows = page.getByRole('table', { name: 'Trees that change' }).locator('tbody tr');
    expect(await rows.count()).toBe(preview.changes.length);
    const first = preview.changes[0];
    expect(await rows.first().innerText()).toContain(`${first.fromTaps} → ${first.toTaps}`);
    expect(await rows.first().innerText()).toContain(first.tag);

    await page.getByRole('button', { name: 'Save this guideline' }).click();
    await page.getByText(`Saved. The ${season} plan now follows`).waitFor();

    const after = await planTotals(page, sugarbushId, season);
    expect(after.profile.key).toBe('traditional');
    expect(after.totals.taps).toBe(preview.to.taps);
    expect(after.totals.treesToTap).toBe(preview.to.tappedTrees);

    await page.getByRole('link', { name: 'Open the season plan' }).click();
    await page.waitForURL(/\/plan\?season=/);
    await page.getByRole('heading', { name: `Season plan ${season}` }).waitFor();
    await page.getByText(`Guideline: ${after.profile.label}`).waitFor();
    const totals = page.getByRole('region', { name: 'Plan totals' });
    const shownTaps = await totals
      .locator('dt', { hasText: /^Taps$/ })
      .locator('xpath=following-sibling::dd[1]')
      .innerText();
    expect(Number(shownTaps.replace(/,/g, ''))).toBe(preview.to.taps);

    expect(offSite(hosts)).toEqual([]);
    await page.close();
  });
});

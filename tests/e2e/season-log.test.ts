import { describe, expect, it } from 'vitest';
import { classifyDay } from '../../shared/rules/index';
import { offSite, recordHosts } from './harness';
import { demoServerAndBrowser } from './harness';
import { checkedViewports, expectReadable, shortButtons, signedInForChecks } from './page-checks';

const env = demoServerAndBrowser();

/** The days of a season the stored weather says should run, by the shared rule. */
async function runDaysOnRecord(sugarbushId: number, season: number) {
  const rows: { date: string; min_c: number; max_c: number }[] = await env.server
    .db('weather_days')
    .where({ sugarbush_id: sugarbushId })
    .whereBetween('date', [`${season}-01-01`, `${season}-12-31`])
    .orderBy('date');
  return rows
    .map((r) => ({ date: String(r.date).slice(0, 10), run: classifyDay(r.min_c, r.max_c).run }))
    .filter((d) => d.run !== 'none')
    .map((d) => `${d.date} ${d.run}`);
}

describe('the season log, in a real browser', () => {
  it('the tapper records a cold night, a thaw and the day’s sap held at 45 °F, sees the syrup it should make and the keep-it-cold caution, and finds the run day marked on the chart and in the table', async () => {
    const { context, page, sugarbushId } = await signedInForChecks(
      env.browser,
      env.server.url,
      'tapper@fernside.example',
      { width: 1280, height: 900 },
    );
    const hosts = recordHosts(page);
    await page.goto(`${env.server.url}/sugarbushes/${sugarbushId}/season?season=2026`);
    await page.getByRole('heading', { name: 'Season log', level: 1 }).waitFor();
    await page
      .getByRole('group', { name: 'Units' })
      .getByRole('button', { name: '°F, gal' })
      .click();

    const weather = page.getByRole('region', { name: 'Record a day’s weather' });
    await weather.getByLabel('Date').fill('2026-03-18');
    await weather.getByLabel('Night low (°F)').fill('23');
    await weather.getByLabel('Day high (°F)').fill('41');
    await weather.getByRole('button', { name: 'Save weather' }).click();
    await weather.getByText('Saved Mar 18, 2026: 23 °F night, 41 °F day: a strong run.').waitFor();

    const sap = page.getByRole('region', { name: "Record a day's sap" });
    await sap.getByLabel('Date').fill('2026-03-18');
    await sap.getByLabel('Collection').selectOption('vacuum');
    await sap.getByLabel('Sap volume (gal)').fill('40');
    await sap.getByLabel('Sugar (°Brix)').fill('2.5');
    await sap.getByLabel('Held at (°F)').fill('45');
    await sap.getByRole('button', { name: 'Save sap' }).click();

    const saved = page.getByRole('group', { name: 'Saved entry' });
    await saved.waitFor({ timeout: 10000 });
    // Rule of 86 (Jones, UVM): 86 / 2.5 = 34.4 gal of sap a gallon, 40 / 34.4 = 1.16 gal.
    // Revised for 66.0 °Brix (Perkins & Isselhardt, UVM Proctor): 87.1 / 2.5 − 0.32 = 34.52, 40 / 34.52 = 1.16 gal.
    expect(await saved.innerText()).toContain(
      'Expected syrup: 1.16 gal by the Rule of 86, 1.16 gal by the rule revised for 66.0 °Brix syrup.',
    );
    // Above 40 °F sap spoils faster (Ohio State maple program).
    const caution = saved.locator('[data-caution="warm-sap"]');
    expect(await caution.getAttribute('data-level')).toBe('caution');
    expect(await caution.innerText()).toMatch(
      /^Caution: Sap held at 45 °F: above 40 °F it spoils faster/,
    );

    const stored = await env.server
      .db('sap_entries')
      .where({ sugarbush_id: sugarbushId, collected_on: '2026-03-18' })
      .orderBy('id', 'desc')
      .first();
    // 40 US gal × 3.785411784 L (NIST Handbook 44); (45 − 32) × 5/9 °C.
    expect(stored.volume_l).toBeCloseTo(151.416, 2);
    expect(stored.held_at_c).toBeCloseTo(7.222, 2);
    expect(stored.collection).toBe('vacuum');

    // The chart marks every run day the stored weather gives, and so does the table's run column.
    const expected = await runDaysOnRecord(sugarbushId, 2026);
    expect(expected).toContain('2026-03-18 strong');
    const chart = page.locator('[data-chart="season"]');
    await expect
      .poll(() => chart.locator('[data-run-day]').count(), { timeout: 10000 })
      .toBe(expected.length);
    const marks = await chart
      .locator('[data-run-day]')
      .evaluateAll((els) =>
        els.map((e) => `${e.getAttribute('data-run-day')} ${e.getAttribute('data-run')}`),
      );
    expect(marks.sort()).toEqual([...expected].sort());
    expect(await chart.getAttribute('aria-label')).toMatch(
      /^Season 2026: \d+ run days? \(\d+ strong\)/,
    );
    expect(await chart.getByText('Freezing, 32 °F').count()).toBe(1);

    const table = page.getByRole('table', { name: 'Days of season 2026' });
    const tableRuns = await table
      .locator('tbody tr')
      .evaluateAll((rows) =>
        rows
          .map(
            (r) =>
              `${r.getAttribute('data-day')} ${r.querySelector('[data-run]')?.getAttribute('data-run')}`,
          )
          .filter((s) => s.endsWith(' run') || s.endsWith(' strong')),
      );
    expect(tableRuns).toEqual([...expected].sort());
    const day = table.locator('tr[data-day="2026-03-18"]');
    expect(await day.locator('[data-run]').innerText()).toContain('Strong run');
    expect(await day.innerText()).toContain('Sap held at 45 °F');

    expect(offSite(hosts)).toEqual([]);
    await context.close();
  });

  it('reads well on a phone and a laptop: nothing wider than the window, 44 px buttons on the phone, no serious axe finding', async () => {
    for (const viewport of checkedViewports) {
      const { context, page, sugarbushId } = await signedInForChecks(
        env.browser,
        env.server.url,
        'tapper@fernside.example',
        viewport,
      );
      const hosts = recordHosts(page);
      await page.goto(`${env.server.url}/sugarbushes/${sugarbushId}/season?season=2026`);
      await page.getByRole('heading', { name: "Record a day's sap" }).waitFor();
      // The first test recorded a day, so the season has its chart.
      await page.locator('[data-chart="season"] [data-run-day]').first().waitFor();
      await expectReadable(page, viewport);
      if (viewport.width < 768)
        expect(
          await shortButtons(page.getByRole('region', { name: "Record a day's sap" })),
        ).toEqual([]);
      expect(offSite(hosts)).toEqual([]);
      await context.close();
    }
  });

  it('without a network the tapper’s sap waits on the device, counted as waiting, and reaches the server once when the network is back', async () => {
    const { context, page, sugarbushId } = await signedInForChecks(
      env.browser,
      env.server.url,
      'tapper@fernside.example',
      { width: 1280, height: 900 },
    );
    await page.goto(`${env.server.url}/sugarbushes/${sugarbushId}/season?season=2026`);
    const sap = page.getByRole('region', { name: "Record a day's sap" });
    await sap.waitFor();
    await page.getByRole('group', { name: 'Units' }).getByRole('button', { name: '°C, L' }).click();
    const storedOn = (day: string) =>
      env.server.db('sap_entries').where({ sugarbush_id: sugarbushId, collected_on: day });
    expect(await storedOn('2026-03-19')).toHaveLength(0);

    await context.setOffline(true);
    await sap.getByLabel('Date').fill('2026-03-19');
    await sap.getByLabel('Sap volume (L)').fill('310');
    await sap.getByLabel('Sugar (°Brix)').fill('2.2');
    await sap.getByRole('button', { name: 'Save sap' }).click();
    await sap.getByText(/the sap of Mar 19, 2026 waits to send/).waitFor();
    await page.getByText('1 waiting to send').waitFor();
    expect(await storedOn('2026-03-19')).toHaveLength(0);

    await context.setOffline(false);
    await expect
      .poll(async () => (await storedOn('2026-03-19')).length, { timeout: 20000 })
      .toBe(1);
    await expect.poll(() => page.getByText(/waiting to send/).count(), { timeout: 15000 }).toBe(0);
    const [row] = await storedOn('2026-03-19');
    expect(row.client_id).toMatch(/^[0-9a-f-]{36}$/);
    expect(row.volume_l).toBeCloseTo(310, 6);
    // Sent once: one entry of the day, one audit entry for it.
    const audits = await env.server
      .db('audit_events')
      .where({ sugarbush_id: sugarbushId, entity: 'sap-entry', entity_id: row.id });
    expect(audits).toHaveLength(1);
    await context.close();
  });

  it('a consultant reads the log with no form to record', async () => {
    const { context, page, sugarbushId } = await signedInForChecks(
      env.browser,
      env.server.url,
      'consultant@fernside.example',
      { width: 1280, height: 900 },
    );
    await page.goto(`${env.server.url}/sugarbushes/${sugarbushId}/season?season=2026`);
    await page.getByText(/You read the season log/).waitFor();
    expect(await page.getByRole('region', { name: "Record a day's sap" }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Save weather' }).count()).toBe(0);
    await context.close();
  });
});

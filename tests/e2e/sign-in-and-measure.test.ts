import { describe, expect, it } from 'vitest';
import { recordHosts, signInAs, demoServerAndBrowser } from './harness';

const env = demoServerAndBrowser();

async function firstActiveTreeId() {
  const tree = await env.server
    .db('trees as t')
    .join('sugarbushes as s', 's.id', 't.sugarbush_id')
    .where('s.name', 'Owl Ledge')
    .where('t.status', 'active')
    .orderBy('t.tag')
    .first('t.id', 't.tag');
  return tree as { id: number; tag: string };
}

describe('in a real browser', () => {
  it('every demo member signs in and sees Owl Ledge with its trees; the outsider sees only their own stand', async () => {
    const [{ n }] = await env.server
      .db('trees as t')
      .join('sugarbushes as s', 's.id', 't.sugarbush_id')
      .where('s.name', 'Owl Ledge')
      .count({ n: '*' });
    const total = Number(n).toLocaleString('en-US');
    for (const who of ['owner', 'forester', 'tapper', 'consultant']) {
      const context = await env.browser.newContext();
      const page = await context.newPage();
      const hosts = recordHosts(page);
      await signInAs(page, env.server.url, `${who}@fernside.example`);
      await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
      await expect.poll(() => page.getByText('Owl Ledge').first().isVisible()).toBe(true);
      await expect
        .poll(() => page.getByText(`of ${total}`).first().isVisible(), { timeout: 15000 })
        .toBe(true);
      expect([...hosts].filter((h) => h !== 'localhost' && h !== '127.0.0.1')).toEqual([]);
      await context.close();
    }
    const context = await env.browser.newContext();
    const page = await context.newPage();
    await signInAs(page, env.server.url, 'outsider@elsewhere.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await page.getByRole('table').waitFor();
    expect(await page.getByText('Owl Ledge').count()).toBe(0);
    await context.close();
  });

  it('a forester records a reading far off the last one, confirms it, and sees it in the diameter history', async () => {
    const tree = await firstActiveTreeId();
    const context = await env.browser.newContext();
    const page = await context.newPage();
    await signInAs(page, env.server.url, 'forester@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await page.goto(`${env.server.url}/trees/${tree.id}`);
    await page.getByRole('heading', { name: 'Record measurement' }).waitFor();
    await page.getByLabel('Date').fill('2026-11-20');
    await page.getByLabel('Unit', { exact: true }).selectOption('cm');
    await page.getByRole('textbox', { name: 'Diameter', exact: true }).fill('77.7');
    // Far more than a year's growth: the form asks to re-measure or confirm before it saves.
    const confirm = page.getByRole('group', { name: 'Confirm the reading' });
    await confirm.waitFor();
    expect(await confirm.textContent()).toMatch(
      /cm more than (earlier this season|last season|in \d{4}) — re-measure or confirm/,
    );
    await page.getByRole('button', { name: 'Save measurement' }).click();
    await page.getByText('Confirm it, or correct the value.').waitFor();
    await confirm.getByRole('checkbox').check();
    await page.getByRole('button', { name: 'Save measurement' }).click();
    const history = page.getByRole('table', { name: 'Diameter history' });
    await expect
      .poll(() => history.getByText('Nov 20, 2026').count(), { timeout: 10000 })
      .toBeGreaterThan(0);
    await expect.poll(() => history.getByText('77.7').count()).toBeGreaterThan(0);
    const saved = await env.server
      .db('measurements')
      .where({ tree_id: tree.id, measured_on: '2026-11-20' })
      .first();
    expect(saved.dbh_cm).toBeCloseTo(77.7, 5);
    expect(Boolean(saved.confirmed_outlier)).toBe(true);
    await context.close();
  });

  it('a tapper sees no measurement form, and the API refuses their POST with 403', async () => {
    const tree = await firstActiveTreeId();
    const context = await env.browser.newContext();
    const page = await context.newPage();
    await signInAs(page, env.server.url, 'tapper@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await page.goto(`${env.server.url}/trees/${tree.id}`);
    await page.getByRole('table', { name: 'Diameter history' }).waitFor();
    expect(await page.getByRole('heading', { name: 'Record measurement' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Save measurement' }).count()).toBe(0);
    const status = await page.evaluate(async (treeId) => {
      const { token } = await (await fetch('/api/auth/csrf')).json();
      const res = await fetch(`/api/trees/${treeId}/measurements`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'x-csrf-token': token },
        body: JSON.stringify({ measuredOn: '2026-11-21', dbhCm: 50 }),
      });
      return res.status;
    }, tree.id);
    expect(status).toBe(403);
    expect(
      await env.server
        .db('measurements')
        .where({ tree_id: tree.id, measured_on: '2026-11-21' })
        .first(),
    ).toBeUndefined();
    await context.close();
  });
});

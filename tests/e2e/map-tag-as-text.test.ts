import { describe, expect, it } from 'vitest';
import { recordHosts, signInAs, demoServerAndBrowser, offSite } from './harness';

const env = demoServerAndBrowser();

const markup = '<a href="//elsewhere.example">x</a>';

describe('user strings on the map', () => {
  it('when a tag holds markup, then its tooltip shows the characters as text, no link, and the page breaks no security policy', async () => {
    const standId = (await env.server.db('sugarbushes').where({ name: 'Owl Ledge' }).first('id'))
      .id;
    const tree = await env.server
      .db('trees')
      .where({ sugarbush_id: standId, tag: 'OL-0001' })
      .first('id');
    const context = await env.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    const hosts = recordHosts(page);
    const violations: string[] = [];
    page.on('console', (m) => {
      if (/Content Security Policy|Refused to/i.test(m.text())) violations.push(m.text());
    });
    page.on('pageerror', (e) => violations.push(String(e)));

    await signInAs(page, env.server.url, 'forester@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    const renamed = await page.evaluate(
      async ({ id, tag }) => {
        const { token } = await (await fetch('/api/auth/csrf')).json();
        const res = await fetch(`/api/trees/${id}`, {
          method: 'PATCH',
          headers: { 'content-type': 'application/json', 'x-csrf-token': token },
          body: JSON.stringify({ tag }),
        });
        return res.status;
      },
      { id: tree.id, tag: markup },
    );
    expect(renamed).toBe(200);

    await page.goto(`${env.server.url}/sugarbushes/${standId}/map`);
    await page.locator('.leaflet-container').waitFor();
    // Find it by its tag: the map zooms to the tree and centres it.
    await page.getByLabel('Find tree by tag').fill(markup);
    await page.getByRole('button', { name: 'Find', exact: true }).click();
    await page.getByRole('button', { name: 'Close tree card' }).click();
    await page.waitForTimeout(600); // the zoom to the chosen tree settles
    const box = (await page.locator('.leaflet-container').boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    const tooltip = page.locator('.leaflet-tooltip');
    await tooltip.first().waitFor();
    expect(await tooltip.first().textContent()).toBe(markup);
    expect(await page.locator('.leaflet-tooltip a').count()).toBe(0);
    expect(await page.locator('a[href="//elsewhere.example"]').count()).toBe(0);
    expect(violations).toEqual([]);
    expect(offSite(hosts)).toEqual([]);
    await context.close();
  });
});

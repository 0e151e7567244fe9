import { describe, expect, it } from 'vitest';
import { signInAs, demoServerAndBrowser } from './harness';

const env = demoServerAndBrowser();

describe('the tapper at a tree, in a real browser', () => {
  it('takes an advised spot, records the hole in feet and inches, and sees it saved', async () => {
    const tree = await env.server
      .db('trees as t')
      .join('sugarbushes as s', 's.id', 't.sugarbush_id')
      .where({ 's.name': 'Owl Ledge', 't.tag': 'OL-0002' })
      .first('t.id');
    const before = Number(
      (
        await env.server.db('tapholes').where({ tree_id: tree.id, season: 2027 }).count({ n: '*' })
      )[0].n,
    );
    const page = await env.browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signInAs(page, env.server.url, 'tapper@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await page.goto(`${env.server.url}/trees/${tree.id}?season=2027`);
    await page.getByRole('heading', { name: 'Record taphole' }).waitFor();
    await page
      .getByRole('button', { name: /Use this spot/ })
      .first()
      .click();
    await page.getByLabel('Height, feet').fill('3');
    await page.getByLabel('Height, inches').fill('7');
    await page.getByRole('button', { name: 'Save taphole' }).click();
    await page.getByText(/Saved the 2027 hole/).waitFor({ timeout: 10000 });
    const holes = await env.server.db('tapholes').where({ tree_id: tree.id, season: 2027 });
    expect(holes).toHaveLength(before + 1);
    expect(holes.at(-1).height_cm).toBeCloseTo(109.22, 2);
    await page.close();
  });

  it('a consultant sees the advice but no taphole form', async () => {
    const tree = await env.server.db('trees').where({ tag: 'OL-0002' }).first('id');
    const page = await env.browser.newPage();
    await signInAs(page, env.server.url, 'consultant@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await page.goto(`${env.server.url}/trees/${tree.id}`);
    await page.getByRole('heading', { name: /Advice for/ }).waitFor();
    expect(await page.getByRole('heading', { name: 'Record taphole' }).count()).toBe(0);
    await page.close();
  });
});

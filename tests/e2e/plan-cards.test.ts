import { describe, expect, it } from 'vitest';
import { demoServerAndBrowser, offSite, recordHosts, signInAs } from './harness';
import {
  axeContext,
  checkedViewports,
  cutOffElements,
  expectReadable,
  horizontalOverflow,
  seriousAxeFindings,
  shortButtons,
  signedInForChecks,
} from './page-checks';

const env = demoServerAndBrowser();

/** An active demo tree with holes drilled in 2026 and none yet for 2027, and its newest hole. */
async function treeWithPriorHoles() {
  const db = env.server.db;
  const tree = await db('trees as t')
    .join('sugarbushes as s', 's.id', 't.sugarbush_id')
    .where({ 's.name': 'Owl Ledge', 't.status': 'active' })
    .whereExists(db('tapholes as h').whereRaw('h.tree_id = t.id').where('h.season', 2026))
    .whereNotExists(db('tapholes as h').whereRaw('h.tree_id = t.id').where('h.season', 2027))
    .orderBy('t.tag')
    .first('t.id', 't.tag', 's.id as standId');
  const hole = await db('tapholes')
    .where({ tree_id: tree.id, season: 2026 })
    .orderBy('id')
    .first('height_cm', 'azimuth_deg');
  return { ...tree, hole } as {
    id: number;
    tag: string;
    standId: number;
    hole: { height_cm: number; azimuth_deg: number };
  };
}

describe('the plan as cards on a phone, in a real browser', () => {
  it('the tapper opens a tree’s card, reads its trunk, is warned of a spot too close to the 2026 hole before saving, and the saved hole is stored once', async () => {
    const tree = await treeWithPriorHoles();
    const context = await env.browser.newContext({
      ...axeContext,
      viewport: { width: 390, height: 844 },
    });
    const page = await context.newPage();
    const hosts = recordHosts(page);
    await signInAs(page, env.server.url, 'tapper@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await page.goto(`${env.server.url}/sugarbushes/${tree.standId}/plan?season=2027&q=${tree.tag}`);

    const card = page.locator(`[data-tree-card="${tree.tag}"]`);
    await card.waitFor();
    // A phone shows cards, not the wide table.
    expect(await page.getByRole('table', { name: 'Season plan' }).count()).toBe(0);
    await expect.poll(() => card.getByRole('link', { name: `Tree ${tree.tag}` }).count()).toBe(1);

    await card.getByRole('button', { name: 'Trunk and holes' }).click();
    const trunk = card.getByRole('img', { name: new RegExp(`Trunk of tree ${tree.tag}`) });
    await trunk.waitFor({ timeout: 15000 });
    expect(await trunk.getAttribute('aria-label')).toMatch(/earlier holes?, \d+ still in reach/);
    await card.getByText(/Holes on this trunk, as a list/).click();
    expect(await card.getByRole('list', { name: 'Holes on this trunk' }).innerText()).toMatch(
      /2026: /,
    );

    await card.getByRole('button', { name: 'Record what was drilled' }).click();
    const form = card.getByRole('region', { name: `Record what was drilled at ${tree.tag}` });
    await form.waitFor();
    // An inch above the 2026 hole, on its side: well inside any guideline's spacing.
    const inches = Math.round(tree.hole.height_cm / 2.54) + 1;
    const azimuth = Math.round(tree.hole.azimuth_deg) % 360;
    await form.getByLabel('Height (in)').fill(String(inches));
    await form.getByLabel('Side (degrees)').fill(String(azimuth));
    await form.getByText(/from the 2026 hole: the guideline asks for/).waitFor();
    const before = await env.server.db('tapholes').where({ tree_id: tree.id, season: 2027 });
    expect(before).toHaveLength(0);

    // The open card at 390 px: nothing cut off, buttons a thumb can hit, no serious findings.
    expect(await horizontalOverflow(page)).toBe(0);
    expect(await cutOffElements(card)).toEqual([]);
    expect(await shortButtons(card)).toEqual([]);
    expect(await seriousAxeFindings(page)).toEqual([]);

    await form.getByRole('button', { name: 'Save drilled hole' }).click();
    await form.getByText(/Saved: the 2027 hole/).waitFor({ timeout: 15000 });
    await card.getByRole('region', { name: 'Drilled in 2027' }).waitFor({ timeout: 15000 });

    const stored = await env.server.db('tapholes').where({ tree_id: tree.id, season: 2027 });
    expect(stored).toHaveLength(1);
    expect(stored[0].azimuth_deg).toBe(azimuth);
    expect(stored[0].height_cm).toBeCloseTo(inches * 2.54, 2);
    expect(offSite(hosts)).toEqual([]);
    await context.close();
  });

  it('the plan page has no serious accessibility findings and nothing wider than the window, on a phone and on a desktop', async () => {
    const tree = await treeWithPriorHoles();
    for (const viewport of checkedViewports) {
      const { context, page } = await signedInForChecks(
        env.browser,
        env.server.url,
        'tapper@fernside.example',
        viewport,
      );
      await page.goto(`${env.server.url}/sugarbushes/${tree.standId}/plan?season=2027`);
      const phone = viewport.width < 768;
      if (phone) await page.locator('[data-tree-card]').first().waitFor({ timeout: 30000 });
      else await page.getByRole('table', { name: 'Season plan' }).waitFor({ timeout: 30000 });
      await expectReadable(page, viewport);
      if (phone) {
        const cards = page.getByRole('list', { name: 'Trees in walking order' });
        expect(await page.locator('[data-tree-card]').count()).toBeGreaterThan(1);
        expect(await shortButtons(cards)).toEqual([]);
      }
      await context.close();
    }
  });
});

import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { demoServerAndBrowser, offSite, recordHosts, signInAs } from './harness';

const env = demoServerAndBrowser();

const HAZARD = 'Cracked leader leaning over the drop line: drill from the uphill side only.';

describe('a hazard note reaches the tapper, in a real browser', () => {
  it('the consultant writes a hazard note with a photo on a tree; the tapper sees it on the plan row and the tree page before the drilling advice', async () => {
    // An active tree with no notes of its own yet.
    const tree = await env.server
      .db('trees as t')
      .join('sugarbushes as s', 's.id', 't.sugarbush_id')
      .where({ 's.name': 'Owl Ledge', 't.status': 'active' })
      .whereNotExists(env.server.db('notes as n').whereRaw('n.tree_id = t.id').select('n.id'))
      .orderBy('t.tag')
      .first('t.id', 't.tag', 's.id as standId');
    const photo = await sharp({
      create: { width: 640, height: 480, channels: 3, background: '#6b5a45' },
    })
      .jpeg()
      .toBuffer();

    // The consultant, on a phone.
    const consultantContext = await env.browser.newContext({
      viewport: { width: 390, height: 844 },
    });
    const consultant = await consultantContext.newPage();
    const consultantHosts = recordHosts(consultant);
    await signInAs(consultant, env.server.url, 'consultant@fernside.example');
    await consultant.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await consultant.goto(`${env.server.url}/trees/${tree.id}`);
    const form = consultant.getByRole('region', { name: 'Write a note on this tree' });
    await form.waitFor();
    await form.getByLabel('Category').selectOption('hazard');
    await form.getByLabel('Note').fill(HAZARD);
    await form
      .getByLabel('Photo')
      .setInputFiles({ name: 'leader.jpg', mimeType: 'image/jpeg', buffer: photo });
    await form.getByRole('button', { name: 'Save note' }).click();
    await form.getByText('Note and photo saved.').waitFor({ timeout: 15000 });
    const notes = consultant.getByRole('list', { name: `Notes on tree ${tree.tag}` });
    const thumb = notes.getByRole('img', { name: /Photo 1 of the note/ });
    await thumb.waitFor();
    // Thumbnails load lazily: bring this one into view, as a reader scrolling to it would.
    await thumb.scrollIntoViewIfNeeded();
    await expect
      .poll(() => thumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth))
      .toBeGreaterThan(0);
    const saved = await env.server
      .db('notes')
      .where({ tree_id: tree.id, category: 'hazard', body: HAZARD })
      .first();
    expect(saved).toBeDefined();
    expect(await env.server.db('photos').where({ note_id: saved.id })).toHaveLength(1);
    expect(offSite(consultantHosts)).toEqual([]);
    await consultantContext.close();

    // The tapper: the plan's row for the tree, then the tree's page.
    const tapperContext = await env.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const tapper = await tapperContext.newPage();
    const tapperHosts = recordHosts(tapper);
    await signInAs(tapper, env.server.url, 'tapper@fernside.example');
    await tapper.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await tapper.goto(`${env.server.url}/sugarbushes/${tree.standId}/plan?q=${tree.tag}`);
    const table = tapper.getByRole('table', { name: 'Season plan' });
    const onPlan = table.getByRole('complementary', { name: `Hazard at tree ${tree.tag}` });
    await onPlan.waitFor({ timeout: 30000 });
    expect(await onPlan.textContent()).toContain(HAZARD);
    const row = table
      .getByRole('row')
      .filter({ has: tapper.getByRole('link', { name: tree.tag }) });
    const planBox = await onPlan.boundingBox();
    const rowBox = await row.boundingBox();
    expect(planBox!.y).toBeLessThan(rowBox!.y);

    await row.getByRole('link', { name: tree.tag }).click();
    await tapper.waitForURL(new RegExp(`/trees/${tree.id}`));
    const onTree = tapper.getByRole('complementary', { name: 'Hazard at this tree' });
    await onTree.waitFor();
    expect(await onTree.textContent()).toContain(HAZARD);
    const advice = tapper.getByRole('heading', { name: /Advice for/ });
    await advice.waitFor();
    expect((await onTree.boundingBox())!.y).toBeLessThan((await advice.boundingBox())!.y);
    expect(offSite(tapperHosts)).toEqual([]);
    await tapperContext.close();
  });
});

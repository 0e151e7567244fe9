import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { DEVICE_DB, DEVICE_STORE } from '../../src/lib/device-store';
import { CACHE_KEY, QUEUE_KEY } from '../../src/lib/query-persistence';
import { queryRoots } from '../../src/lib/query-roots';
import { refreshTrees } from '../../server/modules/advice/refresh-trees';
import { cuttableLink, demoServerAndBrowser, offSite, recordHosts, signInAs } from './harness';
import { checkedViewports, expectReadable, shortButtons, signedInForChecks } from './page-checks';

const env = demoServerAndBrowser();
const season = new Date().getUTCFullYear();
let standId: number;

// A new season: the demo's readings of this year are taken away, so every tree is due again.
beforeAll(async () => {
  const db = env.server.db;
  standId = (await db('sugarbushes').where({ name: 'Owl Ledge' }).first('id')).id;
  const treeIds = (await db('trees').where({ sugarbush_id: standId }).pluck('id')).map(Number);
  await db('measurements').whereIn('tree_id', treeIds).where({ season }).delete();
  await db.transaction((trx) => refreshTrees(trx, standId, treeIds));
});

const treeOf = (tag: string) =>
  env.server.db('trees').where({ sugarbush_id: standId, tag }).first('id', 'latest_dbh_cm');

const readingsThisSeason = async (treeId: number) =>
  env.server.db('measurements').where({ tree_id: treeId, season });

/** The tree the round shows now, by its heading. */
async function currentTag(page: Page): Promise<string> {
  const heading = page.locator('#round-tree');
  await heading.waitFor();
  return ((await heading.textContent()) ?? '').replace(/^Tree\s+/, '').trim();
}

/** Measures the tree on screen a little above its last DBH, in cm, and moves on. */
async function measureCurrent(page: Page): Promise<{ tag: string; treeId: number }> {
  const tag = await currentTag(page);
  const tree = await treeOf(tag);
  await page.getByLabel('Unit', { exact: true }).selectOption('cm');
  await page.getByLabel('DBH', { exact: true }).fill((Number(tree.latest_dbh_cm) + 0.3).toFixed(1));
  await page.getByText('Advice with this reading').waitFor();
  await page.getByLabel('Crown dieback').selectOption('5');
  await page.getByLabel('Condition note').fill('Sound bole');
  await page.getByRole('button', { name: 'Record and next tree' }).click();
  await page.getByText(`Recorded tree ${tag}`).waitFor();
  return { tag, treeId: tree.id };
}

/** What the device's store keeps under `key` (read in the page; undefined when nothing). */
const keptOnDevice = (at: { db: string; store: string; key: string }) =>
  new Promise<unknown>((resolve) => {
    const open = indexedDB.open(at.db);
    open.onerror = () => resolve(undefined);
    open.onsuccess = () => {
      const db = open.result;
      if (!db.objectStoreNames.contains(at.store)) return resolve(undefined);
      const read = db.transaction(at.store).objectStore(at.store).get(at.key);
      read.onsuccess = () => resolve(read.result);
      read.onerror = () => resolve(undefined);
    };
  });

/** How many field entries the device holds for sending. */
const keptQueueLength = async (page: Page) => {
  const queue = await page.evaluate(keptOnDevice, {
    db: DEVICE_DB,
    store: DEVICE_STORE,
    key: QUEUE_KEY,
  });
  return Array.isArray(queue) ? queue.length : 0;
};

/** Trees the round kept on the device counts as measured (-1 while it keeps no round). */
const keptRoundMeasured = async (page: Page) => {
  const cache = (await page.evaluate(keptOnDevice, {
    db: DEVICE_DB,
    store: DEVICE_STORE,
    key: CACHE_KEY,
  })) as
    { queries?: { queryKey: unknown[]; state: { data?: { measured?: number[] } } }[] } | undefined;
  const round = cache?.queries?.find(
    (q) => q.queryKey[0] === queryRoots.round[0] && q.state.data?.measured,
  );
  return round ? round.state.data!.measured!.reduce((a, b) => a + b, 0) : -1;
};

const openRound = async (page: Page, base = env.server.url) => {
  await page.goto(`${base}/sugarbushes/${standId}/round`);
  await page.locator('#round-tree').waitFor({ timeout: 20000 });
};

describe('the forester walks the measuring round on a phone, in and out of coverage', () => {
  it('records five trees, two offline across a reload; both reach the server once, a refused one shows its reason, and sign-out warns', async () => {
    const context = await env.browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await context.newPage();
    const hosts = recordHosts(page);
    // The phone reaches the server through a link the test cuts when it goes out of coverage.
    const link = await cuttableLink(env.server.url);
    // The page is told first going out and last coming back, so it never sees a dead link
    // while it thinks it is online.
    const offline = async (off: boolean) => {
      if (!off) link.restore();
      await context.setOffline(off);
      if (off) link.cut();
    };
    await signInAs(page, link.url, 'forester@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await openRound(page, link.url);
    // The service worker has the shell before the network goes.
    await page.evaluate(async () => {
      await navigator.serviceWorker.ready;
    });
    const due = Number(
      (
        await env.server
          .db('trees')
          .where({ sugarbush_id: standId })
          .whereIn('status', ['active', 'held-out'])
          .count({ n: '*' })
      )[0].n,
    );
    await page.getByText(`0 of ${due.toLocaleString('en-US')} measured in ${season}`).waitFor();

    const online: { tag: string; treeId: number }[] = [];
    for (let i = 0; i < 3; i++) online.push(await measureCurrent(page));
    await expect
      .poll(
        async () =>
          (await Promise.all(online.map((t) => readingsThisSeason(t.treeId)))).map((r) => r.length),
        { timeout: 15000 },
      )
      .toEqual([1, 1, 1]);
    // The device keeps the round as read again after the third reading before the phone goes
    // out of coverage: after a reload offline, only what it kept counts.
    await expect.poll(() => keptRoundMeasured(page), { timeout: 15000 }).toBe(3);

    await offline(true);
    const measuredOffline = [await measureCurrent(page), await measureCurrent(page)];
    await page.getByText('2 waiting to send').waitFor();
    // The entries are on the device (IndexedDB) before the page goes: a reload a moment after
    // the tap could otherwise outrun the write on a loaded machine.
    await expect.poll(() => keptQueueLength(page), { timeout: 10000 }).toBe(2);

    // Reloaded without a network: the shell comes from the service worker, the queue from IndexedDB.
    await page.reload();
    await page.locator('#round-tree').waitFor({ timeout: 20000 });
    await page.getByText('2 waiting to send').waitFor();
    await page.getByText(/You.re offline/).waitFor();
    expect(await page.evaluate(() => navigator.serviceWorker.controller !== null)).toBe(true);
    await page.getByText(`5 of ${due.toLocaleString('en-US')} measured in ${season}`).waitFor();
    for (const t of measuredOffline) expect(await readingsThisSeason(t.treeId)).toHaveLength(0);

    // Meanwhile the owner marks the next tree removed, from another device.
    const refusedTree = await measureCurrent(page);
    await page.getByText('3 waiting to send').waitFor();
    const owner = await env.browser.newContext();
    const ownerPage = await owner.newPage();
    await signInAs(ownerPage, env.server.url, 'owner@fernside.example');
    await ownerPage.waitForURL(/\/sugarbushes\/\d+\/trees/);
    const csrf = (await (await owner.request.get(`${env.server.url}/api/auth/csrf`)).json()).token;
    const patched = await owner.request.patch(`${env.server.url}/api/trees/${refusedTree.treeId}`, {
      headers: { 'x-csrf-token': csrf },
      data: { status: 'removed' },
    });
    expect(patched.status()).toBe(200);
    await owner.close();

    await offline(false);
    await expect
      .poll(
        async () =>
          (await Promise.all(measuredOffline.map((t) => readingsThisSeason(t.treeId)))).map(
            (r) => r.length,
          ),
        { timeout: 20000 },
      )
      .toEqual([1, 1]);
    for (const t of measuredOffline) {
      const [row] = await readingsThisSeason(t.treeId);
      expect(row.client_id).toMatch(/^[0-9a-f-]{36}$/);
      expect(row.crown_dieback_pct).toBe(5);
    }
    await page.getByText('1 entry not accepted').waitFor({ timeout: 15000 });
    expect(await page.getByText(/waiting to send/).count()).toBe(0);
    await page.getByRole('button', { name: 'Review' }).click();
    await page.getByText(`Tree ${refusedTree.tag} is marked removed`).waitFor();
    expect(await readingsThisSeason(refusedTree.treeId)).toHaveLength(0);

    // Signing out would lose the refused entry and one waiting offline: the app says so first.
    await offline(true);
    await measureCurrent(page);
    await page.getByRole('button', { name: 'More' }).click();
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByText('Signing out deletes 2 entries that are not on the server').waitFor();
    await page.getByRole('button', { name: 'Stay signed in' }).click();
    await offline(false);
    await expect.poll(() => page.getByText(/waiting to send/).count(), { timeout: 15000 }).toBe(0);

    // Signing out anyway forgets the refused entry: the next person on this phone sees none of it.
    // (The panel with the sign-out button is still open.)
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByText('Signing out deletes 1 entry that is not on the server').waitFor();
    await page.getByRole('button', { name: 'Sign out and lose 1' }).click();
    await page.waitForURL(/\/sign-in/);
    await signInAs(page, link.url, 'owner@fernside.example');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await page.locator('main h1').waitFor();
    expect(await page.getByText(/not accepted|waiting to send/).count()).toBe(0);
    expect(offSite(hosts)).toEqual([]);
    await context.close();
    await link.close();
  });

  it('the round page passes axe, fits the screen and keeps its buttons 44 px tall, on a phone and on a laptop', async () => {
    for (const viewport of checkedViewports) {
      const { context, page } = await signedInForChecks(
        env.browser,
        env.server.url,
        'forester@fernside.example',
        viewport,
      );
      await openRound(page);
      // With the advice and the confirmation open, as in the woods.
      const tree = await treeOf(await currentTag(page));
      await page.getByLabel('Unit', { exact: true }).selectOption('cm');
      await page
        .getByLabel('DBH', { exact: true })
        .fill((Number(tree.latest_dbh_cm) + 6).toFixed(1));
      await page.getByRole('group', { name: 'Confirm the reading' }).waitFor();
      await expectReadable(page, viewport);
      // On a phone every button on the page; on a laptop the round's own (the shell's rail is
      // sized for a mouse there).
      expect(
        await shortButtons(page.locator(viewport.width < 768 ? 'body' : '[data-round]')),
      ).toEqual([]);
      await context.close();
    }
  });
});

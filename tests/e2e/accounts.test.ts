import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { recordHosts, demoServerAndBrowser, offSite } from './harness';

const env = demoServerAndBrowser();

/**
 * The token of the newest mailed `path?token=…` (or `path/<token>`) link to this address, read from the local
 * outbox in the test's own database (mail goes out just after the answer, so wait for it).
 */
async function mailedToken(to: string, path: string, after = 0): Promise<string> {
  const pattern = new RegExp(`${path.replace(/[/.]/g, (c) => `\\${c}`)}(?:\\?token=|/)([\\w-]+)`);
  let token: string | undefined;
  await expect
    .poll(
      async () => {
        const row = await env.server
          .db('outbox')
          .where('to_address', to)
          .where('id', '>', after)
          .orderBy('id', 'desc')
          .first('body');
        token = row ? pattern.exec(row.body)?.[1] : undefined;
        return token;
      },
      { timeout: 10000 },
    )
    .toBeTruthy();
  return token!;
}

async function lastOutboxId(): Promise<number> {
  const row = await env.server.db('outbox').max({ id: 'id' }).first();
  return Number(row?.id ?? 0);
}

async function signIn(page: Page, email: string, password: string) {
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

describe('accounts, in a real browser', () => {
  it('a person signs up on a phone, opens the mailed link, starts a stand and sees its empty register with the next step', async () => {
    const email = 'wren.okafor@hemlock-hollow.example';
    const context = await env.browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await context.newPage();
    const hosts = recordHosts(page);
    const before = await lastOutboxId();

    await page.goto(`${env.server.url}/sign-in`);
    await page.getByRole('link', { name: 'Create an account' }).click();
    await page.getByLabel('Your name').fill('Wren Okafor');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('first-thaw-2027');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByRole('heading', { name: 'Check your inbox' }).waitFor();
    await page.getByText(`We've sent a message to ${email}.`).waitFor();

    const token = await mailedToken(email, '/sign-up', before);
    await page.goto(`${env.server.url}/sign-up?token=${token}`);
    await page.waitForURL(/\/sugarbushes\/new$/);
    await page.getByLabel('Name of the sugarbush').fill('Hemlock Hollow');
    await page.getByLabel('Sunny side').selectOption({ label: 'South-east (135°)' });
    await page.getByRole('radio', { name: /^Traditional/ }).check();
    const start = page.getByRole('button', { name: 'Start the sugarbush' });
    const box = await start.boundingBox();
    expect(box!.height).toBeGreaterThanOrEqual(44);
    expect(box!.width).toBeGreaterThan(300);
    await start.click();

    await page.waitForURL(/\/sugarbushes\/\d+\/trees$/);
    await page.getByText('No trees yet — add the first tree on the map').waitFor();
    expect(await page.getByRole('link', { name: 'Open the map' }).isVisible()).toBe(true);

    const stand = await env.server.db('sugarbushes').where({ name: 'Hemlock Hollow' }).first();
    expect(stand).toMatchObject({ profile: 'traditional', sunny_azimuth_deg: 135 });
    expect(page.url()).toContain(`/sugarbushes/${stand.id}/trees`);
    const membership = await env.server
      .db('memberships as m')
      .join('users as u', 'u.id', 'm.user_id')
      .where({ 'u.email': email, 'm.sugarbush_id': stand.id })
      .first('m.role');
    expect(membership?.role).toBe('owner');
    expect(offSite(hosts)).toEqual([]);
    await context.close();
  });

  it('a person asks for a reset, sets a new password twice, signs in with it, and the same link then says it is used', async () => {
    const email = 'consultant@fernside.example';
    const context = await env.browser.newContext();
    const page = await context.newPage();
    const hosts = recordHosts(page);
    const before = await lastOutboxId();

    await page.goto(`${env.server.url}/sign-in`);
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.getByLabel('E-mail').fill(email);
    await page.getByRole('button', { name: 'Send the link' }).click();
    await page.getByRole('heading', { name: 'Check your inbox' }).waitFor();

    const token = await mailedToken(email, '/reset-password', before);
    const link = `${env.server.url}/reset-password?token=${token}`;
    await page.goto(link);
    await page.getByLabel('New password', { exact: true }).fill('sap-is-running-27');
    await page.getByLabel('New password again').fill('sap-is-running-27');
    await page.getByRole('button', { name: 'Save the new password' }).click();
    await page.getByRole('heading', { name: 'Your password is changed' }).waitFor();

    await page.getByRole('link', { name: 'Sign in' }).click();
    await page.waitForURL(/\/sign-in$/);
    await signIn(page, email, 'maple-demo-2027');
    await page.getByText("That e-mail and password don't match an account").waitFor();
    await signIn(page, email, 'sap-is-running-27');
    await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await page.getByText('Owl Ledge').first().waitFor();

    await page.goto(link);
    await page.getByLabel('New password', { exact: true }).fill('another-season-28');
    await page.getByLabel('New password again').fill('another-season-28');
    await page.getByRole('button', { name: 'Save the new password' }).click();
    await page.getByRole('heading', { name: 'This reset link no longer works' }).waitFor();
    await page.getByText(/already been used/).waitFor();
    expect(await page.getByRole('link', { name: 'Ask for a new link' }).isVisible()).toBe(true);
    expect(offSite(hosts)).toEqual([]);
    await context.close();
  });

  it('the owner invites a new consultant from Settings; the link, opened in a fresh browser, makes the account, which sees Owl Ledge; the link then says it is used', async () => {
    const email = 'juniper.hale@hemlock-hollow.example';
    const stand = await env.server.db('sugarbushes').where({ name: 'Owl Ledge' }).first('id');
    const before = await lastOutboxId();

    const ownerContext = await env.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const owner = await ownerContext.newPage();
    const ownerHosts = recordHosts(owner);
    await owner.goto(`${env.server.url}/sign-in`);
    await signIn(owner, 'owner@fernside.example', 'maple-demo-2027');
    await owner.waitForURL(/\/sugarbushes\/\d+\/trees/);
    await owner.goto(`${env.server.url}/sugarbushes/${stand.id}/settings`);
    const invite = owner.getByRole('form', { name: 'Invite someone' });
    await invite.getByLabel('E-mail').fill(email);
    await invite.getByLabel('Role').selectOption('consultant');
    await invite.getByRole('button', { name: 'Send the invitation' }).click();
    await owner.getByText(`Invitation sent to ${email}`).waitFor();
    await owner
      .getByRole('list', { name: 'Invitations' })
      .getByRole('listitem', { name: email })
      .waitFor();
    expect(offSite(ownerHosts)).toEqual([]);
    await ownerContext.close();

    const token = await mailedToken(email, '/invitations', before);
    const context = await env.browser.newContext();
    const page = await context.newPage();
    const hosts = recordHosts(page);
    await page.goto(`${env.server.url}/invitations/${token}`);
    await page.getByRole('heading', { name: 'Join Owl Ledge' }).waitFor();
    await page.getByText('Write notes').first().waitFor();
    await page.getByLabel('Your name').fill('Juniper Hale');
    await page.getByLabel('Password', { exact: true }).fill('spouts-in-by-march');
    await page.getByLabel('Password again').fill('spouts-in-by-march');
    await page.getByRole('button', { name: 'Create account and join' }).click();
    await page.waitForURL(new RegExp(`/sugarbushes/${stand.id}/trees`));
    await page.getByRole('table', { name: 'Tree register' }).waitFor({ timeout: 15000 });
    await page.getByText('Owl Ledge').first().waitFor();
    const me = await page.evaluate(async () => (await fetch('/api/auth/me')).json());
    expect(me.memberships).toEqual([{ sugarbushId: stand.id, role: 'consultant' }]);

    await page.goto(`${env.server.url}/invitations/${token}`);
    await page.getByRole('heading', { name: 'This invitation has already been used' }).waitFor();
    expect(offSite(hosts)).toEqual([]);
    await context.close();
  });
});

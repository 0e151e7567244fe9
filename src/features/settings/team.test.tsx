import { configure, screen, waitFor, within } from '@testing-library/react';
import { vi } from 'vitest';
import type { InvitationInput } from '@shared/schemas/invitation';
import { SettingsRoute } from '@/app/routes/settings';
import { json, mockApi, type Handler } from '@/test/api-mock';
import { meAs, page, sugarbush } from '@/test/fixtures';
import { renderPage } from '@/test/render';
import { invitation, member, team } from './settings-fixtures';

// The page reads the stand, the user and the team before it shows; a busy machine is slow at it.
configure({ asyncUtilTimeout: 5000 });
vi.setConfig({ testTimeout: 20_000 });

const MEMBERS = 'GET /api/sugarbushes/3/members';
const INVITATIONS = 'GET /api/sugarbushes/3/invitations';
const INVITE = 'POST /api/sugarbushes/3/invitations';
const RESEND = 'POST /api/sugarbushes/3/invitations/5/resend';
const REVOKE = 'DELETE /api/sugarbushes/3/invitations/5';

const lastOwner = json(409, {
  error: { code: 'last-owner', message: 'The sugarbush would be left without an owner' },
});

function openTeam(routes: Record<string, unknown> = {}) {
  const api = mockApi({
    'GET /api/auth/me': meAs('owner'),
    'GET /api/sugarbushes/3': sugarbush({ role: 'owner' }),
    [MEMBERS]: page(team()),
    [INVITATIONS]: page([invitation()]),
    ...routes,
  });
  const view = renderPage({
    path: '/sugarbushes/:id/settings',
    url: '/sugarbushes/3/settings',
    element: <SettingsRoute />,
    strict: true,
  });
  return { api, ...view };
}

const memberRow = (name: string) => screen.findByRole('listitem', { name });

describe('the team', () => {
  it('when the owner makes a tapper a forester, then a second click sends it and the team is read again', async () => {
    const { api, user } = openTeam({
      'PATCH /api/sugarbushes/3/members/13': ((req) => ({
        status: 200,
        body: member({ userId: 13, name: 'Sam Birch', ...(req.body as object) }),
      })) satisfies Handler,
    });
    const sam = await memberRow('Sam Birch');
    await user.selectOptions(
      within(sam).getByRole('combobox', { name: 'Role of Sam Birch' }),
      'forester',
    );
    expect(api.to('PATCH /api/sugarbushes/3/members/13')).toHaveLength(0);
    const confirm = within(sam).getByRole('group', { name: 'Confirm the change' });
    expect(confirm).toHaveTextContent('Make Sam Birch a forester?');
    const reads = api.to(MEMBERS).length;
    await user.click(within(confirm).getByRole('button', { name: 'Change the role' }));

    await waitFor(() => expect(api.to('PATCH /api/sugarbushes/3/members/13')).toHaveLength(1));
    expect(api.to('PATCH /api/sugarbushes/3/members/13')[0].body).toEqual({ role: 'forester' });
    expect(await within(sam).findByText('Sam Birch is now a forester.')).toBeInTheDocument();
    await waitFor(() => expect(api.to(MEMBERS).length).toBeGreaterThan(reads));
  });

  it('when the only owner tries to become a tapper, then the refusal is shown plainly and the role stays', async () => {
    const { user } = openTeam({ 'PATCH /api/sugarbushes/3/members/11': lastOwner });
    const me = await memberRow('Pat owner');
    expect(me).toHaveTextContent('(you)');
    const role = within(me).getByRole('combobox', { name: 'Role of Pat owner' });
    await user.selectOptions(role, 'tapper');
    await user.click(within(me).getByRole('button', { name: 'Change the role' }));

    expect(await within(me).findByRole('alert')).toHaveTextContent(
      'A sugarbush always keeps at least one owner. Make someone else an owner first.',
    );
    expect(role).toHaveValue('owner');
  });

  it('when the only owner tries to remove themselves, then the same refusal shows', async () => {
    const { api, user } = openTeam({ 'DELETE /api/sugarbushes/3/members/11': lastOwner });
    const me = await memberRow('Pat owner');
    await user.click(within(me).getByRole('button', { name: 'Remove Pat owner' }));
    expect(within(me).getByRole('group', { name: 'Confirm the change' })).toHaveTextContent(
      'Remove yourself from Hollow Creek? You lose access at once.',
    );
    await user.click(within(me).getByRole('button', { name: 'Remove' }));

    expect(await within(me).findByRole('alert')).toHaveTextContent(
      'A sugarbush always keeps at least one owner.',
    );
    expect(api.to('DELETE /api/sugarbushes/3/members/11')).toHaveLength(1);
  });

  it('when the owner removes a member and keeps them on second thought, then nothing is sent', async () => {
    const { api, user } = openTeam();
    const robin = await memberRow('Robin Ash');
    await user.click(within(robin).getByRole('button', { name: 'Remove Robin Ash' }));
    await user.click(within(robin).getByRole('button', { name: 'Keep as is' }));
    expect(within(robin).queryByRole('group', { name: 'Confirm the change' })).toBeNull();
    expect(api.requests.filter((r) => r.method === 'DELETE')).toHaveLength(0);
  });

  it('when the owner removes a member, then the member leaves the list with a calm note', async () => {
    let members = team();
    const { user } = openTeam({
      [MEMBERS]: () => ({ status: 200, body: page(members) }),
      'DELETE /api/sugarbushes/3/members/12': () => {
        members = members.filter((m) => m.userId !== 12);
        return { status: 204 };
      },
    });
    const robin = await memberRow('Robin Ash');
    await user.click(within(robin).getByRole('button', { name: 'Remove Robin Ash' }));
    await user.click(within(robin).getByRole('button', { name: 'Remove' }));

    expect(await screen.findByText('Robin Ash is no longer on the team.')).toBeInTheDocument();
    expect(screen.queryByRole('listitem', { name: 'Robin Ash' })).not.toBeInTheDocument();
  });

  it('when the team cannot be loaded, then the page says so and offers a retry', async () => {
    openTeam({ [MEMBERS]: json(500, { error: { code: 'server', message: 'Database busy' } }) });
    expect(await screen.findByText("We couldn't load the team.")).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Retry' })).toBeInTheDocument();
  });
});

describe('inviting someone', () => {
  const send = () => screen.getByRole('button', { name: 'Send the invitation' });

  it('when the e-mail is not an address, then the field says so and nothing is sent', async () => {
    const { api, user } = openTeam();
    const email = await screen.findByRole('textbox', { name: 'E-mail' });
    await user.type(email, 'lee at example');
    await user.click(send());
    expect(await screen.findByText('Enter an e-mail address')).toBeInTheDocument();
    expect(email).toHaveAccessibleDescription('Enter an e-mail address');
    expect(api.to(INVITE)).toHaveLength(0);
  });

  it('when the owner invites a consultant, then the address and role are sent and the list is read again', async () => {
    const { api, user } = openTeam({
      [INVITE]: ((req) => ({
        status: 201,
        body: invitation({ id: 6, ...(req.body as InvitationInput) }),
      })) satisfies Handler,
    });
    await user.type(await screen.findByRole('textbox', { name: 'E-mail' }), ' Kim@Example.TEST ');
    await user.selectOptions(screen.getByRole('combobox', { name: 'Role' }), 'consultant');
    const reads = api.to(INVITATIONS).length;
    await user.click(send());

    await waitFor(() => expect(api.to(INVITE)).toHaveLength(1));
    expect(api.to(INVITE)[0].body).toEqual({ email: 'kim@example.test', role: 'consultant' });
    expect(
      await screen.findByText(
        'Invitation sent to kim@example.test. The link works once, for 7 days.',
      ),
    ).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'E-mail' })).toHaveValue('');
    await waitFor(() => expect(api.to(INVITATIONS).length).toBeGreaterThan(reads));
  });

  it('when the API refuses the address, then its message shows under the e-mail field', async () => {
    const { user } = openTeam({
      [INVITE]: json(400, {
        error: {
          code: 'invalid-input',
          message: 'Some fields need attention',
          fields: { email: 'Mail to this domain cannot be delivered' },
        },
      }),
    });
    const email = await screen.findByRole('textbox', { name: 'E-mail' });
    await user.type(email, 'kim@example.test');
    await user.click(send());
    expect(await screen.findByText('Mail to this domain cannot be delivered')).toBeInTheDocument();
    expect(email).toHaveAccessibleDescription('Mail to this domain cannot be delivered');
  });

  it('when the person is already on the team, then the form says so', async () => {
    const { user } = openTeam({
      [INVITE]: json(409, { error: { code: 'already-member', message: 'Already a member' } }),
    });
    await user.type(await screen.findByRole('textbox', { name: 'E-mail' }), 'robin@example.test');
    await user.click(send());
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'That person is already on the team.',
    );
  });
});

describe('invitations waiting', () => {
  it('shows each with its role, who sent it and when it expires; an expired one says so', async () => {
    openTeam({
      [INVITATIONS]: page([
        invitation({ expiresAt: new Date(Date.now() + 3.5 * 86_400_000).toISOString() }),
        invitation({
          id: 9,
          email: 'old@example.test',
          role: 'forester',
          status: 'expired',
          expiresAt: '2026-12-01T10:00:00Z',
        }),
      ]),
    });
    const lee = await screen.findByRole('listitem', { name: 'lee@example.test' });
    expect(lee).toHaveTextContent('Tapper');
    expect(lee).toHaveTextContent(/Expires in 3 days \(.+\) · invited by Pat owner/);
    const old = screen.getByRole('listitem', { name: 'old@example.test' });
    expect(old).toHaveTextContent('Forester');
    expect(old).toHaveTextContent('Expired Dec 1, 2026');
  });

  it('when the owner resends an invitation, then a fresh link is asked for and the note says the old one is dead', async () => {
    const { api, user } = openTeam({ [RESEND]: invitation({ expiresAt: '2027-01-20T10:00:00Z' }) });
    const lee = await screen.findByRole('listitem', { name: 'lee@example.test' });
    const reads = api.to(INVITATIONS).length;
    await user.click(within(lee).getByRole('button', { name: 'Resend to lee@example.test' }));

    await waitFor(() => expect(api.to(RESEND)).toHaveLength(1));
    expect(
      await screen.findByText(
        'A new link went to lee@example.test; the earlier one no longer works.',
      ),
    ).toBeInTheDocument();
    await waitFor(() => expect(api.to(INVITATIONS).length).toBeGreaterThan(reads));
  });

  it('when the owner revokes an invitation, then it is withdrawn and leaves the list', async () => {
    let waiting = [invitation()];
    const { api, user } = openTeam({
      [INVITATIONS]: () => ({ status: 200, body: page(waiting) }),
      [REVOKE]: () => {
        waiting = [];
        return { status: 204 };
      },
    });
    const lee = await screen.findByRole('listitem', { name: 'lee@example.test' });
    await user.click(
      within(lee).getByRole('button', { name: 'Revoke the invitation to lee@example.test' }),
    );

    await waitFor(() => expect(api.to(REVOKE)).toHaveLength(1));
    expect(
      await screen.findByText('The invitation to lee@example.test is withdrawn.'),
    ).toBeInTheDocument();
    expect(
      await screen.findByText('No invitations waiting. Invite someone above.'),
    ).toBeInTheDocument();
  });

  it('when a resend fails, then the reason shows plainly', async () => {
    const { user } = openTeam({
      [RESEND]: json(404, { error: { code: 'not-found', message: 'No such invitation' } }),
    });
    const lee = await screen.findByRole('listitem', { name: 'lee@example.test' });
    await user.click(within(lee).getByRole('button', { name: 'Resend to lee@example.test' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'That invitation was already taken up or withdrawn.',
    );
  });
});

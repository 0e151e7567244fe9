import { configure, screen, waitFor, within } from '@testing-library/react';
import { vi } from 'vitest';
import { profiles } from '@shared/rules/index';
import type { Role } from '@shared/schemas/enums';
import { permissionLabels } from '@shared/schemas/permissions';
import { SettingsRoute } from '@/app/routes/settings';
import { queryRoots } from '@/lib/query-roots';
import { json, mockApi, type Handler } from '@/test/api-mock';
import { meAs, page, sugarbush } from '@/test/fixtures';
import { renderPage } from '@/test/render';
import { invitation, team } from './settings-fixtures';

// The page reads the stand, the user and the team before it shows; a busy machine is slow at it.
configure({ asyncUtilTimeout: 5000 });
vi.setConfig({ testTimeout: 20_000 });

const STAND = 'GET /api/sugarbushes/3';
const PATCH = 'PATCH /api/sugarbushes/3';
const INVITATIONS = 'GET /api/sugarbushes/3/invitations';

function openSettingsAs(role: Role, routes: Record<string, unknown> = {}) {
  const api = mockApi({
    'GET /api/auth/me': meAs(role),
    [STAND]: sugarbush({ role }),
    'GET /api/sugarbushes/3/members': page(team()),
    [INVITATIONS]: page([invitation()]),
    [PATCH]: ((req) => ({
      status: 200,
      body: sugarbush({ role, ...(req.body as object) }),
    })) satisfies Handler,
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

const region = (name: string) => screen.findByRole('region', { name });

describe('the settings page for a member who is not the owner', () => {
  it('when a forester opens Settings, then everything reads but nothing can be changed, and the page says who can', async () => {
    const { api, user } = openSettingsAs('forester');

    const who = await region('Who can change what');
    const row = (label: string) => within(who).getByRole('row', { name: new RegExp(label) });
    expect(row(permissionLabels['manage-stand'])).toHaveTextContent(/Owner\s*No$/);
    expect(row(permissionLabels['choose-guideline'])).toHaveTextContent(/Owner\s*No$/);
    expect(row(permissionLabels['manage-members'])).toHaveTextContent(/Owner\s*No$/);
    expect(row(permissionLabels['edit-boundary'])).toHaveTextContent(/Owner, Forester\s*Yes$/);

    const stand = await region('The stand');
    expect(within(stand).getByText('Hollow Creek')).toBeInTheDocument();
    expect(within(stand).getByText('south (180°)')).toBeInTheDocument();
    expect(within(stand).queryByRole('textbox')).not.toBeInTheDocument();

    const guideline = await region('The guideline');
    expect(within(guideline).queryByRole('radio')).not.toBeInTheDocument();
    const inUse = within(guideline).getByRole('listitem', { current: true });
    expect(inUse).toHaveTextContent(profiles.conservative.label);
    await user.click(
      within(inUse).getByRole('button', { name: `Why? ${profiles.conservative.label}` }),
    );
    expect(within(inUse).getByText(`Source: ${profiles.conservative.source}`)).toBeVisible();
    expect(within(guideline).queryByRole('button', { name: /See what this changes/ })).toBeNull();
    // No figures of the stand's own saved yet: nothing to list for them.
    expect(within(guideline).queryByText('Your own figures')).not.toBeInTheDocument();

    const teamRegion = await region('The team');
    const robin = await within(teamRegion).findByRole('listitem', { name: 'Robin Ash' });
    expect(robin).toHaveTextContent('Forester');
    expect(within(teamRegion).queryByRole('combobox')).not.toBeInTheDocument();
    expect(within(teamRegion).queryByRole('button', { name: /Remove/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Send the invitation' })).not.toBeInTheDocument();
    // Invitations are the owner's: a forester's page never asks for them.
    expect(api.to(INVITATIONS)).toHaveLength(0);
  });

  it('when the stand follows its own saved guideline, then a consultant reads it in use with its table in centimetres and its source', async () => {
    const { user } = openSettingsAs('consultant', {
      [STAND]: sugarbush({
        role: 'consultant',
        profile: 'custom',
        customProfile: {
          key: 'custom',
          label: 'Hollow Creek rule',
          unit: 'in',
          bands: [
            { from: 14, taps: 1 },
            { from: 20, taps: 2 },
          ],
          spacing: { sidewaysCm: 10, verticalCm: 30 },
          source: 'Our consulting forester, 2026',
        },
      }),
    });
    const guideline = await region('The guideline');
    expect(guideline).toHaveTextContent('This sugarbush follows Hollow Creek rule.');
    const inUse = within(guideline).getByRole('listitem', { current: true });
    expect(inUse).toHaveTextContent('Your own: Hollow Creek rule');
    expect(inUse).toHaveTextContent('1 tap from 35.6 cm, 2 taps from 50.8 cm');
    await user.click(within(inUse).getByRole('button', { name: /^Why\?/ }));
    expect(within(inUse).getByText('Source: Our consulting forester, 2026')).toBeVisible();
  });

  it('when the owner opens Settings, then there is no who-can-change note and the forms are there', async () => {
    openSettingsAs('owner');
    expect(await screen.findByRole('textbox', { name: 'Name' })).toHaveValue('Hollow Creek');
    expect(screen.queryByRole('region', { name: 'Who can change what' })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Send the invitation' })).toBeInTheDocument();
  });

  it('when the stand cannot be loaded, then the page says so and a retry asks again', async () => {
    let failing = true;
    const { api, user } = openSettingsAs('owner', {
      [STAND]: (() =>
        failing
          ? { status: 500, body: { error: { code: 'server', message: 'Database busy' } } }
          : { status: 200, body: sugarbush({ role: 'owner' }) }) satisfies Handler,
    });
    expect(
      await screen.findByText("We couldn't load this sugarbush's settings."),
    ).toBeInTheDocument();
    const failedReads = api.to(STAND).length;
    failing = false;
    await user.click(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByRole('textbox', { name: 'Name' })).toHaveValue('Hollow Creek');
    expect(api.to(STAND).length).toBeGreaterThan(failedReads);
  });
});

describe('the stand form', () => {
  it('when the owner empties the name and types 400 degrees, then both fields say what is wrong and nothing is sent', async () => {
    const { api, user } = openSettingsAs('owner');
    const name = await screen.findByRole('textbox', { name: 'Name' });
    await user.clear(name);
    const degrees = screen.getByRole('textbox', { name: 'Degrees' });
    await user.clear(degrees);
    await user.type(degrees, '400');
    await user.click(screen.getByRole('button', { name: 'Save the stand' }));

    expect(await screen.findByText('Name the sugarbush')).toBeInTheDocument();
    expect(name).toHaveAttribute('aria-invalid', 'true');
    expect(degrees).toHaveAccessibleDescription(
      '0° is north, 90° east, 180° south. Use less than 360°',
    );
    expect(api.to(PATCH)).toHaveLength(0);
  });

  it('when the owner picks south-east and renames the stand, then both are sent and the plan, map, trees and stand are fetched afresh', async () => {
    const { api, user, queryClient } = openSettingsAs('owner');
    const cached = [queryRoots.plans, queryRoots.map, queryRoots.trees].map((root) => {
      const key = [...root, 'cached-for-test'];
      queryClient.setQueryData(key, { any: 'thing' });
      return key;
    });
    const name = await screen.findByRole('textbox', { name: 'Name' });
    await user.clear(name);
    await user.type(name, 'Hollow Creek East');
    await user.selectOptions(screen.getByRole('combobox', { name: 'Compass point' }), 'SE');
    expect(screen.getByRole('textbox', { name: 'Degrees' })).toHaveValue('135');
    const standReads = api.to(STAND).length;
    await user.click(screen.getByRole('button', { name: 'Save the stand' }));

    await waitFor(() => expect(api.to(PATCH)).toHaveLength(1));
    expect(api.to(PATCH)[0].body).toEqual({ name: 'Hollow Creek East', sunnyAzimuthDeg: 135 });
    expect(
      await screen.findByText('Saved. The season plan follows the new sunny side.'),
    ).toBeInTheDocument();
    for (const key of cached) expect(queryClient.getQueryState(key)?.isInvalidated).toBe(true);
    await waitFor(() => expect(api.to(STAND).length).toBeGreaterThan(standReads));
  });

  it('when the owner types exact degrees between points, then the compass shows none and the degrees are sent', async () => {
    const { api, user } = openSettingsAs('owner');
    const degrees = await screen.findByRole('textbox', { name: 'Degrees' });
    await user.clear(degrees);
    await user.type(degrees, '200,5');
    expect(screen.getByRole('combobox', { name: 'Compass point' })).toHaveValue('');
    await user.click(screen.getByRole('button', { name: 'Save the stand' }));
    await waitFor(() => expect(api.to(PATCH)).toHaveLength(1));
    expect(api.to(PATCH)[0].body).toMatchObject({ sunnyAzimuthDeg: 200.5 });
  });

  it('when the API refuses the name, then its message shows under the name field', async () => {
    const { user } = openSettingsAs('owner', {
      [PATCH]: json(400, {
        error: {
          code: 'invalid-input',
          message: 'Some fields need attention',
          fields: { name: 'You already have a stand of that name' },
        },
      }),
    });
    const name = await screen.findByRole('textbox', { name: 'Name' });
    await user.click(screen.getByRole('button', { name: 'Save the stand' }));

    expect(await screen.findByText('You already have a stand of that name')).toBeInTheDocument();
    expect(name).toHaveAccessibleDescription('You already have a stand of that name');
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('when the API refuses without naming a field, then its message shows once above the button', async () => {
    const { user } = openSettingsAs('owner', {
      [PATCH]: json(403, { error: { code: 'forbidden', message: 'Only the owner may do that' } }),
    });
    await screen.findByRole('textbox', { name: 'Name' });
    await user.click(screen.getByRole('button', { name: 'Save the stand' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'Your role in this sugarbush cannot change this.',
    );
  });
});

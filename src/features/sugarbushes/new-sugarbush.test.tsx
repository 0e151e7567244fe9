import { screen, waitFor, within } from '@testing-library/react';
import { profileKeys, profiles } from '@shared/rules/index';
import type { MeResponse } from '@shared/schemas/auth';
import { NewSugarbushRoute } from '@/app/routes/new-sugarbush';
import { authKeys } from '@/lib/auth';
import { json, mockApi } from '@/test/api-mock';
import { meAs, page, sugarbush } from '@/test/fixtures';
import { renderPage } from '@/test/render';
import { sugarbushKeys } from './api/sugarbush-keys';

const newcomer: MeResponse = { ...meAs('owner'), memberships: [] };

function openNewSugarbush(routes: Record<string, unknown>) {
  const api = mockApi({ 'GET /api/auth/me': newcomer, ...routes });
  const view = renderPage({
    path: '/sugarbushes/new',
    url: '/sugarbushes/new',
    element: <NewSugarbushRoute />,
  });
  return { api, ...view };
}

describe('starting a sugarbush', () => {
  it('offers every guideline with its source, the conservative one chosen, and the sunny side to the south', async () => {
    openNewSugarbush({});
    const group = await screen.findByRole('group', { name: 'Tapping guideline' });
    const choices = within(group).getAllByRole('radio');
    expect(choices).toHaveLength(profileKeys.length);
    for (const key of profileKeys) {
      const choice = within(group).getByRole('radio', {
        name: new RegExp(literal(profiles[key].label)),
      });
      expect(choice.closest('label')).toHaveTextContent(`Source: ${profiles[key].source}`);
    }
    expect(within(group).getByRole('radio', { checked: true })).toHaveAttribute(
      'value',
      'conservative',
    );
    expect(screen.getByLabelText('Sunny side')).toHaveDisplayValue('South (180°)');
    expect(within(screen.getByLabelText('Sunny side')).getAllByRole('option')).toHaveLength(8);
  });

  it('when the name is left empty, then the field says so and nothing is sent', async () => {
    const { api, user } = openNewSugarbush({});
    await user.click(await screen.findByRole('button', { name: 'Start the sugarbush' }));
    expect(await screen.findByText('Name the sugarbush')).toBeInTheDocument();
    expect(api.to('POST /api/sugarbushes')).toHaveLength(0);
  });

  it('when it is started, then it is sent with its side and guideline, the person is its owner at once, and its register opens', async () => {
    const created = sugarbush({
      id: 9,
      name: 'Beaver Flats',
      role: 'owner',
      treeCount: 0,
      profile: 'traditional',
      sunnyAzimuthDeg: 225,
    });
    const { api, router, user, queryClient } = openNewSugarbush({
      'POST /api/sugarbushes': json(201, created),
    });
    queryClient.setQueryData(authKeys.me(), newcomer);
    queryClient.setQueryData(sugarbushKeys.list(), page([]));

    await user.type(await screen.findByLabelText('Name of the sugarbush'), ' Beaver Flats ');
    await user.selectOptions(screen.getByLabelText('Sunny side'), 'South-west (225°)');
    await user.click(
      screen.getByRole('radio', { name: new RegExp(literal(profiles.traditional.label)) }),
    );
    await user.click(screen.getByRole('button', { name: 'Start the sugarbush' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/sugarbushes/9/trees'));
    expect(api.to('POST /api/sugarbushes')[0].body).toEqual({
      name: 'Beaver Flats',
      sunnyAzimuthDeg: 225,
      profile: 'traditional',
    });
    expect(queryClient.getQueryData<MeResponse>(authKeys.me())?.memberships).toEqual([
      { sugarbushId: 9, role: 'owner' },
    ]);
    expect(queryClient.getQueryState(sugarbushKeys.list())?.isInvalidated).toBe(true);
    expect(queryClient.getQueryData(sugarbushKeys.detail(9))).toEqual(created);
  });

  it('when the server refuses the name, then its message sits under the name', async () => {
    const { user } = openNewSugarbush({
      'POST /api/sugarbushes': json(400, {
        error: {
          code: 'validation',
          message: 'Check the highlighted fields',
          fields: { name: 'Use at most 120 characters' },
        },
      }),
    });
    await user.type(await screen.findByLabelText('Name of the sugarbush'), 'Beaver Flats');
    await user.click(screen.getByRole('button', { name: 'Start the sugarbush' }));
    await waitFor(() =>
      expect(screen.getByLabelText('Name of the sugarbush')).toHaveAccessibleDescription(
        /Use at most 120 characters/,
      ),
    );
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });
});

function literal(text: string) {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

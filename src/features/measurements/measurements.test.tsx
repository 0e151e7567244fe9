import { screen, waitFor, within } from '@testing-library/react';
import type { Role } from '@shared/schemas/enums';
import { TreeRoute } from '@/app/routes/tree';
import { json, mockApi, type Handler } from '@/test/api-mock';
import { measurement, meAs, page, taphole, tree } from '@/test/fixtures';
import { renderPage } from '@/test/render';

const POST = 'POST /api/trees/7/measurements';

function openTreeAs(
  role: Role,
  routes: Record<string, unknown> = {},
  unitSystem: 'imperial' | 'metric' = 'metric',
) {
  const api = mockApi({
    'GET /api/auth/me': meAs(role, unitSystem),
    'GET /api/trees/7/notes': page([]),
    'GET /api/trees/7/photos': page([]),
    'GET /api/trees/7': tree(),
    'GET /api/trees/7/measurements': page(
      [
        measurement({ id: 1, measuredOn: '2024-04-03', season: 2024, dbhCm: 37.2 }),
        measurement({ id: 2, measuredOn: '2025-04-01', season: 2025, dbhCm: 73.6, note: 'Typo' }),
        measurement({ id: 3, measuredOn: '2025-04-01', season: 2025, dbhCm: 37.6, correctsId: 2 }),
      ].map((m) => (m.id === 2 ? { ...m, superseded: true } : m)),
    ),
    'GET /api/trees/7/tapholes': page([taphole()]),
    [POST]: ((req) => ({
      status: 201,
      body: measurement({ id: 9, ...(req.body as object), season: 2026 }),
    })) satisfies Handler,
    ...routes,
  });
  const view = renderPage({ path: '/trees/:treeId', url: '/trees/7', element: <TreeRoute /> });
  return { api, ...view };
}

const diameterField = () => screen.getByRole('textbox', { name: 'Diameter' });
const save = () => screen.getByRole('button', { name: 'Save measurement' });

describe('recording a measurement on the tree page', () => {
  it('when a forester enters a circumference, then the saved DBH is C/π', async () => {
    const { api, user } = openTreeAs('forester');
    await screen.findByRole('heading', { name: 'Record measurement' });

    await user.click(screen.getByRole('radio', { name: 'Circumference' }));
    await user.type(screen.getByRole('textbox', { name: 'Circumference' }), '120');
    await user.selectOptions(screen.getByLabelText('Unit'), 'cm');
    await user.click(save());

    await waitFor(() => expect(api.to(POST)).toHaveLength(1));
    const body = api.to(POST)[0].body as { dbhCm: number };
    expect(body.dbhCm).toBeCloseTo(120 / Math.PI, 2);
    expect(body.dbhCm).toBeCloseTo(38.2, 2);
  });

  it('when a forester enters a diameter in inches, then it is saved in centimetres (15 in → 38.1 cm)', async () => {
    const { api, user } = openTreeAs('forester');
    await screen.findByRole('heading', { name: 'Record measurement' });

    await user.selectOptions(screen.getByLabelText('Unit'), 'in');
    await user.type(diameterField(), '15');
    await user.selectOptions(screen.getByLabelText('Crown dieback'), '15');
    await user.type(screen.getByLabelText('Note'), 'Measured after the thaw');
    await user.click(save());

    await waitFor(() => expect(api.to(POST)).toHaveLength(1));
    const request = api.to(POST)[0];
    expect(request.body).toMatchObject({
      dbhCm: 38.1,
      crownDiebackPct: 15,
      note: 'Measured after the thaw',
      measuredOn: expect.stringMatching(/^\d{4}-\d{2}-\d{2}$/),
    });
    expect(request.headers.get('x-csrf-token')).toBe('token-1');
  });

  it('when the user prefers imperial units, then the unit starts at inches', async () => {
    openTreeAs('owner', {}, 'imperial');
    await screen.findByRole('heading', { name: 'Record measurement' });
    expect(screen.getByLabelText('Unit')).toHaveValue('in');
  });

  it.each([
    ['0', 'Diameter must be at least 2.5 cm'],
    ['500', 'Diameter must be at most 250 cm'],
  ])(
    'when a forester enters a DBH of %s cm, then the field shows an error and nothing is sent',
    async (value, message) => {
      const { api, user } = openTreeAs('forester');
      await screen.findByRole('heading', { name: 'Record measurement' });

      await user.selectOptions(screen.getByLabelText('Unit'), 'cm');
      await user.type(diameterField(), value);
      await user.click(save());

      expect(await screen.findByText(message)).toBeInTheDocument();
      expect(diameterField()).toHaveAttribute('aria-invalid', 'true');
      expect(diameterField()).toHaveAccessibleDescription(message);
      expect(api.to(POST)).toHaveLength(0);
    },
  );

  it('when the API refuses a field, then its message shows under that field', async () => {
    const { user } = openTreeAs('forester', {
      [POST]: json(400, {
        error: {
          code: 'invalid-input',
          message: 'Some fields need attention',
          fields: { measuredOn: 'This tree already has a measurement on that date' },
        },
      }),
    });
    await screen.findByRole('heading', { name: 'Record measurement' });

    await user.type(diameterField(), '40');
    await user.click(save());

    const message = await screen.findByText('This tree already has a measurement on that date');
    expect(message).toBeInTheDocument();
    expect(screen.getByLabelText('Date')).toHaveAccessibleDescription(
      'This tree already has a measurement on that date',
    );
  });

  it('when a measurement is saved, then a confirmation shows and the history is fetched again', async () => {
    const { api, user } = openTreeAs('owner');
    await screen.findByRole('heading', { name: 'Record measurement' });
    await waitFor(() => expect(api.to('GET /api/trees/7/measurements')).toHaveLength(1));

    await user.selectOptions(screen.getByLabelText('Unit'), 'cm');
    await user.type(diameterField(), '38,4');
    await user.click(save());

    expect(await screen.findByText(/Saved: DBH 38\.4 cm/)).toBeInTheDocument();
    await waitFor(() => expect(api.to('GET /api/trees/7/measurements')).toHaveLength(2));
    expect(diameterField()).toHaveValue('');
  });

  // A DBH change of more than about 1 in (2.5 cm) a year, or a shrink beyond tape error, is an
  // entry error until confirmed — common practice.
  it('when a forester enters a reading far off the last one, then the form asks to confirm it before saving', async () => {
    const { api, user } = openTreeAs('forester');
    await screen.findByRole('heading', { name: 'Record measurement' });
    await waitFor(() => expect(api.to('GET /api/trees/7/measurements')).toHaveLength(1));

    await user.selectOptions(screen.getByLabelText('Unit'), 'cm');
    await user.clear(screen.getByLabelText('Date'));
    await user.type(screen.getByLabelText('Date'), '2026-04-02');
    await user.type(diameterField(), '42.1');
    const confirm = await screen.findByRole('group', { name: 'Confirm the reading' });
    expect(
      within(confirm).getByText('4.5 cm more than last season — re-measure or confirm'),
    ).toBeInTheDocument();
    await user.click(save());
    expect(await screen.findByText('Confirm it, or correct the value.')).toBeInTheDocument();
    expect(api.to(POST)).toHaveLength(0);

    await user.click(within(confirm).getByRole('checkbox', { name: /this reading is right/ }));
    await user.click(save());
    await waitFor(() => expect(api.to(POST)).toHaveLength(1));
    expect(api.to(POST)[0].body).toMatchObject({ dbhCm: 42.1, confirmedOutlier: true });
  });

  it('when the API asks for a confirmation the form did not know of, then the question shows with the box to tick', async () => {
    const { user } = openTreeAs('forester', {
      [POST]: json(400, {
        error: {
          code: 'unconfirmed-outlier',
          message: '3.0 cm more than last season — re-measure or confirm.',
          fields: { confirmedOutlier: '3.0 cm more than last season — re-measure or confirm' },
        },
      }),
    });
    await screen.findByRole('heading', { name: 'Record measurement' });
    await user.selectOptions(screen.getByLabelText('Unit'), 'cm');
    await user.type(diameterField(), '38');
    await user.click(save());
    const confirm = await screen.findByRole('group', { name: 'Confirm the reading' });
    expect(
      within(confirm).getByText('3.0 cm more than last season — re-measure or confirm'),
    ).toBeInTheDocument();
    expect(within(confirm).getByRole('checkbox')).toBeInTheDocument();
  });

  it.each<Role>(['tapper', 'consultant'])(
    'when a %s opens a tree, then there is no measurement form at all',
    async (role) => {
      openTreeAs(role);
      expect(await screen.findByRole('table', { name: 'Diameter history' })).toBeInTheDocument();
      expect(screen.queryByRole('heading', { name: 'Record measurement' })).not.toBeInTheDocument();
      expect(screen.queryByRole('button', { name: 'Save measurement' })).not.toBeInTheDocument();
      expect(screen.queryByRole('textbox', { name: 'Diameter' })).not.toBeInTheDocument();
    },
  );
});

describe('the diameter history', () => {
  it('when a row was corrected, then it is hidden until asked for, and then struck through', async () => {
    const { user } = openTreeAs('tapper');
    const table = await screen.findByRole('table', { name: 'Diameter history' });
    expect(within(table).getAllByRole('row')).toHaveLength(3);
    expect(within(table).queryByText('Typo')).not.toBeInTheDocument();

    await user.click(screen.getByRole('checkbox', { name: 'Show corrected entries (1)' }));
    const row = within(table).getByText('Typo').closest('tr');
    expect(row).toHaveClass('line-through');
  });

  it('when the user prefers imperial units, then DBH shows in inches with one decimal', async () => {
    openTreeAs('tapper', {}, 'imperial');
    const table = await screen.findByRole('table', { name: 'Diameter history' });
    expect(within(table).getByText('14.8 in')).toBeInTheDocument(); // 37.6 cm
    expect(within(table).getByRole('columnheader', { name: 'DBH (in)' })).toBeInTheDocument();
  });

  it('shows the taphole record read-only', async () => {
    openTreeAs('tapper');
    const table = await screen.findByRole('table', { name: 'Tapholes' });
    expect(within(table).getByText('180° S')).toBeInTheDocument();
    expect(within(table).getByText('Vacuum tubing')).toBeInTheDocument();
  });
});

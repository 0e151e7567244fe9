import { screen, waitFor, within } from '@testing-library/react';
import type { Role } from '@shared/schemas/enums';
import { upcomingSeason } from '@shared/schemas/plan';
import type { TapholeInput } from '@shared/schemas/taphole';
import { TreeRoute } from '@/app/routes/tree';
import { queryRoots } from '@/lib/query-roots';
import { standPlan, treeAdvice } from '@/test/advice-fixtures';
import { json, mockApi, type Handler } from '@/test/api-mock';
import { meAs, page, sugarbush, taphole, tree } from '@/test/fixtures';
import { renderPage } from '@/test/render';

const POST = 'POST /api/trees/7/tapholes';
const TAPHOLES = 'GET /api/trees/7/tapholes';
const ADVICE = 'GET /api/trees/7/advice';

function openTreeAs(
  role: Role,
  unitSystem: 'imperial' | 'metric' = 'metric',
  routes: Record<string, unknown> = {},
) {
  const api = mockApi({
    'GET /api/auth/me': meAs(role, unitSystem),
    'GET /api/trees/7': tree(),
    'GET /api/sugarbushes/3': sugarbush({ role }),
    'GET /api/trees/7/measurements': page([]),
    'GET /api/trees/7/notes': page([]),
    'GET /api/trees/7/photos': page([]),
    // Last season's hole, west and low: clear of both advised spots (south 110 cm, north 80 cm).
    [TAPHOLES]: page([taphole({ id: 1, season: 2026, azimuthDeg: 270, heightCm: 70 })]),
    [ADVICE]: treeAdvice(),
    [POST]: ((req) => ({
      status: 201,
      body: taphole({ id: 9, ...(req.body as TapholeInput) }),
    })) satisfies Handler,
    ...routes,
  });
  const view = renderPage({ path: '/trees/:treeId', url: '/trees/7', element: <TreeRoute /> });
  return { api, ...view };
}

const openForm = () => screen.findByRole('heading', { name: 'Record taphole' });
const save = () => screen.getByRole('button', { name: 'Save taphole' });
const sentBody = (api: ReturnType<typeof openTreeAs>['api']) =>
  api.to(POST)[0].body as TapholeInput;

describe('recording a taphole on the tree page', () => {
  it('when a tapper in imperial units enters 3 ft 7 in, then the hole is saved at 109.22 cm with the advised drill', async () => {
    const { api, user } = openTreeAs('tapper', 'imperial');
    await openForm();
    await waitFor(() => expect(screen.getByLabelText('Depth')).toHaveValue('2'));

    await user.type(screen.getByRole('textbox', { name: 'Height, feet' }), '3');
    await user.type(screen.getByRole('textbox', { name: 'Height, inches' }), '7');
    await user.selectOptions(screen.getByLabelText('Side'), 'S');
    await user.click(save());

    await waitFor(() => expect(api.to(POST)).toHaveLength(1));
    expect(sentBody(api)).toMatchObject({
      season: upcomingSeason(),
      heightCm: 109.22, // 43 in × 2.54 cm exactly
      azimuthDeg: 180,
      depthCm: 5.08,
      bitCm: 0.79375,
      collection: 'vacuum',
      stainHit: false,
      drilledOn: expect.stringMatching(/^\d{4}-\d{2}-\d{2}$/),
    });
    expect(api.to(POST)[0].headers.get('x-csrf-token')).toBe('token-1');
  });

  it('when the tapper picks the south-west side, then the azimuth saved is 225°', async () => {
    const { api, user } = openTreeAs('tapper');
    await openForm();

    await user.type(screen.getByLabelText('Height'), '95');
    await user.selectOptions(screen.getByLabelText('Side'), 'SW');
    await user.click(save());

    await waitFor(() => expect(api.to(POST)).toHaveLength(1));
    expect(sentBody(api)).toMatchObject({ azimuthDeg: 225, heightCm: 95 });
  });

  it('when the tapper drilled with a 7/16 in bit and hit stain, then 1.11125 cm and the stain are saved', async () => {
    const { api, user } = openTreeAs('owner', 'imperial');
    await openForm();

    await user.type(screen.getByRole('textbox', { name: 'Height, inches' }), '40');
    await user.selectOptions(screen.getByLabelText('Side'), 'E');
    await user.selectOptions(screen.getByLabelText('Bit'), '7/16 in');
    await user.click(
      screen.getByRole('checkbox', { name: 'Hit stained wood (brown or yellow shavings)' }),
    );
    await user.click(save());

    await waitFor(() => expect(api.to(POST)).toHaveLength(1));
    expect(sentBody(api)).toMatchObject({ bitCm: 1.11125, stainHit: true, heightCm: 101.6 });
  });

  it('when the height is out of range, then the field says so and nothing is sent', async () => {
    const { api, user } = openTreeAs('tapper');
    await openForm();

    await user.type(screen.getByLabelText('Height'), '450');
    await user.selectOptions(screen.getByLabelText('Side'), 'S');
    await user.click(save());

    const message = 'Height must be between 0 and 300 cm above the ground';
    expect(await screen.findByText(message)).toBeInTheDocument();
    expect(screen.getByLabelText('Height')).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByLabelText('Height')).toHaveAccessibleDescription(
      `Centimetres above the ground. ${message}`,
    );
    expect(api.to(POST)).toHaveLength(0);
  });

  it('when no side is chosen, then the side asks for one and nothing is sent', async () => {
    const { api, user } = openTreeAs('tapper');
    await openForm();

    await user.type(screen.getByLabelText('Height'), '100');
    await user.click(save());

    expect(await screen.findByText('Choose the side you drilled')).toBeInTheDocument();
    expect(api.to(POST)).toHaveLength(0);
  });

  it('when the API refuses a field, then its message shows under that field', async () => {
    const { user } = openTreeAs('tapper', 'metric', {
      [POST]: json(400, {
        error: {
          code: 'invalid-input',
          message: 'Some fields need attention',
          fields: { drilledOn: 'The drilling date cannot be in the future' },
        },
      }),
    });
    await openForm();

    await user.type(screen.getByLabelText('Height'), '100');
    await user.selectOptions(screen.getByLabelText('Side'), 'N');
    await user.click(save());

    expect(
      await screen.findByText('The drilling date cannot be in the future'),
    ).toBeInTheDocument();
    expect(screen.getByLabelText('Drilled on')).toHaveAccessibleDescription(
      'The drilling date cannot be in the future',
    );
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('when a hole is saved, then a calm confirmation shows and the record and advice are fetched again', async () => {
    const { api, user, queryClient } = openTreeAs('tapper');
    const planKey = [
      ...queryRoots.plans,
      'list',
      3,
      { season: 2027, page: 1, pageSize: 50, sort: 'tag' },
    ];
    queryClient.setQueryData(planKey, standPlan([]));
    await openForm();
    await waitFor(() => expect(api.to(TAPHOLES).length).toBeGreaterThan(0));
    const tapholeReads = api.to(TAPHOLES).length;
    const adviceReads = api.to(ADVICE).length;

    await user.type(screen.getByLabelText('Height'), '110');
    await user.selectOptions(screen.getByLabelText('Side'), 'S');
    await user.click(save());

    expect(
      await screen.findByText(`Saved the ${upcomingSeason()} hole: south at 1.10 m.`),
    ).toBeInTheDocument();
    await waitFor(() => expect(api.to(TAPHOLES).length).toBeGreaterThan(tapholeReads));
    await waitFor(() => expect(api.to(ADVICE).length).toBeGreaterThan(adviceReads));
    expect(queryClient.getQueryState(planKey)?.isInvalidated).toBe(true);
    expect(screen.getByLabelText('Height')).toHaveValue('');
    expect(screen.getByLabelText('Side')).toHaveValue('');
  });

  it.each<Role>(['forester', 'consultant'])(
    'when a %s opens a tree, then there is no taphole form and no "Use this spot"',
    async (role) => {
      openTreeAs(role);
      expect(await screen.findByRole('table', { name: 'Tapholes' })).toBeInTheDocument();
      await screen.findByText('Tap twice: south at 1.10 m, north at 0.80 m.');
      expect(screen.queryByRole('heading', { name: 'Record taphole' })).not.toBeInTheDocument();
      expect(screen.queryByRole('button', { name: 'Save taphole' })).not.toBeInTheDocument();
      expect(screen.queryByRole('button', { name: /Use this spot/ })).not.toBeInTheDocument();
      // The caution stays with the advice for everyone.
      expect(
        screen.getByRole('complementary', { name: 'Before you drill or climb' }),
      ).toBeVisible();
    },
  );

  it('when the tapper uses an advised spot, then its height and side fill the form', async () => {
    const { api, user } = openTreeAs('tapper');
    await openForm();

    await user.click(await screen.findByRole('button', { name: 'Use this spot: north at 0.80 m' }));

    expect(screen.getByLabelText('Height')).toHaveValue('80');
    expect(screen.getByLabelText('Side')).toHaveValue('N');
    expect(screen.getByRole('heading', { name: 'Record taphole' })).toHaveFocus();

    await user.click(save());
    await waitFor(() => expect(api.to(POST)).toHaveLength(1));
    expect(sentBody(api)).toMatchObject({ heightCm: 80, azimuthDeg: 0 });
  });

  it('when the spot is within the spacing of a hole still in reach, then a plain warning shows and the tapper can still save', async () => {
    const { api, user } = openTreeAs('tapper', 'metric', {
      [TAPHOLES]: page([taphole({ id: 1, season: 2026, azimuthDeg: 180, heightCm: 110 })]),
    });
    await openForm();
    await waitFor(() => expect(api.to(TAPHOLES).length).toBeGreaterThan(0));

    await user.type(screen.getByLabelText('Height'), '100');
    await user.selectOptions(screen.getByLabelText('Side'), 'S');

    const warning = await screen.findByText('Close to an earlier hole');
    const box = warning.parentElement!;
    expect(box).toHaveTextContent(
      'The 2026 hole (south at 1.10 m) is 10 cm above this spot, in line with it.',
    );
    // Conservative spacing: 4 in (10 cm) round the trunk or 12 in (30 cm) up or down.
    expect(box).toHaveTextContent(
      'at least 10 cm round the trunk or 30 cm up or down from holes still in reach, and out of their stain',
    );
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();

    await user.clear(screen.getByLabelText('Height'));
    await user.type(screen.getByLabelText('Height'), '145');
    expect(screen.queryByText('Close to an earlier hole')).not.toBeInTheDocument();

    await user.clear(screen.getByLabelText('Height'));
    await user.type(screen.getByLabelText('Height'), '100');
    await user.click(save());
    await waitFor(() => expect(api.to(POST)).toHaveLength(1));
  });

  // The traditional set: 3 in over and 6 in up or down, both distances (Ohio State — S).
  it('under a guideline that steps "over and up", a spot 6 in straight above last season’s hole is too close', async () => {
    const profile = { ...treeAdvice().profile, key: 'traditional' };
    const { api, user } = openTreeAs('tapper', 'metric', {
      [TAPHOLES]: page([taphole({ id: 1, season: 2026, azimuthDeg: 180, heightCm: 90 })]),
      [ADVICE]: treeAdvice({ profile }),
    });
    await openForm();
    await waitFor(() => expect(api.to(TAPHOLES).length).toBeGreaterThan(0));

    await user.type(screen.getByLabelText('Height'), '105.2');
    await user.selectOptions(screen.getByLabelText('Side'), 'S');

    const warning = await screen.findByText('Close to an earlier hole');
    expect(warning.parentElement!).toHaveTextContent(
      'at least 8 cm round the trunk and 15 cm up or down',
    );
  });

  it('shows the drilling caution beside the form, once', async () => {
    openTreeAs('tapper');
    await openForm();
    expect(
      screen.getAllByRole('complementary', { name: 'Before you drill or climb' }),
    ).toHaveLength(1);
  });

  it('lists the saved hole with its date and what the shavings showed', async () => {
    openTreeAs('tapper', 'metric', {
      [TAPHOLES]: page([taphole({ drilledOn: '2026-03-04', stainHit: true })]),
    });
    const table = await screen.findByRole('table', { name: 'Tapholes' });
    expect(within(table).getByText('Mar 4')).toBeInTheDocument();
    expect(within(table).getByText('Hit')).toBeInTheDocument();
  });
});

import { screen, waitFor, within } from '@testing-library/react';
import { vi } from 'vitest';
import type { Taphole } from '@shared/schemas/taphole';
import { SeasonPlanRoute } from '@/app/routes/season-plan';
import { registerFieldEntryDefaults } from '@/lib/field-entries';
import { planItem, standPlan, treeAdvice } from '@/test/advice-fixtures';
import { mockApi, type Handler } from '@/test/api-mock';
import { meAs, page, sugarbush, taphole } from '@/test/fixtures';
import { renderPage } from '@/test/render';

const PLAN = 'GET /api/sugarbushes/3/plan';

/** A phone held upright: every max-width query matches. */
function onAPhone() {
  vi.stubGlobal(
    'matchMedia',
    vi.fn((query: string) => ({
      matches: query.includes('max-width'),
      media: query,
      addEventListener: () => {},
      removeEventListener: () => {},
    })),
  );
}

const hazardous = planItem({
  treeId: 7,
  tag: '0412',
  hazards: [
    { noteId: 5, body: 'Dead limb over the lateral line.', createdAt: '2026-11-02T10:00:00Z' },
  ],
  placements: [
    { azimuthDeg: 200, heightCm: 110 },
    { azimuthDeg: 0, heightCm: 80 },
  ],
});
const resting = planItem({ treeId: 8, tag: '0413', verdict: 'rest', taps: 0, placements: [] });

function openPlan({
  role = 'tapper',
  unitSystem = 'metric',
  holes = [],
  routes = {},
}: {
  role?: 'tapper' | 'consultant';
  unitSystem?: 'metric' | 'imperial';
  holes?: Taphole[];
  routes?: Record<string, unknown>;
} = {}) {
  onAPhone();
  const recorded = [...holes];
  const api = mockApi({
    'GET /api/auth/me': meAs(role, unitSystem),
    'GET /api/sugarbushes/3': sugarbush(),
    [PLAN]: standPlan([hazardous, resting]),
    'GET /api/trees/7/advice': treeAdvice({ ...hazardous, season: 2027 }),
    'GET /api/trees/7/tapholes': () => ({ status: 200, body: page(recorded) }),
    'POST /api/trees/7/tapholes': ((req) => {
      const hole = taphole({ ...(req.body as Partial<Taphole>), id: 90 + recorded.length });
      recorded.push(hole);
      return { status: 201, body: hole };
    }) satisfies Handler,
    ...routes,
  });
  const view = renderPage({
    path: '/sugarbushes/:id/plan',
    url: '/sugarbushes/3/plan?season=2027',
    element: <SeasonPlanRoute />,
  });
  registerFieldEntryDefaults(view.queryClient);
  return { api, ...view };
}

const cardOf = async (tag: string) =>
  (await screen.findByRole('link', { name: `Tree ${tag}` })).closest('article')!;

describe('the season plan as cards on a phone', () => {
  it('asks for the walking order and shows each tree as a card: hazard first, then each tap’s side in words and degrees, height, bit and depth', async () => {
    const { api } = openPlan();
    const list = await screen.findByRole('list', { name: 'Trees in walking order' });
    expect(api.to(PLAN).at(-1)!.url.searchParams.get('sort')).toBe('walk');
    expect(screen.queryByRole('table', { name: 'Season plan' })).not.toBeInTheDocument();
    expect(within(list).getAllByRole('article')).toHaveLength(2);

    const card = await cardOf('0412');
    const hazard = within(card).getByRole('complementary', { name: 'Hazard at tree 0412' });
    const taps = within(card).getByRole('list', { name: 'Taps at 0412' });
    // The hazard is read before any drilling advice.
    expect(hazard.compareDocumentPosition(taps) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    expect(hazard).toHaveTextContent('Dead limb over the lateral line.');
    const [first, second] = within(taps).getAllByRole('listitem');
    expect(first).toHaveTextContent('South, 200°');
    expect(first).toHaveTextContent('1.10 m');
    expect(first).toHaveTextContent('7.9 mm bit, 5.1 cm deep with the bark');
    expect(second).toHaveTextContent('North, 0°');
    expect(within(card).getByText('Tap')).toBeInTheDocument();

    const rest = await cardOf('0413');
    expect(within(rest).queryByRole('list', { name: /Taps at/ })).not.toBeInTheDocument();
    expect(rest).toHaveTextContent('Rest this tree in 2027: drill no new holes.');
  });

  it('when the tapper starts from where they stand, then the walk is asked for from their position to about 10 m', async () => {
    vi.stubGlobal('navigator', {
      ...navigator,
      geolocation: {
        getCurrentPosition: (ok: (p: { coords: object }) => void) =>
          ok({ coords: { latitude: 45.123456, longitude: -72.987654, accuracy: 8 } }),
      },
    });
    const { api, user } = openPlan();
    await user.click(await screen.findByRole('button', { name: 'Start from where I stand' }));
    await waitFor(() =>
      expect(api.to(PLAN).at(-1)!.url.searchParams.get('fromLat')).toBe('45.1235'),
    );
    const params = api.to(PLAN).at(-1)!.url.searchParams;
    expect(params.get('fromLng')).toBe('-72.9877');
    expect(params.get('sort')).toBe('walk');
    expect(await screen.findByText(/nearest first from where you stood/)).toBeInTheDocument();
  });

  it('when a consultant opens a card, then the trunk is drawn but nothing can be recorded', async () => {
    const { user } = openPlan({ role: 'consultant', holes: [taphole({ season: 2024 })] });
    const card = await cardOf('0412');
    expect(within(card).queryByRole('button', { name: 'Record what was drilled' })).toBeNull();
    await user.click(within(card).getByRole('button', { name: 'Trunk and holes' }));
    expect(
      await within(card).findByRole('img', { name: /Trunk of tree 0412/ }),
    ).toBeInTheDocument();
  });
});

describe('recording what was drilled from a card', () => {
  const earlier = taphole({ id: 3, season: 2024, azimuthDeg: 200, heightCm: 110 });

  it('is filled in with the advised spot and drill, and warns before saving when the spot is 8 cm from the 2024 hole', async () => {
    const { api, user } = openPlan({ holes: [earlier] });
    const card = await cardOf('0412');
    await user.click(within(card).getByRole('button', { name: 'Record what was drilled' }));
    const form = await within(card).findByRole('region', {
      name: 'Record what was drilled at 0412',
    });
    expect(within(form).getByLabelText('Height (cm)')).toHaveValue('110');
    expect(within(form).getByLabelText('Side (degrees)')).toHaveValue('200');
    expect(within(form).getByLabelText('Depth (cm)')).toHaveValue('5.08');
    expect(within(form).getByLabelText('Bit')).toHaveValue('0.79375');
    expect(within(form).getByLabelText('Collection')).toHaveValue('vacuum');
    expect(within(form).getByLabelText('Season')).toHaveValue('2027');

    // The advised spot is the 2024 hole's own: the advisor objects at once.
    const status = within(form).getAllByRole('status')[0];
    expect(status).toHaveTextContent('from the 2024 hole');
    await user.clear(within(form).getByLabelText('Height (cm)'));
    await user.type(within(form).getByLabelText('Height (cm)'), '118');
    expect(status).toHaveTextContent(
      '8 cm from the 2024 hole: the guideline asks for 10 cm to the side or 30 cm above or below.',
    );
    expect(api.to('POST /api/trees/7/tapholes')).toHaveLength(0);

    await user.clear(within(form).getByLabelText('Side (degrees)'));
    await user.type(within(form).getByLabelText('Side (degrees)'), '20');
    expect(status).not.toHaveTextContent('from the 2024 hole');
    expect(within(form).getByText('north; 0° is north')).toBeInTheDocument();

    await user.click(within(form).getByRole('button', { name: 'Save drilled hole' }));
    await within(form).findByText('Saved: the 2027 hole, north at 1.18 m.');
    const [sent] = api.to('POST /api/trees/7/tapholes');
    expect(sent.body).toEqual({
      season: 2027,
      heightCm: 118,
      azimuthDeg: 20,
      depthCm: 5.08,
      bitCm: 0.79375,
      collection: 'vacuum',
      clientId: expect.stringMatching(/^[0-9a-f-]{36}$/),
    });
    const drilled = await within(card).findByRole('region', { name: 'Drilled in 2027' });
    expect(drilled).toHaveTextContent('north (20°) at 1.18 m');
  });

  it('when the hole would be one more than the advice gives the tree, then it says so before saving', async () => {
    const { user } = openPlan({
      holes: [
        taphole({ id: 4, season: 2027, azimuthDeg: 200, heightCm: 110 }),
        taphole({ id: 5, season: 2027, azimuthDeg: 0, heightCm: 80 }),
      ],
    });
    const card = await cardOf('0412');
    await user.click(within(card).getByRole('button', { name: 'Record what was drilled' }));
    const form = await within(card).findByRole('region', {
      name: 'Record what was drilled at 0412',
    });
    await user.clear(within(form).getByLabelText('Side (degrees)'));
    await user.type(within(form).getByLabelText('Side (degrees)'), '100');
    expect(within(form).getAllByRole('status')[0]).toHaveTextContent(
      'This would be hole 3 in 2027; the advice gives this tree 2 taps.',
    );
  });

  it('in inches, and when the server refuses a field, then its words land on that field', async () => {
    const { user } = openPlan({
      unitSystem: 'imperial',
      routes: {
        'POST /api/trees/7/tapholes': () => ({
          status: 400,
          body: {
            error: {
              code: 'invalid',
              message: 'Check the hole',
              fields: { heightCm: 'Height is above the tapping band of this stand' },
            },
          },
        }),
      },
    });
    const card = await cardOf('0412');
    await user.click(within(card).getByRole('button', { name: 'Record what was drilled' }));
    const form = await within(card).findByRole('region', {
      name: 'Record what was drilled at 0412',
    });
    expect(within(form).getByLabelText('Height (in)')).toHaveValue('43');
    expect(within(form).getByLabelText('Depth (in)')).toHaveValue('2');
    await user.click(within(form).getByRole('button', { name: 'Save drilled hole' }));
    expect(
      await within(form).findByText('Height is above the tapping band of this stand'),
    ).toBeInTheDocument();
    expect(within(form).getByLabelText('Height (in)')).toHaveAttribute('aria-invalid', 'true');
  });

  it('when a typed figure is not one the schema takes, then the field says what it asks for and nothing is sent', async () => {
    const { api, user } = openPlan();
    const card = await cardOf('0412');
    await user.click(within(card).getByRole('button', { name: 'Record what was drilled' }));
    const form = await within(card).findByRole('region', {
      name: 'Record what was drilled at 0412',
    });
    await user.clear(within(form).getByLabelText('Side (degrees)'));
    await user.type(within(form).getByLabelText('Side (degrees)'), '400');
    await user.click(within(form).getByRole('button', { name: 'Save drilled hole' }));
    expect(
      await within(form).findByText('Enter the side in degrees: 0 is north, 90 east, up to 359'),
    ).toBeInTheDocument();
    expect(api.to('POST /api/trees/7/tapholes')).toHaveLength(0);
  });
});

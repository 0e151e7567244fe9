import { screen, waitFor } from '@testing-library/react';
import { resolveProfile } from '@shared/rules/index';
import type { MeasurementInput } from '@shared/schemas/measurement';
import type { RoundColumns, TreeRecordAnswer } from '@shared/schemas/round';
import { MeasuringRoundRoute } from '@/app/routes/measuring-round';
import { registerFieldEntryDefaults } from '@/lib/field-entries';
import { mockApi, type Handler } from '@/test/api-mock';
import { SUGARBUSH_ID, measurement, meAs, sugarbush } from '@/test/fixtures';
import { renderPage } from '@/test/render';

const season = new Date().getUTCFullYear();

// Three trees in a line running north; A-1 is already measured this season.
const round: RoundColumns = {
  season,
  adviceSeason: season + 1,
  count: 4,
  ids: [1, 2, 3, 4],
  tags: ['A-1', 'A-2', 'A-3', 'A-4'],
  lat: [44.0, 44.0003, 44.0001, 44.0002],
  lng: [-72, -72, -72, -72],
  status: ['active', 'active', 'active', 'held-out'],
  latestDbhCm: [40, 30, 35, 50],
  latestMeasuredOn: [`${season}-04-01`, `${season - 1}-10-01`, `${season - 1}-10-01`, null],
  measured: [1, 0, 0, 0],
  guideline: { profile: resolveProfile('conservative'), sunnyAzimuthDeg: 180 },
};

const record = (id: number, tag: string, dbhCm: number): TreeRecordAnswer => ({
  id,
  tag,
  sugarbushId: SUGARBUSH_ID,
  species: 'sugar-maple',
  status: 'active',
  measurements: [
    { measuredOn: `${season - 2}-10-01`, dbhCm: dbhCm - 0.5 },
    { measuredOn: `${season - 1}-10-01`, dbhCm },
  ],
  tapholes: [],
});

function openRound(post: Handler) {
  const api = mockApi({
    'GET /api/auth/me': meAs('forester'),
    [`GET /api/sugarbushes/${SUGARBUSH_ID}`]: sugarbush(),
    [`GET /api/sugarbushes/${SUGARBUSH_ID}/round`]: round,
    'GET /api/trees/2/record': record(2, 'A-2', 30),
    'GET /api/trees/3/record': record(3, 'A-3', 35),
    'GET /api/trees/4/record': record(4, 'A-4', 50),
    'POST /api/trees/3/measurements': post,
    'POST /api/trees/4/measurements': post,
  });
  const view = renderPage({
    path: '/sugarbushes/:id/round',
    url: `/sugarbushes/${SUGARBUSH_ID}/round?from=1`,
    element: <MeasuringRoundRoute />,
  });
  registerFieldEntryDefaults(view.queryClient);
  return { api, ...view };
}

const stored: Handler = (req) => ({
  status: 201,
  body: measurement({ id: 99, ...(req.body as MeasurementInput) }),
});

describe('the measuring round', () => {
  it('when the forester starts at A-1, then the nearest unmeasured tree comes first, with the progress of the season', async () => {
    openRound(stored);
    expect(await screen.findByRole('heading', { name: 'Tree A-3' })).toBeInTheDocument();
    expect(screen.getByText(`1 of 4 measured in ${season}`)).toBeInTheDocument();
    expect(screen.getByText('3 to go')).toBeInTheDocument();
    expect(screen.getByText(/A-4 · A-2/)).toBeInTheDocument();
  });

  it('when a circumference is typed in inches, then the DBH shows in both units, the advice follows, and recording sends it with a client id', async () => {
    const { api, user } = openRound(stored);
    await screen.findByRole('heading', { name: 'Tree A-3' });
    await user.click(screen.getByLabelText('Circumference'));
    await user.selectOptions(screen.getByLabelText('Unit', { exact: true }), 'in');
    await user.type(
      screen.getByLabelText('Circumference', { selector: 'input[type=text]' }),
      '43.5',
    );
    // 43.5 in round is 13.85 in (35.17 cm) across.
    expect(await screen.findByText('DBH 13.8 in = 35.2 cm')).toBeInTheDocument();
    expect(await screen.findByText(`Advice with this reading · ${season + 1}`)).toBeInTheDocument();
    await user.selectOptions(screen.getByLabelText('Crown dieback'), '10');
    await user.click(screen.getByRole('button', { name: 'Record and next tree' }));
    await waitFor(() => expect(api.to('POST /api/trees/3/measurements')).toHaveLength(1));
    const body = api.to('POST /api/trees/3/measurements')[0].body as MeasurementInput;
    expect(body.dbhCm).toBeCloseTo(35.17, 2);
    expect(body.crownDiebackPct).toBe(10);
    expect(body.clientId).toMatch(/^[0-9a-f-]{36}$/);
    expect(await screen.findByRole('heading', { name: 'Tree A-4' })).toBeInTheDocument();
    expect(screen.getByText(`2 of 4 measured in ${season}`)).toBeInTheDocument();
  });

  it('when a DBH far from the trend is typed, then nothing is sent until the forester confirms it', async () => {
    const { api, user } = openRound(stored);
    await screen.findByRole('heading', { name: 'Tree A-3' });
    await user.selectOptions(screen.getByLabelText('Unit', { exact: true }), 'cm');
    await user.type(screen.getByLabelText('DBH'), '41');
    expect(await screen.findByRole('group', { name: 'Confirm the reading' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Record and next tree' }));
    expect(api.to('POST /api/trees/3/measurements')).toHaveLength(0);
    await user.click(screen.getByLabelText('I measured again: this reading is right'));
    await user.click(screen.getByRole('button', { name: 'Record and next tree' }));
    await waitFor(() => expect(api.to('POST /api/trees/3/measurements')).toHaveLength(1));
    expect(
      (api.to('POST /api/trees/3/measurements')[0].body as MeasurementInput).confirmedOutlier,
    ).toBe(true);
  });

  it('when a tree is skipped, then it waits at the end of the route and can be measured from there', async () => {
    const { user } = openRound(stored);
    await screen.findByRole('heading', { name: 'Tree A-3' });
    await user.click(screen.getByRole('button', { name: 'Skip this tree for now' }));
    expect(await screen.findByRole('heading', { name: 'Tree A-4' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Measure A-3' }));
    expect(await screen.findByRole('heading', { name: 'Tree A-3' })).toBeInTheDocument();
  });
});

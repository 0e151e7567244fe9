import { screen, waitFor, within } from '@testing-library/react';
import { upcomingSeason } from '@shared/schemas/plan';
import { SeasonPlanRoute } from '@/app/routes/season-plan';
import { planItem, standPlan } from '@/test/advice-fixtures';
import { json, mockApi, type Handler } from '@/test/api-mock';
import { meAs, sugarbush } from '@/test/fixtures';
import { renderPage } from '@/test/render';

const PLAN = 'GET /api/sugarbushes/3/plan';

const items = [
  planItem({ treeId: 7, tag: '0412' }),
  planItem({
    treeId: 8,
    tag: '0413',
    verdict: 'rest',
    taps: 0,
    placements: [],
    conductiveShare: 0.78,
    warnings: [
      { code: 'zone-depleted', message: 'Only 78 % clear.' },
      { code: 'too-close', message: 'No spot left.' },
      { code: 'too-close', message: 'Crowded in 2026.' },
    ],
  }),
];

const plan: Handler = (req) => {
  const verdict = req.url.searchParams.get('verdict');
  const rows = verdict ? items.filter((i) => i.verdict === verdict) : items;
  return { status: 200, body: standPlan(rows, { total: verdict ? rows.length : 1187 }) };
};

function openPlan(
  routes: Record<string, unknown> = {},
  unitSystem: 'imperial' | 'metric' = 'metric',
  url = '/sugarbushes/3/plan',
) {
  const api = mockApi({
    'GET /api/auth/me': meAs('tapper', unitSystem),
    'GET /api/sugarbushes/3': sugarbush(),
    [PLAN]: plan,
    ...routes,
  });
  const view = renderPage({ path: '/sugarbushes/:id/plan', url, element: <SeasonPlanRoute /> });
  return { api, ...view };
}

const lastPlanRequest = (api: ReturnType<typeof mockApi>) => api.to(PLAN).at(-1)!.url.searchParams;

describe('the season plan', () => {
  it('asks for the upcoming season in pages of 50 and shows each tree with its verdict letter, taps, sides and warnings', async () => {
    const { api } = openPlan();
    const table = await screen.findByRole('table', { name: 'Season plan' });
    expect(lastPlanRequest(api).get('pageSize')).toBe('50');
    expect(lastPlanRequest(api).get('season')).toBe(String(upcomingSeason()));

    const [, first, second] = within(table).getAllByRole('row');
    expect(within(first).getByRole('link', { name: '0412' })).toHaveAttribute('href', '/trees/7');
    expect(within(first).getByText('T')).toBeInTheDocument();
    expect(within(first).getByText('Tap')).toBeInTheDocument();
    expect(within(first).getByText('S 1.10 m · N 0.80 m')).toBeInTheDocument();
    expect(within(first).getByText('94 %')).toBeInTheDocument();
    expect(within(second).getByText('R')).toBeInTheDocument();
    expect(within(second).getByText('Little clear wood left')).toBeInTheDocument();
    // Two warnings of one kind make one chip.
    expect(within(second).getAllByText('Holes too close')).toHaveLength(1);
    expect(screen.getByText('1–50 of 1,187')).toBeInTheDocument();
  });

  it('when a tree has an open hazard note, then its text shows on the tree’s row ahead of where to drill', async () => {
    const hazardous = planItem({
      treeId: 9,
      tag: '0414',
      hazards: [
        { noteId: 3, body: 'Hornets in the crotch at 2 m.', createdAt: '2026-10-12T14:10:00Z' },
      ],
    });
    openPlan({
      [PLAN]: () => ({ status: 200, body: standPlan([items[0], hazardous]) }),
    });
    const table = await screen.findByRole('table', { name: 'Season plan' });
    const hazard = within(table).getByRole('complementary', { name: 'Hazard at tree 0414' });
    expect(hazard).toHaveTextContent('Hornets in the crotch at 2 m.');
    const row = within(table).getByRole('link', { name: '0414' }).closest('tr')!;
    expect(within(row).getByText('Hazard')).toBeInTheDocument();
    const where = within(row).getByText('S 1.10 m · N 0.80 m');
    expect(hazard.compareDocumentPosition(where) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    // The tree without one has no notice.
    expect(within(table).queryByRole('complementary', { name: 'Hazard at tree 0412' })).toBeNull();
  });

  // Quebec: tap once a year between 1 January and 30 April; spouts out by 1 June
  // (A-18.1 r.8.1 s.24 — P).
  it('under a guideline with rules for the season, shows them with the plan and the notice of a changed rule', async () => {
    const quebec = {
      ...standPlan(items).profile,
      key: 'quebec-public',
      seasonRules: [
        {
          text: 'Tap once a year, only between 1 January and 30 April.',
          source: 'A-18.1 r.8.1 s.24',
        },
        { text: 'Pull every spout by 1 June at the latest.', source: 'A-18.1 r.8.1 s.24' },
      ],
      notice: 'This stand followed Quebec’s 2004 public-land table, replaced on 2018-08-16.',
    };
    openPlan({ [PLAN]: json(200, standPlan(items, { profile: quebec })) });
    const rules = await screen.findByRole('list', { name: 'Rules for the season' });
    expect(within(rules).getByText(/1 January and 30 April/)).toBeInTheDocument();
    expect(within(rules).getByText(/by 1 June/)).toBeInTheDocument();
    expect(screen.getByRole('complementary', { name: 'Guideline changed' })).toHaveTextContent(
      'replaced on 2018-08-16',
    );
  });

  it('shows the whole stand in figures in the totals', async () => {
    openPlan();
    const totals = await screen.findByRole('region', { name: 'Plan totals' });
    const figure = (label: string) =>
      within(totals).getByText(label).closest('div')!.querySelector('dd')!.textContent;
    expect(figure('Trees to tap')).toBe('993');
    expect(figure('Taps')).toBe('1,497');
    expect(figure('Measure first')).toBe('3');
  });

  it('when the user picks a verdict, then it is kept in the URL and sent as verdict=', async () => {
    const { api, router, user } = openPlan();
    await screen.findByRole('table', { name: 'Season plan' });

    await user.selectOptions(screen.getByLabelText('Verdict'), 'rest');
    await waitFor(() => expect(lastPlanRequest(api).get('verdict')).toBe('rest'));
    expect(new URLSearchParams(router.state.location.search).get('verdict')).toBe('rest');
    await waitFor(() => expect(screen.queryByRole('link', { name: '0412' })).toBeNull());
    expect(screen.getByRole('link', { name: '0413' })).toBeInTheDocument();
  });

  it('when the user sorts by taps twice, then the sort goes from taps to -taps in the URL and the request', async () => {
    const { api, router, user } = openPlan();
    const table = await screen.findByRole('table', { name: 'Season plan' });
    const taps = within(table).getByRole('columnheader', { name: /Taps/ });
    expect(taps).toHaveAttribute('aria-sort', 'none');

    await user.click(within(taps).getByRole('button'));
    await waitFor(() => expect(lastPlanRequest(api).get('sort')).toBe('taps'));
    await waitFor(() => expect(taps).toHaveAttribute('aria-sort', 'ascending'));

    await user.click(within(taps).getByRole('button'));
    await waitFor(() => expect(lastPlanRequest(api).get('sort')).toBe('-taps'));
    expect(new URLSearchParams(router.state.location.search).get('sort')).toBe('-taps');
    await waitFor(() => expect(taps).toHaveAttribute('aria-sort', 'descending'));
  });

  it('when the user picks a warning in the summary, then only trees with it are asked for, and a second click clears it', async () => {
    const { api, router, user } = openPlan();
    const summary = await screen.findByRole('region', { name: 'Warnings in this plan' });
    const small = within(summary).getByRole('button', { name: /Too small/ });
    expect(small).toHaveTextContent('167');

    await user.click(small);
    await waitFor(() => expect(lastPlanRequest(api).get('warning')).toBe('undersized'));
    expect(new URLSearchParams(router.state.location.search).get('warning')).toBe('undersized');
    expect(small).toHaveAttribute('aria-pressed', 'true');
    expect(screen.getByLabelText('Warning')).toHaveValue('undersized');

    await user.click(small);
    await waitFor(() => expect(lastPlanRequest(api).has('warning')).toBe(false));
  });

  it('when the URL names a season and filters, then they are sent and the tag links carry the season', async () => {
    const { api } = openPlan({}, 'imperial', '/sugarbushes/3/plan?season=2025&q=04&sort=-share');
    await screen.findByRole('table', { name: 'Season plan' });
    expect(Object.fromEntries(lastPlanRequest(api))).toMatchObject({
      season: '2025',
      q: '04',
      sort: '-share',
    });
    expect(screen.getByRole('heading', { name: 'Season plan 2025' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: '0412' })).toHaveAttribute(
      'href',
      '/trees/7?season=2025',
    );
    expect(await screen.findByText('S 3 ft 7 in · N 2 ft 7 in')).toBeInTheDocument();
  });

  it('when a search matches nothing, then it says so and offers to clear it', async () => {
    openPlan({ [PLAN]: standPlan([], { total: 0 }) }, 'metric', '/sugarbushes/3/plan?q=zzz');
    expect(await screen.findByText("No trees match 'zzz'")).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Clear search and filters' })).toBeInTheDocument();
  });

  it('when the plan fails to load, then Retry asks again', async () => {
    let calls = 0;
    const { user } = openPlan({
      [PLAN]: ((req) =>
        ++calls === 1
          ? json(500, { error: { code: 'internal', message: 'Something went wrong' } })(req)
          : plan(req)) satisfies Handler,
    });
    expect(await screen.findByText(/We couldn't load the plan for/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByRole('table', { name: 'Season plan' })).toBeInTheDocument();
  });

  it('when opened from a clear-wood band of the overview, then the plan asks for that band and shows it chosen', async () => {
    const { api, user } = openPlan({}, 'metric', '/sugarbushes/3/plan?season=2026&share=80-85');
    await screen.findByRole('table', { name: 'Season plan' });
    expect(lastPlanRequest(api).get('share')).toBe('80-85');
    expect(lastPlanRequest(api).get('season')).toBe('2026');
    expect(screen.getByLabelText('Clear wood')).toHaveValue('80-85');
    await user.selectOptions(screen.getByLabelText('Clear wood'), '');
    await waitFor(() => expect(lastPlanRequest(api).get('share')).toBeNull());
  });

  it('leads to the field sheet of every tree through the plan’s filters, not its page', async () => {
    openPlan({}, 'metric', '/sugarbushes/3/plan?season=2026&verdict=rest&page=3');
    await screen.findByRole('table', { name: 'Season plan' });
    expect(screen.getByRole('link', { name: 'Print field sheet' })).toHaveAttribute(
      'href',
      '/sugarbushes/3/plan/field-sheet?season=2026&verdict=rest',
    );
  });
});

describe('while the stand is re-advised', () => {
  it('when the plan is still on its way and the advice is updating, then the page says how far it has come', async () => {
    const season = upcomingSeason();
    let answerPlan: (reply: { status: number; body: unknown }) => void = () => undefined;
    const { api } = openPlan({
      [PLAN]: () =>
        new Promise<{ status: number; body: unknown }>((resolve) => (answerPlan = resolve)),
      'GET /api/sugarbushes/3/advice-status': { season, state: 'updating', done: 420, total: 1187 },
    });
    expect(
      await screen.findByText(`Updating the advice for ${season}: 420 of 1,187 trees`),
    ).toBeInTheDocument();
    expect(screen.getByRole('progressbar', { name: 'Advice updated so far' })).toHaveAttribute(
      'value',
      '420',
    );
    answerPlan({ status: 200, body: standPlan(items, { total: 2 }) });
    await screen.findByRole('table', { name: 'Season plan' });
    expect(screen.queryByText(/Updating the advice/)).not.toBeInTheDocument();
    expect(api.to('GET /api/sugarbushes/3/advice-status').length).toBeGreaterThan(0);
  });
});

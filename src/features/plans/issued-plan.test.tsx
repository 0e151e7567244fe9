import { screen, waitFor, within } from '@testing-library/react';
import type {
  IssuedPlanHeader,
  IssuedPlanResponse,
  PlanChange,
  SeasonProgress,
} from '@shared/schemas/issued-plan';
import { SeasonPlanRoute } from '@/app/routes/season-plan';
import { planItem, planTotals, standPlan } from '@/test/advice-fixtures';
import { json, mockApi } from '@/test/api-mock';
import { meAs, sugarbush } from '@/test/fixtures';
import { renderPage } from '@/test/render';

const ISSUED = 'GET /api/sugarbushes/3/issued-plans/2026';
const ISSUE = 'POST /api/sugarbushes/3/issued-plans';
const PROGRESS = 'GET /api/sugarbushes/3/plan/progress';

const header = (version: number): IssuedPlanHeader => ({
  id: 10 + version,
  season: 2026,
  version,
  issuedAt: '2026-02-20T15:04:00.000Z',
  issuedBy: { id: 1, name: 'Ada Fernwood' },
  profile: {
    key: 'conservative',
    label: 'Conservative',
    source: 'Common practice',
    adviceVersion: 1,
  },
  totals: planTotals({ taps: 610, treesToTap: 402 }),
});

const moved: PlanChange = {
  treeId: 7,
  tag: '0412',
  kinds: ['placements'],
  issued: { verdict: 'tap', taps: 1, placements: [{ azimuthDeg: 180, heightCm: 110 }] },
  current: { verdict: 'tap', taps: 1, placements: [{ azimuthDeg: 0, heightCm: 80 }] },
};
const retired: PlanChange = {
  treeId: 8,
  tag: '0413',
  kinds: ['removed', 'verdict'],
  issued: { verdict: 'tap', taps: 2, placements: [] },
  current: { verdict: 'retired', taps: 0, placements: [] },
};

const issuedPlan = (version: number, changes: PlanChange[], total = changes.length) =>
  ({
    plan: header(version),
    latestVersion: version,
    items: { items: [], total: 1187, page: 1, pageSize: 1 },
    changes: {
      items: changes,
      total,
      page: 1,
      pageSize: 25,
      byKind: { added: 0, removed: 1, taps: 0, placements: 1, verdict: 1 },
    },
  }) satisfies IssuedPlanResponse;

const progress: SeasonProgress = {
  season: 2026,
  plannedFrom: 'issued',
  issuedVersion: 1,
  plannedTaps: 610,
  drilledTaps: 152,
  treesToTap: 402,
  treesDone: 97,
};

function open(role: 'owner' | 'tapper', routes: Record<string, unknown>) {
  const api = mockApi({
    'GET /api/auth/me': meAs(role, 'metric'),
    'GET /api/sugarbushes/3': sugarbush(),
    'GET /api/sugarbushes/3/plan': standPlan([planItem({ treeId: 7, tag: '0412' })]),
    [PROGRESS]: progress,
    ...routes,
  });
  const view = renderPage({
    path: '/sugarbushes/:id/plan',
    url: '/sugarbushes/3/plan?season=2026',
    element: <SeasonPlanRoute />,
  });
  return { api, ...view };
}

describe('the crew’s copy on the plan page', () => {
  it('when the plan was issued, then a tapper reads when, by whom and which version, and tree by tree what changed since, without an issue button', async () => {
    open('tapper', { [ISSUED]: issuedPlan(1, [moved, retired]) });
    const panel = await screen.findByRole('region', { name: 'The crew’s copy' });
    expect(
      await within(panel).findByText(
        /Issued to the crew on Feb 20, 2026 by Ada Fernwood — version 1/,
      ),
    ).toBeInTheDocument();
    const table = within(panel).getByRole('table', { name: 'Changes since it was issued' });
    const [, first, second] = within(table).getAllByRole('row');
    expect(within(first).getByRole('link', { name: '0412' })).toHaveAttribute(
      'href',
      '/trees/7?season=2026',
    );
    expect(within(first).getByText('Holes moved')).toBeInTheDocument();
    expect(within(first).getByText('Tap · 1 tap: S 1.10 m')).toBeInTheDocument();
    expect(within(first).getByText('Tap · 1 tap: N 0.80 m')).toBeInTheDocument();
    expect(
      within(second).getByText('No longer in the plan (out of production); Other verdict'),
    ).toBeInTheDocument();
    expect(within(panel).queryByRole('button', { name: /Issue/ })).not.toBeInTheDocument();
  });

  it('when the season’s progress loads, then the page says it in words beside the bar', async () => {
    open('tapper', { [ISSUED]: issuedPlan(1, []) });
    expect(
      await screen.findByText('152 of 610 taps drilled (25 %); 97 of 402 trees done.'),
    ).toBeInTheDocument();
    expect(screen.getByRole('progressbar', { name: 'Taps drilled so far' })).toHaveAttribute(
      'value',
      '152',
    );
    expect(screen.getByText('Planned as issued to the crew (version 1).')).toBeInTheDocument();
    expect(await screen.findByText(/Nothing has changed since it was issued/)).toBeInTheDocument();
  });

  it('when nothing was issued, then the owner confirms what issuing does, issues version 1, and the page shows it', async () => {
    let issued = false;
    const { api, user } = open('owner', {
      [ISSUED]: () =>
        issued
          ? { status: 200, body: issuedPlan(1, []) }
          : { status: 404, body: { error: { code: 'not-found', message: 'No plan' } } },
      [ISSUE]: () => {
        issued = true;
        return { status: 201, body: header(1) };
      },
    });
    expect(await screen.findByText(/Not issued yet/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Issue this plan to the crew' }));
    const confirm = screen.getByRole('group', {
      name: 'Issue the 2026 plan to the crew as version 1?',
    });
    expect(within(confirm).getByText(/never change it/)).toBeInTheDocument();
    expect(api.to(ISSUE)).toHaveLength(0);
    await user.click(within(confirm).getByRole('button', { name: 'Issue version 1' }));
    await waitFor(() => expect(api.to(ISSUE)).toHaveLength(1));
    expect(api.to(ISSUE)[0].body).toEqual({ season: 2026 });
    expect(await screen.findByText(/by Ada Fernwood — version 1/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Issue again' })).toBeInTheDocument();
  });

  it('when issuing fails, then the confirmation stays open with the reason', async () => {
    const { user } = open('owner', {
      [ISSUED]: issuedPlan(2, []),
      [ISSUE]: json(503, { error: { code: 'advice-busy', message: 'The stand keeps changing' } }),
    });
    await user.click(await screen.findByRole('button', { name: 'Issue again' }));
    await user.click(screen.getByRole('button', { name: 'Issue version 3' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'The plan was not issued: The stand keeps changing',
    );
    expect(screen.getByRole('button', { name: 'Cancel' })).toBeInTheDocument();
  });

  it('when there are more changes than a page, then the next page is asked for', async () => {
    const { api, user } = open('tapper', { [ISSUED]: issuedPlan(1, [moved], 60) });
    await screen.findByRole('table', { name: 'Changes since it was issued' });
    await user.click(
      within(screen.getByRole('navigation', { name: 'Pages of changes' })).getByRole('button', {
        name: 'Next',
      }),
    );
    await waitFor(() =>
      expect(api.to(ISSUED).at(-1)!.url.searchParams.get('changesPage')).toBe('2'),
    );
  });

  it('when the issued plan cannot be read, then the panel says so and offers a retry', async () => {
    open('tapper', { [ISSUED]: json(500, { error: { code: 'internal', message: 'Boom' } }) });
    expect(await screen.findByText("We couldn't load the issued plan.")).toBeInTheDocument();
    expect(screen.getAllByRole('button', { name: 'Retry' }).length).toBeGreaterThan(0);
  });
});

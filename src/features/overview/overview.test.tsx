import { screen, waitFor, within } from '@testing-library/react';
import type { Role } from '@shared/schemas/enums';
import { OverviewRoute } from '@/app/routes/overview';
import { json, mockApi, type Handler } from '@/test/api-mock';
import { meAs, sugarbush } from '@/test/fixtures';
import {
  auditItem,
  auditPage,
  complianceItem,
  complianceReport,
  complianceTotals,
  trendsResponse,
} from '@/test/overview-fixtures';
import { renderPage } from '@/test/render';

const TRENDS = 'GET /api/sugarbushes/3/trends';
const COMPLIANCE = 'GET /api/sugarbushes/3/compliance';
const AUDIT = 'GET /api/sugarbushes/3/audit';

function openOverview({
  role = 'owner',
  unitSystem = 'imperial',
  url = '/sugarbushes/3/overview',
  routes = {},
}: {
  role?: Role;
  unitSystem?: 'imperial' | 'metric';
  url?: string;
  routes?: Record<string, unknown>;
} = {}) {
  const api = mockApi({
    'GET /api/auth/me': meAs(role, unitSystem),
    'GET /api/sugarbushes/3': sugarbush({ role }),
    [TRENDS]: trendsResponse(),
    [COMPLIANCE]: complianceReport(),
    [AUDIT]: auditPage([auditItem()]),
    ...routes,
  });
  const view = renderPage({ path: '/sugarbushes/:id/overview', url, element: <OverviewRoute /> });
  return { api, ...view };
}

const lastRequest = (api: ReturnType<typeof mockApi>, key: string) =>
  api.to(key).at(-1)!.url.searchParams;

/** A trend's section by its title. */
const trend = async (title: string) =>
  (await screen.findByRole('heading', { name: title, level: 3 })).closest('section')!;

describe('the overview’s trends', () => {
  it('reads basal area in one sentence in the user’s units, and lists it season by season with links to the plan', async () => {
    openOverview();
    const section = await trend('Basal area per acre');
    expect(
      within(section).getByRole('img', {
        name: 'Basal area per acre rose from 86 to 92 ft² since 2024',
      }),
    ).toBeInTheDocument();
    expect(within(section).getByText('Basal area per acre rose from 86 to 92 ft² since 2024.'));
    const table = within(section).getByRole('table', { name: 'Basal area per acre by season' });
    const rows = within(table).getAllByRole('row');
    expect(rows.map((r) => r.textContent)).toEqual([
      'Seasonft² per acreLiving trees with a DBH',
      '202486990',
      '202589990',
      '202692990',
      '2027 (planned)92990',
    ]);
    expect(within(rows[1]).getByRole('link', { name: '86' })).toHaveAttribute(
      'href',
      '/sugarbushes/3/plan?season=2024&sort=-dbh',
    );
  });

  it('in metric, says the same per hectare in m²', async () => {
    openOverview({ unitSystem: 'metric' });
    const section = await trend('Basal area per hectare');
    expect(
      within(section).getByText('Basal area per hectare rose from 19.7 to 21.1 m² since 2024.'),
    ).toBeInTheDocument();
  });

  it('without a boundary, asks for one instead of giving per-acre figures', async () => {
    const noBoundary = trendsResponse({ boundary: false, areaAcres: null, areaHa: null });
    for (const i of noBoundary.items) {
      i.basalAreaFt2PerAcre = null;
      i.tapsSetPerAcre = null;
    }
    openOverview({ routes: { [TRENDS]: noBoundary } });
    const section = await trend('Basal area per acre');
    expect(within(section).getByRole('img')).toHaveAccessibleName(
      'Draw the stand’s boundary on the map to see basal area per acre',
    );
  });

  it('sets the taps of each season against the advice, linking each season to its compliance report', async () => {
    openOverview();
    const section = await trend('Taps set against the advice');
    expect(
      within(section).getByText(
        'In 2026, 1,300 taps were set against 1,280 the advice allowed; 15 trees carried more than advised; for 2027 the advice allows 1,310.',
      ),
    ).toBeInTheDocument();
    const table = within(section).getByRole('table', { name: 'Taps set and advised by season' });
    expect(within(table).getByRole('link', { name: '1,300' })).toHaveAttribute(
      'href',
      '/sugarbushes/3/overview?season=2026#compliance',
    );
    expect(within(table).getByRole('link', { name: '1,310' })).toHaveAttribute(
      'href',
      '/sugarbushes/3/plan?season=2027&sort=-taps',
    );
  });

  it('reads growth, warnings, clear wood and crowns each in a sentence, their tables linking to the trees behind each figure', async () => {
    openOverview();
    expect(
      within(await trend('Basal-area growth a year')).getByText(
        'Median basal-area growth was lowest in 2025 (3.0 in² a year) and highest in 2024 (4.7 in²).',
      ),
    ).toBeInTheDocument();
    const warnings = await trend('Trees with each warning');
    expect(
      within(warnings).getByText(
        'In 2027 the most common warning is Slow growth, on 12 % of trees.',
      ),
    ).toBeInTheDocument();
    expect(within(warnings).getByRole('link', { name: '120 (12 %)' })).toHaveAttribute(
      'href',
      '/sugarbushes/3/plan?season=2027&warning=slow-growth',
    );
    const share = await trend('Clear wood in the tapping zone');
    expect(
      within(share).getByText(
        'Trees with under 90 % clear wood were 2.4 % of those big enough to tap in 2024, 2.4 % in 2027.',
      ),
    ).toBeInTheDocument();
    expect(within(share).getAllByRole('link', { name: '8 (1 %)' })[2]).toHaveAttribute(
      'href',
      '/sugarbushes/3/plan?season=2026&share=80-85',
    );
    const crown = await trend('Crown dieback');
    expect(
      within(crown).getByText(
        'Crowns rated over 15 % dieback went from 2.0 % in 2024 to 2.0 % in 2026.',
      ),
    ).toBeInTheDocument();
    const crownTable = within(crown).getByRole('table', {
      name: 'Crown dieback classes by season',
    });
    // The planned season has no ratings: it is not a row.
    expect(within(crownTable).queryByText('2027 (planned)')).toBeNull();
    expect(within(crownTable).getAllByRole('link', { name: '20' }).at(-1)).toHaveAttribute(
      'href',
      '/sugarbushes/3/trees?dieback=20&diebackSeason=2026',
    );
    const status = await trend('Trees by status');
    expect(within(status).getAllByRole('link', { name: '4' })[0]).toHaveAttribute(
      'href',
      '/sugarbushes/3/trees?status=held-out',
    );
  });

  it('when the trends fail to load, then it says so and retries on request', async () => {
    let calls = 0;
    const { user } = openOverview({
      routes: {
        [TRENDS]: () =>
          ++calls === 1
            ? { status: 500, body: { error: { code: 'x', message: 'Broken' } } }
            : { status: 200, body: trendsResponse() },
      },
    });
    const alert = await screen.findByText("We couldn't load the stand's trends.");
    await user.click(
      within(alert.closest('[role="alert"]')!).getByRole('button', { name: 'Retry' }),
    );
    expect(await trend('Basal area per acre')).toBeInTheDocument();
  });
});

describe('the compliance report on the overview', () => {
  it('asks for the latest tapped season under the stand’s guideline and reads it in a sentence with its totals', async () => {
    const { api } = openOverview();
    expect(
      await screen.findByText(
        'In 2026, 820 trees were tapped with 1,300 taps; at the DBH measured before the season the guideline allowed them 1,290, and 15 trees have a finding.',
      ),
    ).toBeInTheDocument();
    const params = lastRequest(api, COMPLIANCE);
    expect(params.get('season')).toBe('2026');
    expect(params.get('profile')).toBeNull();
    const totals = screen.getByRole('table', { name: 'Compliance totals' });
    expect(within(totals).getByRole('row', { name: /Taps over/ })).toHaveTextContent('14');
    const trees = screen.getByRole('table', { name: 'Tapped trees against the guideline' });
    const [, first, second] = within(trees).getAllByRole('row');
    expect(within(first).getByRole('link', { name: '0064' })).toHaveAttribute('href', '/trees/64');
    expect(first).toHaveTextContent('22.6 in');
    expect(first).toHaveTextContent('More taps than allowed');
    expect(second).toHaveTextContent('Tapped while declining');
    expect(screen.getByRole('link', { name: 'Download CSV' })).toHaveAttribute(
      'href',
      '/api/sugarbushes/3/compliance.csv?sort=tag&season=2026',
    );
  });

  it('when the user picks a finding and a second guideline, then both go to the URL, the request and the CSV link', async () => {
    const { api, router, user } = openOverview({
      routes: {
        [COMPLIANCE]: ((req) => {
          const compare = req.url.searchParams.get('compare');
          return {
            status: 200,
            body: compare
              ? complianceReport({
                  compare: {
                    ...complianceReport().profile,
                    key: 'traditional',
                    label: 'Traditional (one tap from 10 in)',
                    source: 'NAMSPM traditional set, same summary',
                    spacingSource: 'Ohio State',
                  },
                  compareTotals: complianceTotals({ tapsAllowed: 1900 }),
                  treesChanged: 512,
                  items: [
                    complianceItem({
                      compare: {
                        tapsAllowed: 3,
                        tapsOver: 0,
                        holesTooClose: 3,
                        findings: ['too-close'],
                      },
                    }),
                  ],
                  total: 1,
                })
              : complianceReport(),
          };
        }) satisfies Handler,
      },
    });
    await screen.findByRole('table', { name: 'Tapped trees against the guideline' });
    await user.selectOptions(screen.getByLabelText('Finding'), 'over');
    await waitFor(() => expect(lastRequest(api, COMPLIANCE).get('finding')).toBe('over'));
    await user.selectOptions(screen.getByLabelText('Beside it'), 'traditional');
    await waitFor(() => expect(lastRequest(api, COMPLIANCE).get('compare')).toBe('traditional'));
    const search = new URLSearchParams(router.state.location.search);
    expect([search.get('finding'), search.get('compare')]).toEqual(['over', 'traditional']);
    expect(
      await screen.findByText(
        'Under Traditional (one tap from 10 in), 512 of the tapped trees read differently.',
      ),
    ).toBeInTheDocument();
    const trees = screen.getByRole('table', { name: 'Tapped trees against the guideline' });
    expect(
      within(trees).getByRole('columnheader', { name: 'Findings, Traditional' }),
    ).toBeInTheDocument();
    expect(within(trees).getAllByRole('row')[1]).toHaveTextContent('Holes too close');
    const csv = new URL(
      screen.getByRole('link', { name: 'Download CSV' }).getAttribute('href')!,
      'http://localhost',
    );
    expect(csv.pathname).toBe('/api/sugarbushes/3/compliance.csv');
    expect(csv.searchParams.get('compare')).toBe('traditional');
    expect(csv.searchParams.get('finding')).toBe('over');
    await user.click(screen.getByLabelText('Only trees the two read differently'));
    await waitFor(() => expect(lastRequest(api, COMPLIANCE).get('changed')).toBe('1'));
    expect(
      screen.getByRole('link', { name: 'Printable report for a lease review' }),
    ).toHaveAttribute(
      'href',
      '/sugarbushes/3/overview/compliance-report?season=2026&compare=traditional',
    );
  });

  it('when the user picks another season, then the report is asked for it', async () => {
    const { api, user } = openOverview();
    await screen.findByRole('table', { name: 'Tapped trees against the guideline' });
    await user.selectOptions(screen.getByLabelText('Season'), '2024');
    await waitFor(() => expect(lastRequest(api, COMPLIANCE).get('season')).toBe('2024'));
  });
});

describe('who changed what', () => {
  it('shows the owner each entry as a sentence in their units, filtered by kind on request', async () => {
    const { api, user } = openOverview();
    const table = await screen.findByRole('table', { name: 'Record of changes' });
    const [, row] = within(table).getAllByRole('row');
    expect(row).toHaveTextContent('Ines Forester');
    expect(row).toHaveTextContent('Recorded DBH 16.2 in, crown dieback 5 % of 2026-10-02');
    expect(within(row).getByRole('link', { name: '0412' })).toHaveAttribute('href', '/trees/7');
    await user.selectOptions(screen.getByLabelText('Kind'), 'measurement');
    await waitFor(() => expect(lastRequest(api, AUDIT).get('kind')).toBe('measurement'));
    await user.selectOptions(screen.getByLabelText('Person'), 'Ines Forester');
    await waitFor(() => expect(lastRequest(api, AUDIT).get('userId')).toBe('12'));
  });

  it.each(['forester', 'tapper', 'consultant'] as const)(
    'is not shown to a %s, and not asked for',
    async (role) => {
      const { api } = openOverview({ role, routes: { [AUDIT]: json(403, {}) } });
      await trend('Basal area per acre');
      expect(screen.queryByRole('heading', { name: 'Who changed what' })).toBeNull();
      expect(api.to(AUDIT)).toHaveLength(0);
    },
  );
});

import { QueryClient, dehydrate, hydrate, onlineManager } from '@tanstack/react-query';
import { act, screen, waitFor, within } from '@testing-library/react';
import type { Role } from '@shared/schemas/enums';
import type { SapEntry } from '@shared/schemas/sap';
import { SeasonLogRoute } from '@/app/routes/season-log';
import {
  fieldEntryKeys,
  refusedEntries,
  registerFieldEntryDefaults,
  type FieldEntry,
} from '@/lib/field-entries';
import { json, mockApi, type Handler } from '@/test/api-mock';
import { meAs, sugarbush } from '@/test/fixtures';
import { renderPage } from '@/test/render';
import {
  sapEntry,
  sapList,
  sapTotals,
  spoilingCaution,
  warmCaution,
  weatherDay,
  weatherSeason,
} from '@/test/season-fixtures';

const WEATHER = 'GET /api/sugarbushes/3/weather';
const SAP = 'GET /api/sugarbushes/3/sap';
const POST_SAP = 'POST /api/sugarbushes/3/sap';

/** The API's answer to a new entry: what was sent, with its syrup and cautions as given. */
const savedAs =
  (extra: Partial<SapEntry>): Handler =>
  (req) => ({ status: 201, body: sapEntry({ id: 90, ...(req.body as object), ...extra }) });

function openLog({
  role = 'tapper',
  unitSystem = 'metric',
  url = '/sugarbushes/3/season',
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
    [WEATHER]: weatherSeason(),
    [SAP]: sapList([sapEntry()]),
    ...routes,
  });
  const view = renderPage({ path: '/sugarbushes/:id/season', url, element: <SeasonLogRoute /> });
  // New sap and weather go through the device's queue, as the app registers it.
  registerFieldEntryDefaults(view.queryClient);
  return { api, ...view };
}

const sapForm = () => screen.findByRole('region', { name: "Record a day's sap" });

describe('recording a day’s sap', () => {
  it('when a tapper types gallons and °F, then litres and °C are sent and the saved entry shows both syrup figures and its caution', async () => {
    const { api, user } = openLog({
      unitSystem: 'imperial',
      routes: {
        [POST_SAP]: savedAs({
          expectedSyrupL: 1.1004,
          expectedSyrupLRevised: 1.0903,
          cautions: [warmCaution],
        }),
      },
    });
    const form = within(await sapForm());
    await user.clear(form.getByLabelText('Date'));
    await user.type(form.getByLabelText('Date'), '2026-03-12');
    await user.selectOptions(form.getByLabelText('Collection'), 'bucket');
    await user.type(form.getByLabelText('Sap volume (gal)'), '10');
    await user.type(form.getByLabelText('Sugar (°Brix)'), '2,5');
    await user.type(form.getByLabelText('Held at (°F)'), '45');
    await user.click(form.getByRole('button', { name: 'Save sap' }));

    await waitFor(() => expect(api.to(POST_SAP)).toHaveLength(1));
    const body = api.to(POST_SAP)[0].body as Record<string, unknown>;
    // 1 US gal = 3.785411784 L (NIST Handbook 44); °C = (°F − 32) × 5/9.
    expect(body.volumeL).toBeCloseTo(37.854, 3);
    expect(body.heldAtC).toBeCloseTo(7.222, 3);
    expect(body).toMatchObject({
      collectedOn: '2026-03-12',
      collection: 'bucket',
      sugarPct: 2.5,
      syrupMadeL: null,
      note: null,
    });

    const saved = await screen.findByRole('group', { name: 'Saved entry' });
    expect(saved).toHaveTextContent(
      'Recorded 10.0 gal of sap at 2.5 °Brix on Mar 12, 2026 (bucket).',
    );
    // 1.1004 L = 0.29 gal; 1.0903 L = 0.288 gal, each shown with two decimals.
    expect(saved).toHaveTextContent(
      'Expected syrup: 0.29 gal by the Rule of 86, 0.29 gal by the rule revised for 66.0 °Brix syrup.',
    );
    const caution = within(saved)
      .getByText(/Sap held at/)
      .closest('li')!;
    expect(caution).toHaveAttribute('data-level', 'caution');
    expect(caution).toHaveTextContent('Caution: Sap held at 45 °F: above 40 °F it spoils faster.');
    expect(form.getByLabelText('Sap volume (gal)')).toHaveValue('');
  });

  it('in metric, litres go as typed; a missing volume and an unlikely °Brix are refused before sending, with the shared schema’s words', async () => {
    const { api, user } = openLog();
    const form = within(await sapForm());
    await user.type(form.getByLabelText('Sugar (°Brix)'), '20');
    await user.type(form.getByLabelText('Held at (°C)'), 'cold');
    await user.click(form.getByRole('button', { name: 'Save sap' }));

    expect(await form.findByText('Enter the volume of sap')).toBeInTheDocument();
    expect(
      form.getByText('Maple sap is rarely above 12 °Brix: check the refractometer'),
    ).toBeInTheDocument();
    expect(
      form.getByText('Enter the temperature the sap was held at as a number, like 38'),
    ).toBeInTheDocument();
    expect(form.getByLabelText('Sap volume (L)')).toHaveAttribute('aria-invalid', 'true');
    expect(api.to(POST_SAP)).toHaveLength(0);

    await user.type(form.getByLabelText('Sap volume (L)'), '420.5');
    await user.clear(form.getByLabelText('Sugar (°Brix)'));
    await user.type(form.getByLabelText('Sugar (°Brix)'), '2.1');
    await user.clear(form.getByLabelText('Held at (°C)'));
    await user.type(form.getByLabelText('Held at (°C)'), '-1');
    await user.click(form.getByRole('button', { name: 'Save sap' }));
    await waitFor(() => expect(api.to(POST_SAP)).toHaveLength(1));
    expect(api.to(POST_SAP)[0].body).toMatchObject({
      volumeL: 420.5,
      sugarPct: 2.1,
      heldAtC: -1,
      collection: null,
    });
  });

  it('when the server refuses a field, then its message lands on that field', async () => {
    const { user } = openLog({
      routes: {
        [POST_SAP]: json(400, {
          error: {
            code: 'validation',
            message: 'Check the entry',
            fields: { collectedOn: 'Sap cannot be collected in the future' },
          },
        }),
      },
    });
    const form = within(await sapForm());
    await user.type(form.getByLabelText('Sap volume (L)'), '100');
    await user.type(form.getByLabelText('Sugar (°Brix)'), '2');
    await user.click(form.getByRole('button', { name: 'Save sap' }));
    expect(await form.findByText('Sap cannot be collected in the future')).toBeInTheDocument();
    expect(form.getByLabelText('Date')).toHaveAttribute('aria-invalid', 'true');
    // The form holds the entry and shows why: it is not listed as refused as well.
    expect(refusedEntries.list()).toEqual([]);
    expect(form.getByLabelText('Sap volume (L)')).toHaveValue('100');
  });

  it('a sap held above 50 °F is a warning, set apart from a caution by its word and its box', async () => {
    const { user } = openLog({
      routes: { [POST_SAP]: savedAs({ heldAtC: 12, cautions: [spoilingCaution] }) },
    });
    const form = within(await sapForm());
    await user.type(form.getByLabelText('Sap volume (L)'), '100');
    await user.type(form.getByLabelText('Sugar (°Brix)'), '2');
    await user.type(form.getByLabelText('Held at (°C)'), '12');
    await user.click(form.getByRole('button', { name: 'Save sap' }));
    const saved = await screen.findByRole('group', { name: 'Saved entry' });
    const warning = within(saved)
      .getByText(/microbes grow fast/)
      .closest('li')!;
    expect(warning).toHaveAttribute('data-level', 'warning');
    expect(within(warning).getByText('Warning:')).toHaveClass('text-alert');
    expect(warning).toHaveTextContent(
      'Source: Ohio State University maple program: sap spoilage by temperature.',
    );
  });
});

describe('the season on a chart and in a table', () => {
  const days = {
    [WEATHER]: weatherSeason(),
    [SAP]: sapList(
      [
        sapEntry({
          id: 1,
          collectedOn: '2026-03-10',
          volumeL: 600,
          sugarPct: 2,
          expectedSyrupL: 13.95,
          expectedSyrupLRevised: 13.88,
          heldAtC: 12,
          cautions: [spoilingCaution],
        }),
        sapEntry({
          id: 2,
          collectedOn: '2026-03-10',
          volumeL: 200,
          sugarPct: 3,
          expectedSyrupL: 6.98,
          expectedSyrupLRevised: 6.97,
          collection: 'bucket',
          heldAtC: 7.2,
          cautions: [warmCaution],
        }),
        sapEntry({
          id: 3,
          collectedOn: '2026-03-12',
          volumeL: 300,
          sugarPct: 2.4,
          expectedSyrupL: 8.37,
          expectedSyrupLRevised: 8.34,
        }),
      ],
      { totals: sapTotals({ volumeL: 1100, days: 2 }) },
    ),
  };

  it('lists every day with weather or sap: low, high, run and reason, sap added up, sugar by volume, syrup by both rules and the day’s cautions', async () => {
    openLog({ routes: days });
    const table = await screen.findByRole('table', { name: 'Days of season 2026' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows.map((r) => r.getAttribute('data-day'))).toEqual([
      '2026-03-09',
      '2026-03-10',
      '2026-03-11',
      '2026-03-12',
    ]);
    const cells = (row: HTMLElement) =>
      within(row)
        .getAllByRole('cell')
        .map((c) => c.textContent);
    expect(cells(rows[1])).toEqual([
      '−4 °C',
      '5 °C',
      '▲ Strong run−4 °C night, 5 °C day: a strong run',
      '800 L',
      // (600 × 2 + 200 × 3) / 800
      '2.3 °Brix',
      '20.9 L',
      '20.9 L',
      'Warning: Sap held at 12 °C: above 10 °C microbes grow fast and the sap spoils within hours.Caution: Sap held at 7.2 °C: above 4.4 °C it spoils faster.',
    ]);
    expect(cells(rows[3]).slice(0, 4)).toEqual(['—', '—', 'No weather recorded', '300 L']);
    expect(rows.map((r) => r.querySelector('[data-run]')!.getAttribute('data-run'))).toEqual([
      'none',
      'strong',
      'run',
      'unknown',
    ]);
  });

  it('in imperial, the table and chart read °F and gallons, the reason worded again in °F', async () => {
    openLog({ unitSystem: 'imperial', routes: days });
    const table = await screen.findByRole('table', { name: 'Days of season 2026' });
    const strong = within(table).getAllByRole('row')[2];
    expect(strong).toHaveTextContent('24.8 °F');
    expect(strong).toHaveTextContent('24.8 °F night, 41 °F day: a strong run');
    expect(strong).toHaveTextContent('211 gal');
    expect(strong).toHaveTextContent('Sap held at 53.6 °F: above 50 °F microbes grow fast');
  });

  it('names the chart in one sentence, points it to the table, and marks each run day by its kind', async () => {
    const { container } = openLog({ routes: days });
    const chart = await screen.findByRole('img', {
      name: 'Season 2026: 2 run days (1 strong) between Mar 10, 2026 and Mar 11, 2026; 1,100 L of sap on 2 days at 2.3 °Brix on average',
    });
    const table = screen.getByRole('table', { name: 'Days of season 2026' });
    expect(chart).toHaveAttribute('aria-describedby', table.id);
    await waitFor(() => expect(container.querySelectorAll('[data-run-day]')).toHaveLength(2));
    const marks = [...container.querySelectorAll('[data-run-day]')].map((m) => [
      m.getAttribute('data-run-day'),
      m.getAttribute('data-run'),
    ]);
    expect(marks).toEqual([
      ['2026-03-10', 'strong'],
      ['2026-03-11', 'run'],
    ]);
    expect(within(chart).getByText('Freezing, 0 °C')).toBeInTheDocument();
  });
});

describe('the season’s figures and states', () => {
  it('shows the totals in the user’s units beside the standing caution about boiling', async () => {
    openLog({
      unitSystem: 'imperial',
      routes: {
        [SAP]: sapList([sapEntry()], {
          totals: sapTotals({
            volumeL: 3785.411784,
            syrupMadeL: 75.70823568,
            entriesWithSyrup: 3,
            expectedSyrupLWhereMade: 83.27905925,
            days: 12,
          }),
        }),
      },
    });
    const list = await screen.findByLabelText('Season 2026 totals');
    expect(within(list).getByText('Sap collected').nextSibling).toHaveTextContent('1,000 gal');
    expect(within(list).getByText('Syrup made').nextSibling).toHaveTextContent('20.0 gal');
    // Made on three entries only: beside what their sap alone should make (22 gal).
    expect(within(list).getByText('Syrup made').parentElement).toHaveTextContent(
      'from the sap of 3 entries, which should make 22.0 gal by the Rule of 86',
    );
    expect(within(list).getByText('Taps').nextSibling).toHaveTextContent('400');
    expect(screen.getByRole('complementary', { name: 'Boiling safely' })).toHaveTextContent(
      /local codes, your inspector and licensed professionals come first/,
    );
  });

  it('an empty season says so, with the action for those who record', async () => {
    openLog({
      url: '/sugarbushes/3/season?season=2027',
      routes: {
        [WEATHER]: weatherSeason({ season: 2027, items: [], total: 0 }),
        [SAP]: sapList([], { season: 2027, totals: sapTotals({ volumeL: 0, days: 0 }) }),
      },
    });
    expect(await screen.findByText('No sap recorded in 2027 yet')).toBeInTheDocument();
    expect(screen.getByText(/Record the first day's sap below/)).toBeInTheDocument();
    expect(await sapForm()).toBeInTheDocument();
    expect(screen.queryByRole('table', { name: /Days of season/ })).toBeNull();
  });

  it('a failed load says what failed and retries', async () => {
    let calls = 0;
    const { user } = openLog({
      routes: {
        [WEATHER]: (() => {
          calls += 1;
          return calls === 1
            ? { status: 500, body: { error: { code: 'internal', message: 'Database busy' } } }
            : { status: 200, body: weatherSeason() };
        }) satisfies Handler,
      },
    });
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent("We couldn't load the season log.");
    await user.click(within(alert).getByRole('button', { name: 'Retry' }));
    expect(await screen.findByRole('table', { name: 'Days of season 2026' })).toBeInTheDocument();
  });

  it('steps to another season through the URL and asks the API for it', async () => {
    const { api, user, router } = openLog();
    await screen.findByRole('table', { name: 'Days of season 2026' });
    await user.click(screen.getByRole('button', { name: 'Previous season' }));
    await waitFor(() => expect(router.state.location.search).toBe('?season=2025'));
    await waitFor(() =>
      expect(api.to(WEATHER).at(-1)!.url.searchParams.get('season')).toBe('2025'),
    );
    expect(api.to(SAP).at(-1)!.url.searchParams.get('season')).toBe('2025');
  });

  it('says when to expect a run from the forecast, with its source', async () => {
    openLog({
      routes: {
        [WEATHER]: weatherSeason({
          forecast: [
            weatherDay({
              date: '2026-03-17',
              minC: 1,
              maxC: 8,
              run: 'none',
              reason: '1 °C night, 8 °C day: no run, the night does not freeze',
            }),
            // 19 March 2026 is a Thursday.
            weatherDay({
              date: '2026-03-19',
              minC: -5,
              maxC: 6,
              run: 'run',
              reason: '−5 °C night, 6 °C day: a run',
              source: 'forecast',
            }),
          ],
          forecastSource: 'the test forecast service',
        }),
      },
    });
    const section = await screen.findByRole('region', { name: 'The coming days' });
    expect(section).toHaveTextContent('Expect a run Thursday: −5 °C night, 6 °C day.');
    expect(section).toHaveTextContent('Forecast from the test forecast service.');
  });
});

describe('who records', () => {
  it('a consultant reads the log but sees no form and no correction', async () => {
    openLog({ role: 'consultant' });
    await screen.findByRole('table', { name: 'Days of season 2026' });
    await screen.findByRole('table', { name: 'Sap entries of 2026' });
    expect(screen.queryByRole('region', { name: "Record a day's sap" })).toBeNull();
    expect(screen.queryByRole('region', { name: "Record a day's weather" })).toBeNull();
    expect(screen.queryByRole('button', { name: /Correct the entry/ })).toBeNull();
    expect(
      screen.getByText(/the owner, the forester and the tapper record sap and weather/),
    ).toBeInTheDocument();
  });

  it('a forester corrects an entry: the form opens with its values in the page’s units and sends a PATCH', async () => {
    const { api, user } = openLog({
      role: 'forester',
      unitSystem: 'imperial',
      routes: {
        'PATCH /api/sap/41': ((req) => ({
          status: 200,
          body: sapEntry({ ...(req.body as object) }),
        })) satisfies Handler,
      },
    });
    const entries = await screen.findByRole('table', { name: 'Sap entries of 2026' });
    await user.click(
      within(entries).getByRole('button', {
        name: 'Correct the entry of Mar 10, 2026, vacuum tubing',
      }),
    );
    const form = within(
      await screen.findByRole('region', { name: 'Correct the entry of Mar 10, 2026' }),
    );
    // 860 L = 227.19 gal; 3 °C = 37.4 °F.
    expect(form.getByLabelText('Sap volume (gal)')).toHaveValue('227.188');
    expect(form.getByLabelText('Held at (°F)')).toHaveValue('37.4');
    await user.clear(form.getByLabelText('Sugar (°Brix)'));
    await user.type(form.getByLabelText('Sugar (°Brix)'), '2.8');
    await user.click(form.getByRole('button', { name: 'Save correction' }));
    await waitFor(() => expect(api.to('PATCH /api/sap/41')).toHaveLength(1));
    const body = api.to('PATCH /api/sap/41')[0].body as Record<string, number>;
    expect(body.sugarPct).toBe(2.8);
    expect(body.volumeL).toBeCloseTo(860, 2);
    expect(body.heldAtC).toBeCloseTo(3, 2);
    expect(await screen.findByText('Corrected the entry of Mar 10, 2026.')).toBeInTheDocument();
  });

  it('filters the entries by collection and pages through them', async () => {
    const { api, user } = openLog({
      routes: { [SAP]: sapList([sapEntry()], { total: 45, pageSize: 20 }) },
    });
    const section = (await screen.findByRole('heading', { name: 'Sap entries' })).closest(
      'section',
    )!;
    await user.selectOptions(within(section).getByLabelText('Collection'), 'stand');
    await waitFor(() =>
      expect(api.to(SAP).some((r) => r.url.searchParams.get('collection') === 'stand')).toBe(true),
    );
    await user.click(within(section).getByRole('button', { name: 'Next' }));
    await waitFor(() =>
      expect(
        api
          .to(SAP)
          .some(
            (r) =>
              r.url.searchParams.get('page') === '2' && r.url.searchParams.get('pageSize') === '20',
          ),
      ).toBe(true),
    );
  });
});

describe('weather by hand and from a station', () => {
  it('a day’s low and high typed in °F are sent in °C, and a high below the low is refused', async () => {
    const POST = 'POST /api/sugarbushes/3/weather';
    const { api, user } = openLog({
      unitSystem: 'imperial',
      routes: {
        [POST]: ((req) => ({
          status: 201,
          body: weatherDay({ ...(req.body as object) }),
        })) satisfies Handler,
      },
    });
    const form = within(await screen.findByRole('region', { name: 'Record a day’s weather' }));
    await user.clear(form.getByLabelText('Date'));
    await user.type(form.getByLabelText('Date'), '2026-03-14');
    await user.type(form.getByLabelText('Night low (°F)'), '41');
    await user.type(form.getByLabelText('Day high (°F)'), '23');
    await user.click(form.getByRole('button', { name: 'Save weather' }));
    expect(await form.findByText('The day high cannot be below the night low')).toBeInTheDocument();
    expect(api.to(POST)).toHaveLength(0);

    await user.clear(form.getByLabelText('Night low (°F)'));
    await user.type(form.getByLabelText('Night low (°F)'), '23');
    await user.clear(form.getByLabelText('Day high (°F)'));
    await user.type(form.getByLabelText('Day high (°F)'), '41');
    await user.click(form.getByRole('button', { name: 'Save weather' }));
    await waitFor(() => expect(api.to(POST)).toHaveLength(1));
    const body = api.to(POST)[0].body as { date: string; minC: number; maxC: number };
    expect(body.date).toBe('2026-03-14');
    expect(body.minC).toBeCloseTo(-5, 3);
    expect(body.maxC).toBeCloseTo(5, 3);
    expect(
      await form.findByText('Saved Mar 14, 2026: 23 °F night, 41 °F day: a strong run.'),
    ).toBeInTheDocument();
  });

  it('a station file is checked first, its days listed with their runs, then imported', async () => {
    const IMPORT = 'POST /api/sugarbushes/3/weather/imports';
    const days = [
      weatherDay({ date: '2026-03-01', source: 'station', station: 'TEST0001' }),
      weatherDay({
        date: '2026-03-02',
        minC: 1,
        maxC: 6,
        run: 'none',
        reason: '1 °C night, 6 °C day: no run, the night does not freeze',
        source: 'station',
        station: 'TEST0001',
      }),
    ];
    const { api, user } = openLog({
      routes: {
        [IMPORT]: ((req) => {
          const form = req.body as FormData;
          const dryRun = form.get('dryRun') === 'true';
          return {
            status: 200,
            body: {
              station: 'TEST0001',
              unit: form.get('unit'),
              added: 2,
              replaced: 0,
              unchanged: 0,
              skipped: [{ row: 4, reason: 'TMIN is missing' }],
              days,
              dryRun,
            },
          };
        }) satisfies Handler,
      },
    });
    const section = within(
      await screen.findByRole('region', { name: 'Import a weather station’s days' }),
    );
    const file = new File(
      ['STATION,DATE,TMAX,TMIN\n"TEST0001","2026-03-01","41","25"\n'],
      'station.csv',
      { type: 'text/csv' },
    );
    await user.upload(section.getByLabelText('Station CSV'), file);
    await user.selectOptions(section.getByLabelText('Temperatures in'), 'F');
    await user.click(section.getByRole('button', { name: 'Check the file' }));
    const preview = await section.findByRole('table', { name: 'Days in the file' });
    expect(within(preview).getAllByRole('row')).toHaveLength(3);
    expect(preview).toHaveTextContent('Strong run−4 °C night, 5 °C day: a strong run');
    expect(section.getByText('Row 4: TMIN is missing')).toBeInTheDocument();
    const checked = api.to(IMPORT)[0].body as FormData;
    expect(checked.get('dryRun')).toBe('true');
    expect(checked.get('unit')).toBe('F');
    expect((checked.get('file') as File).name).toBe('station.csv');

    await user.click(section.getByRole('button', { name: 'Import 2 days' }));
    expect(await section.findByText('Imported: 2 days new, 0 days replaced.')).toBeInTheDocument();
    expect((api.to(IMPORT)[1].body as FormData).get('dryRun')).toBeNull();
  });
});

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;
const POST_WEATHER = 'POST /api/sugarbushes/3/weather';

describe('sap and weather recorded without a network', () => {
  afterEach(async () => {
    act(() => onlineManager.setOnline(true));
    await refusedEntries.clear();
  });

  it('when sap is saved offline, then the form says it waits and clears; back online it is sent once with its id and the saved entry shows its syrup and caution', async () => {
    const { api, user, queryClient } = openLog({
      routes: { [POST_SAP]: savedAs({ cautions: [warmCaution] }) },
    });
    const form = within(await sapForm());
    await user.clear(form.getByLabelText('Date'));
    await user.type(form.getByLabelText('Date'), '2026-03-14');
    act(() => onlineManager.setOnline(false));
    await user.type(form.getByLabelText('Sap volume (L)'), '860');
    await user.type(form.getByLabelText('Sugar (°Brix)'), '2.5');
    await user.click(form.getByRole('button', { name: 'Save sap' }));

    expect(
      await form.findByText(
        'Kept on this device: the sap of Mar 14, 2026 waits to send and goes out when the network is back.',
      ),
    ).toBeInTheDocument();
    expect(form.getByLabelText('Sap volume (L)')).toHaveValue('');
    expect(form.getByRole('button', { name: 'Save sap' })).toBeEnabled();
    expect(api.to(POST_SAP)).toHaveLength(0);
    expect(queryClient.isMutating({ mutationKey: fieldEntryKeys.all })).toBe(1);

    const reads = api.to('GET /api/sugarbushes/3/sap').length;
    act(() => onlineManager.setOnline(true));
    await waitFor(() => expect(api.to(POST_SAP)).toHaveLength(1));
    const body = api.to(POST_SAP)[0].body as Record<string, unknown>;
    expect(body).toMatchObject({ collectedOn: '2026-03-14', volumeL: 860, sugarPct: 2.5 });
    expect(body.clientId).toMatch(UUID);
    const saved = await screen.findByRole('group', { name: 'Saved entry' });
    expect(saved).toHaveTextContent('Expected syrup: 25.0 L by the Rule of 86');
    expect(saved).toHaveTextContent('Caution: Sap held at');
    // The season log reads again what the entry moved.
    await waitFor(() => expect(api.to('GET /api/sugarbushes/3/sap').length).toBeGreaterThan(reads));
    await waitFor(() => expect(queryClient.isMutating()).toBe(0));
    expect(api.to(POST_SAP)).toHaveLength(1);
  });

  it('when a day’s weather waits and the page is reloaded, then the restored entry is sent once, with the same id, by the registered sender', async () => {
    const { api, user, queryClient } = openLog({
      routes: {
        [POST_WEATHER]: ((req) => ({
          status: 201,
          body: weatherDay({ ...(req.body as object) }),
        })) satisfies Handler,
      },
    });
    const form = within(await screen.findByRole('region', { name: 'Record a day’s weather' }));
    await user.clear(form.getByLabelText('Date'));
    await user.type(form.getByLabelText('Date'), '2026-03-14');
    act(() => onlineManager.setOnline(false));
    await user.type(form.getByLabelText('Night low (°C)'), '-4');
    await user.type(form.getByLabelText('Day high (°C)'), '5');
    await user.click(form.getByRole('button', { name: 'Save weather' }));
    expect(
      await form.findByText(
        'Kept on this device: the weather of Mar 14, 2026 waits to send and goes out when the network is back.',
      ),
    ).toBeInTheDocument();

    // What the device keeps across a reload: the waiting entries, dehydrated as data.
    const kept = dehydrate(queryClient, {
      shouldDehydrateQuery: () => false,
      shouldDehydrateMutation: (m) => m.state.status === 'pending',
    });
    expect(kept.mutations).toHaveLength(1);
    const waiting = kept.mutations[0].state.variables as FieldEntry;
    expect(waiting).toMatchObject({ kind: 'weather', sugarbushId: 3 });
    queryClient.getMutationCache().clear();

    const reloaded = new QueryClient();
    registerFieldEntryDefaults(reloaded);
    hydrate(reloaded, {
      ...kept,
      mutations: kept.mutations.map((m) => ({ ...m, state: { ...m.state, isPaused: true } })),
    });
    act(() => onlineManager.setOnline(true));
    await act(() => reloaded.resumePausedMutations());
    await waitFor(() => expect(reloaded.isMutating()).toBe(0));
    expect(api.to(POST_WEATHER)).toHaveLength(1);
    expect(api.to(POST_WEATHER)[0].body).toEqual({
      date: '2026-03-14',
      minC: -4,
      maxC: 5,
      clientId: waiting.clientId,
    });
  });

  it('when a waiting day is refused once the network is back, then it lands in the refused list with the server’s reason, not on the cleared form', async () => {
    const { user } = openLog({
      routes: {
        [POST_WEATHER]: json(409, {
          error: { code: 'client-id-conflict', message: 'This entry id was already used' },
        }),
      },
    });
    const form = within(await screen.findByRole('region', { name: 'Record a day’s weather' }));
    await user.clear(form.getByLabelText('Date'));
    await user.type(form.getByLabelText('Date'), '2026-03-14');
    act(() => onlineManager.setOnline(false));
    await user.type(form.getByLabelText('Night low (°C)'), '-4');
    await user.type(form.getByLabelText('Day high (°C)'), '5');
    await user.click(form.getByRole('button', { name: 'Save weather' }));
    await form.findByText(/waits to send/);
    act(() => onlineManager.setOnline(true));
    await waitFor(() => expect(refusedEntries.list()).toHaveLength(1));
    expect(refusedEntries.list()[0]).toMatchObject({
      entry: { kind: 'weather', sugarbushId: 3, input: { date: '2026-03-14', minC: -4, maxC: 5 } },
      code: 'client-id-conflict',
      message: 'This entry id was already used',
    });
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });
});

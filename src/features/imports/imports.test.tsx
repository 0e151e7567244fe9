import { screen, waitFor, within } from '@testing-library/react';
import type { Role } from '@shared/schemas/enums';
import type { ImportProgress, ImportResult } from '@shared/schemas/imports';
import { ImportsRoute } from '@/app/routes/imports';
import { progressShown } from './components/import-progress';
import { mockApi, type Handler } from '@/test/api-mock';
import { meAs, sugarbush } from '@/test/fixtures';
import { renderPage } from '@/test/render';

const MEASUREMENTS = 'POST /api/sugarbushes/3/imports/measurements';
const TREES = 'POST /api/sugarbushes/3/imports/trees';

const result = (over: Partial<ImportResult> = {}): ImportResult => ({
  kind: 'measurements',
  dryRun: true,
  source: 'csv',
  rows: 2,
  created: 2,
  unchanged: 0,
  updated: 0,
  errors: [],
  totalErrors: over.errors?.length ?? 0,
  rowsWithErrors: new Set(over.errors?.map((e) => e.row)).size,
  warnings: [],
  totalWarnings: over.warnings?.length ?? 0,
  truncated: false,
  defaults: { species: null, status: 'active' },
  columns: [
    { header: 'Tag', field: 'tag' },
    { header: 'Date', field: 'measuredOn' },
    { header: 'DBH', field: null },
  ],
  preview: [
    ['0412', '2025-10-01', '12'],
    ['0413', '2025-10-01', '<b>14</b>'],
  ],
  ...over,
});

function openImports(role: Role, routes: Record<string, unknown> = {}) {
  const api = mockApi({
    'GET /api/auth/me': meAs(role),
    'GET /api/sugarbushes/3': sugarbush({ role }),
    ...routes,
  });
  const view = renderPage({
    path: '/sugarbushes/:id/imports',
    url: '/sugarbushes/3/imports',
    element: <ImportsRoute />,
  });
  return { api, ...view };
}

const sentMapping = (api: ReturnType<typeof mockApi>, key: string, i: number) =>
  JSON.parse((api.to(key)[i].body as FormData).get('mapping') as string);

describe('the import page', () => {
  it('when a file is chosen, then it is checked and its columns and first rows show; a corrected mapping is checked again, then imported', async () => {
    let call = 0;
    const handler: Handler = ({ url }) => {
      call += 1;
      const dryRun = url.searchParams.get('dryRun') === '1';
      if (call === 1)
        return {
          status: 200,
          body: result({
            created: 0,
            errors: [{ row: 1, column: 'dbhCm', message: 'No column holds dbhCm (say the unit)' }],
          }),
        };
      return {
        status: dryRun ? 200 : 201,
        body: result({
          dryRun,
          columns: [...result().columns.slice(0, 2), { header: 'DBH', field: 'dbhIn' }],
        }),
      };
    };
    const { api, user } = openImports('forester', { [MEASUREMENTS]: handler });
    await user.selectOptions(await screen.findByLabelText('What the file holds'), 'measurements');
    const file = new File(['Tag,Date,DBH\n0412,2025-10-01,12\n'], 'readings.csv', {
      type: 'text/csv',
    });
    await user.upload(screen.getByLabelText('CSV or GPX file'), file);

    expect(await screen.findByText('No column holds dbhCm (say the unit)')).toBeInTheDocument();
    // A cell is text, never markup.
    expect(screen.getByText('<b>14</b>')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Import' })).toBeDisabled();

    await user.selectOptions(screen.getByLabelText('What “DBH” holds'), 'dbhIn');
    await user.click(screen.getByRole('button', { name: 'Check again' }));
    expect(sentMapping(api, MEASUREMENTS, 1).columns).toEqual({
      Tag: 'tag',
      Date: 'measuredOn',
      DBH: 'dbhIn',
    });
    const go = await screen.findByRole('button', { name: 'Import 2 rows' });
    await waitFor(() => expect(go).toBeEnabled());
    await user.click(go);
    expect(await screen.findByText(/Imported: 2 new/)).toBeInTheDocument();
    expect(api.to(MEASUREMENTS)[2].url.searchParams.get('dryRun')).toBeNull();
    expect(sentMapping(api, MEASUREMENTS, 2).columns.DBH).toBe('dbhIn');
  });

  it('when a GPX file of waypoints is checked, then a stated species is sent and a waypoint far outside is flagged', async () => {
    const gpxResult = (species: string | null) =>
      result({
        kind: 'trees',
        source: 'gpx',
        rows: 2,
        created: species ? 2 : 0,
        errors: species
          ? []
          : [{ row: 0, column: 'species', message: 'No column holds species: map one' }],
        warnings: species
          ? [
              {
                row: 2,
                waypoint: 'GX-2',
                column: 'lat',
                message: 'Waypoint GX-2 lies about 480 m outside',
              },
            ]
          : [],
        defaults: { species, status: 'active' },
        columns: [
          { header: 'name', field: 'tag' },
          { header: 'lat', field: 'lat' },
          { header: 'lon', field: 'lng' },
          { header: 'desc', field: null },
        ],
        preview: [
          ['GX-1', '45.001', '-72.5', 'By the brook'],
          ['GX-2', '45.006', '-72.495', ''],
        ],
      });
    const handler: Handler = ({ body }) => {
      const mapping = JSON.parse((body as FormData).get('mapping') as string);
      return { status: 200, body: gpxResult(mapping.defaults.species ?? null) };
    };
    const { api, user } = openImports('owner', { [TREES]: handler });
    await screen.findByLabelText('What the file holds');
    const file = new File(['<gpx><wpt lat="45" lon="-72"/></gpx>'], 'trees.gpx');
    await user.upload(screen.getByLabelText('CSV or GPX file'), file);
    expect(await screen.findByText('No column holds species: map one')).toBeInTheDocument();
    expect(screen.getByText('By the brook')).toBeInTheDocument();
    expect(screen.getByRole('columnheader', { name: 'Waypoint' })).toBeInTheDocument();

    await user.selectOptions(
      screen.getByLabelText('Species of a tree the file gives none'),
      'sugar-maple',
    );
    await user.click(screen.getByRole('button', { name: 'Check again' }));
    expect(sentMapping(api, TREES, 1).defaults).toEqual({ species: 'sugar-maple' });
    expect(
      await screen.findByText(/Waypoint 2 “GX-2”: Waypoint GX-2 lies about 480 m outside/),
    ).toBeInTheDocument();
    expect(await screen.findByRole('button', { name: 'Import 2 rows' })).toBeEnabled();
  });

  it('when a large file is checked, then the upload and then the server’s steps show as a progress bar until the answer', async () => {
    let answer: (reply: { status: number; body: unknown }) => void = () => undefined;
    const pending = new Promise<{ status: number; body: unknown }>((resolve) => {
      answer = resolve;
    });
    const steps: ImportProgress[] = [];
    const api = mockApi({
      'GET /api/auth/me': meAs('owner'),
      'GET /api/sugarbushes/3': sugarbush({ role: 'owner' }),
      [TREES]: (() => pending) satisfies Handler,
    });
    const progressOf = (importId: string) => `GET /api/sugarbushes/3/imports/${importId}/progress`;
    const { user } = renderPage({
      path: '/sugarbushes/:id/imports',
      url: '/sugarbushes/3/imports',
      element: <ImportsRoute />,
    });
    await screen.findByLabelText('What the file holds');
    const rows = Array.from({ length: 10_000 }, (_, i) => `L-${i},sugar-maple`).join('\n');
    // The page makes the id; the server's answers are routed to it once it is known.
    const answerSteps = () => {
      const [post] = api.to(TREES);
      const importId = post.headers.get('x-import-id')!;
      return { importId, key: progressOf(importId) };
    };
    await user.upload(
      screen.getByLabelText('CSV or GPX file'),
      new File([`tag,species\n${rows}\n`], 'trees.csv', { type: 'text/csv' }),
    );
    const bar = await screen.findByRole('progressbar', { name: 'Check of the file' });
    const { importId } = answerSteps();
    expect(importId).toMatch(
      /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/,
    );
    // The upload is done (the stand-in sends it at once); the server has not said yet.
    await waitFor(() =>
      expect(bar).toHaveAttribute(
        'aria-valuetext',
        expect.stringMatching(/Step 2 of 3: Reading the file/),
      ),
    );
    expect(bar).not.toHaveAttribute('aria-valuenow');

    steps.push({
      importId,
      kind: 'trees',
      dryRun: true,
      phase: 'checking',
      done: 4_000,
      total: 10_000,
    });
    api.route(answerSteps().key, () => ({ status: 200, body: steps.at(-1) }));
    await waitFor(() => expect(bar).toHaveAttribute('aria-valuenow', '40'), { timeout: 3000 });
    expect(bar).toHaveAttribute(
      'aria-valuetext',
      'Step 3 of 3: Checking rows, 4,000 of 10,000 rows',
    );
    expect(screen.getByText('Checking the file — step 3 of 3: checking rows')).toHaveAttribute(
      'role',
      'status',
    );

    answer({ status: 200, body: result({ kind: 'trees', rows: 10_000, created: 10_000 }) });
    expect(await screen.findByText(/10,000 rows read/)).toBeInTheDocument();
    expect(screen.queryByRole('progressbar')).not.toBeInTheDocument();
  });

  it('when a check finds thousands of problems, then the page says it shows the first of them and counts all', async () => {
    const errors = Array.from({ length: 200 }, (_, i) => ({
      row: i + 2,
      column: 'species',
      message: `Unknown species on row ${i + 2}`,
    }));
    const { user } = openImports('owner', {
      [TREES]: result({
        kind: 'trees',
        rows: 9_812,
        created: 0,
        errors,
        totalErrors: 9_812,
        rowsWithErrors: 9_812,
        truncated: true,
      }),
    });
    await screen.findByLabelText('What the file holds');
    await user.upload(
      screen.getByLabelText('CSV or GPX file'),
      new File(['tag,species\n'], 'trees.csv', { type: 'text/csv' }),
    );
    expect(await screen.findByText(/Showing the first 200 of 9,812 problems/)).toBeInTheDocument();
    expect(screen.getByRole('alert')).toHaveTextContent(
      '9,812 problems to fix in the file or the mapping, in 9,812 rows.',
    );
    expect(screen.getAllByText(/^Unknown species on row/)).toHaveLength(200);
    expect(screen.getByRole('button', { name: 'Import' })).toBeDisabled();
  });

  it('when a GPX check finds problems, then each names its waypoint by number and name, or the whole file', async () => {
    const { user } = openImports('owner', {
      [TREES]: result({
        kind: 'trees',
        source: 'gpx',
        created: 0,
        errors: [
          { row: 0, column: 'species', message: 'No column holds species' },
          { row: 3, waypoint: 'GW-3', column: 'lat', message: 'Latitude out of range' },
          { row: 4, waypoint: '', column: 'name', message: 'A tag is needed' },
        ],
      }),
    });
    await screen.findByLabelText('What the file holds');
    await user.upload(screen.getByLabelText('CSV or GPX file'), new File(['<gpx/>'], 'w.gpx'));
    const table = await screen.findByRole('table', { name: 'Rows that cannot be imported' });
    const places = within(table)
      .getAllByRole('row')
      .slice(1)
      .map((r) => within(r).getAllByRole('cell')[0].textContent);
    expect(places).toEqual(['whole file', '3 “GW-3”', '4 (no name)']);
  });

  it('when a tapper opens it, then only tapholes can be chosen', async () => {
    openImports('tapper');
    const select = await screen.findByLabelText('What the file holds');
    expect(
      within(select)
        .getAllByRole('option')
        .map((o) => o.textContent),
    ).toEqual(['Tapholes']);
  });

  it('when a consultant opens it, then it says the role does not import', async () => {
    const { api } = openImports('consultant');
    expect(await screen.findByText(/does not import records/)).toBeInTheDocument();
    expect(api.to(TREES)).toHaveLength(0);
  });
});

describe('what the progress bar says', () => {
  it('when the file is still going up, then it counts the bytes; once the server writes, its rows', () => {
    expect(progressShown(false, { sent: 120_000, total: 400_000 }, undefined)).toEqual({
      step: 1,
      of: 5,
      label: 'Sending the file',
      percent: 30,
      detail: '120 kB of 400 kB',
    });
    const writing: ImportProgress = {
      importId: 'a',
      kind: 'trees',
      dryRun: false,
      phase: 'writing',
      done: 2_500,
      total: 10_000,
    };
    expect(progressShown(false, { sent: 1, total: 1 }, writing)).toMatchObject({
      step: 4,
      of: 5,
      percent: 25,
      detail: '2,500 of 10,000 rows',
    });
    expect(
      progressShown(false, null, { ...writing, phase: 'advising', done: 1, total: 3 }),
    ).toMatchObject({ step: 5, percent: 33, detail: '33 %' });
  });
});

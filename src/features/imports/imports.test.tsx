import { screen, waitFor, within } from '@testing-library/react';
import type { Role } from '@shared/schemas/enums';
import type { ImportResult } from '@shared/schemas/imports';
import { ImportsRoute } from '@/app/routes/imports';
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
  warnings: [],
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
          : [{ row: 1, column: 'species', message: 'No column holds species: map one' }],
        warnings: species
          ? [{ row: 2, column: 'lat', message: 'Waypoint GX-2 lies about 480 m outside' }]
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
      await screen.findByText(/Waypoint 2: Waypoint GX-2 lies about 480 m outside/),
    ).toBeInTheDocument();
    expect(await screen.findByRole('button', { name: 'Import 2 rows' })).toBeEnabled();
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

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
  rows: 2,
  created: 2,
  unchanged: 0,
  updated: 0,
  errors: [],
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
    await user.upload(screen.getByLabelText('CSV file'), file);

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

import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { area } from '@turf/turf';
import { screen, within } from '@testing-library/react';
import { openMap } from './map-testing';

vi.mock('./components/map-view', () => import('./map-view-stand-in'));

// jsdom's import.meta.url is no file URL: the fixtures are found from the project's root.
const fixture = (name: string) =>
  readFileSync(resolve(process.cwd(), 'tests/fixtures/boundaries', name));
const twoLots = JSON.parse(fixture('two-lots.geojson').toString('utf8'));
const [upper, lower] = twoLots.features.map((f: { geometry: unknown }) => f.geometry);

// The drawing tools load in their own chunk (Leaflet, geoman, turf), which takes a moment here.
const findFileInput = () => screen.findByLabelText('Boundary file', {}, { timeout: 10_000 });
const saved = (api: ReturnType<typeof openMap>['api']) =>
  api.to('PATCH /api/sugarbushes/3').map((call) => (call.body as { boundary: unknown }).boundary);
const patchRoute = {
  'PATCH /api/sugarbushes/3': (req: { body: unknown }) => ({ status: 200, body: req.body }),
};
/** "13.9 ha (34.4 acres)", worked out here from the fixture's own geometry. */
const areaLabel = (geometry: Parameters<typeof area>[0]) => {
  const m2 = area(geometry);
  return `${(m2 / 10_000).toFixed(1)} ha (${(m2 / 4046.8564224).toFixed(1)} acres)`;
};

async function importTwoLots() {
  const opened = openMap({ routes: patchRoute });
  await opened.user.upload(
    await findFileInput(),
    new File([fixture('two-lots.geojson')], 'two-lots.geojson'),
  );
  const list = await screen.findByRole('group', { name: /two-lots.geojson holds 2 outlines/ });
  return { ...opened, list };
}

describe('importing a boundary file with several outlines', () => {
  it('when the file holds two polygons, then both are listed with their areas and nothing is saved yet', async () => {
    const { api, list } = await importTwoLots();
    const upperRow = within(list)
      .getByRole('checkbox', { name: /Upper Lot/ })
      .closest('label')!;
    const lowerRow = within(list)
      .getByRole('checkbox', { name: /Lower Lot/ })
      .closest('label')!;
    expect(upperRow).toHaveTextContent(areaLabel(upper));
    expect(lowerRow).toHaveTextContent(areaLabel(lower));
    expect(saved(api)).toHaveLength(0);
  });

  it('when one outline is chosen, then exactly that outline is saved as the boundary', async () => {
    const { api, user, list } = await importTwoLots();
    await user.click(within(list).getByRole('checkbox', { name: /Lower Lot/ }));
    await user.click(screen.getByRole('button', { name: 'Save this outline' }));
    expect(await screen.findByText('Boundary imported from two-lots.geojson.')).toBeInTheDocument();
    expect(saved(api)).toEqual([lower]);
  });

  it('when both are chosen, then their union is shown and saved as one polygon', async () => {
    const { api, user, list } = await importTwoLots();
    await user.click(within(list).getByRole('checkbox', { name: /Upper Lot/ }));
    await user.click(within(list).getByRole('checkbox', { name: /Lower Lot/ }));
    expect(screen.getByRole('status')).toHaveTextContent(
      /^Merged: .* one outline \(they touch or overlap\)\.$/,
    );
    await user.click(screen.getByRole('button', { name: 'Merge 2 outlines and save' }));
    await screen.findByText('Boundary imported from two-lots.geojson.');
    const [boundary] = saved(api) as { type: string; coordinates: number[][][] }[];
    expect(boundary.type).toBe('Polygon');
    expect(area(boundary as never)).toBeCloseTo(area(upper) + area(lower), -1);
  });

  it('when nothing is chosen, then saving asks for a choice and sends nothing; cancel leaves the list', async () => {
    const { api, user } = await importTwoLots();
    await user.click(screen.getByRole('button', { name: 'Save this outline' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      "Choose the stand's outline, or several to merge into one.",
    );
    expect(saved(api)).toHaveLength(0);
    await user.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('group', { name: /holds 2 outlines/ })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Import boundary file' })).toBeInTheDocument();
  });

  it('when a KML or a zipped Shapefile of one outline is imported, then it is saved at once', async () => {
    const { api, user } = openMap({ routes: patchRoute });
    await user.upload(
      await findFileInput(),
      new File([fixture('lantern-hollow.kml')], 'lantern-hollow.kml'),
    );
    await screen.findByText('Boundary imported from lantern-hollow.kml.');
    await user.upload(
      await findFileInput(),
      new File([fixture('lantern-hollow-shp.zip')], 'lantern-hollow-shp.zip'),
    );
    await screen.findByText(
      'Boundary imported from lantern-hollow-shp.zip.',
      {},
      { timeout: 5000 },
    );
    const [kml, shp] = saved(api) as { type: string }[];
    expect(kml.type).toBe('Polygon');
    expect(area(shp as never)).toBeCloseTo(area(kml as never), 0);
  });

  it('when the file is in a system Clearwood does not know, then the refusal names it', async () => {
    const { api, user } = openMap({ routes: patchRoute });
    await user.upload(
      await findFileInput(),
      new File([fixture('lantern-hollow-epsg2949.geojson')], 'lantern-hollow-epsg2949.geojson'),
    );
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'The file is in EPSG:2949, which Clearwood cannot read yet; export it in WGS 84 (EPSG:4326).',
    );
    expect(saved(api)).toHaveLength(0);
  });
});

import { screen, waitFor, within } from '@testing-library/react';
import { json, type Handler } from '@/test/api-mock';
import { page } from '@/test/fixtures';
import { openMap } from './map-testing';

vi.mock('./components/map-view', () => import('./map-view-stand-in'));

const square = [
  [-72.643, 44.312],
  [-72.64, 44.312],
  [-72.64, 44.314],
  [-72.643, 44.314],
  [-72.643, 44.312],
];
const geojsonFile = (value: unknown, name = 'stand.geojson') => {
  const text = JSON.stringify(value);
  const file = new File([text], name, { type: 'application/geo+json' });
  // jsdom's File has no text(); browsers have had it for years.
  Object.defineProperty(file, 'text', { value: async () => text });
  return file;
};

// The drawing tools load in their own chunk (Leaflet, geoman, turf), which takes a moment here.
const findGeojsonInput = () => screen.findByLabelText('Boundary file', {}, { timeout: 10_000 });

/** A stand-in XMLHttpRequest: reports half the upload sent, then answers as told. */
function fakeUpload(status: number, body: unknown) {
  const sent: { url: string; headers: Record<string, string>; form: FormData }[] = [];
  class FakeXhr {
    status = 0;
    statusText = '';
    responseText = '';
    withCredentials = false;
    upload: { onprogress: ((e: ProgressEvent) => void) | null } = { onprogress: null };
    onload: (() => void) | null = null;
    onerror: (() => void) | null = null;
    private url = '';
    private headers: Record<string, string> = {};
    open(_method: string, url: string) {
      this.url = url;
    }
    setRequestHeader(name: string, value: string) {
      this.headers[name] = value;
    }
    send(form: FormData) {
      sent.push({ url: this.url, headers: this.headers, form });
      setTimeout(() => {
        this.upload.onprogress?.({ lengthComputable: true, loaded: 5, total: 10 } as ProgressEvent);
        setTimeout(() => {
          this.status = status;
          this.responseText = JSON.stringify(body);
          this.onload?.();
        }, 20);
      }, 0);
    }
  }
  vi.stubGlobal('XMLHttpRequest', FakeXhr);
  return sent;
}

describe('editing the woods map', () => {
  it('when a FeatureCollection of one polygon is imported, then its geometry is saved as the boundary', async () => {
    const { api, user } = openMap({
      routes: {
        'PATCH /api/sugarbushes/3': (req: { body: unknown }) => ({ status: 200, body: req.body }),
      },
    });
    await user.upload(
      await findGeojsonInput(),
      geojsonFile({
        type: 'FeatureCollection',
        features: [
          { type: 'Feature', properties: {}, geometry: { type: 'Polygon', coordinates: [square] } },
        ],
      }),
    );
    expect(await screen.findByText('Boundary imported from stand.geojson.')).toBeInTheDocument();
    expect(api.to('PATCH /api/sugarbushes/3')[0].body).toEqual({
      boundary: { type: 'Polygon', coordinates: [square] },
    });
    expect(api.to('PATCH /api/sugarbushes/3')[0].headers.get('x-csrf-token')).toBe('token-1');
  });

  it('when the file holds a line that does not close, then it is refused before sending, saying why', async () => {
    const { api, user } = openMap();
    await user.upload(
      await findGeojsonInput(),
      geojsonFile({ type: 'LineString', coordinates: square.slice(0, 4) }),
    );
    expect(await screen.findByRole('alert')).toHaveTextContent(
      /"Polygon 1" is a line or track that does not end where it starts \(its ends are \d+ m apart\)/,
    );
    expect(api.to('PATCH /api/sugarbushes/3')).toHaveLength(0);
  });

  it('when the server refuses a boundary, then its reason is shown', async () => {
    const { user } = openMap({
      routes: {
        'PATCH /api/sugarbushes/3': json(400, {
          error: {
            code: 'validation',
            message: 'Check the fields',
            fields: { boundary: 'The boundary is too large for one stand' },
          },
        }),
      },
    });
    await user.upload(
      await findGeojsonInput(),
      geojsonFile({ type: 'Polygon', coordinates: [square] }),
    );
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'The boundary is too large for one stand',
    );
  });

  it('when an MBTiles upload is refused, then progress shows while sending and the server message after', async () => {
    // After openMap: its API stand-in replaces XMLHttpRequest too, and this one must win.
    const { user } = openMap();
    const sent = fakeUpload(400, {
      error: {
        code: 'not-raster',
        message: 'This MBTiles file holds vector tiles; upload raster tiles (png, jpg or webp).',
      },
    });
    await user.upload(
      await screen.findByLabelText('MBTiles file'),
      new File(['x'], 'ledge.mbtiles'),
    );
    expect(await screen.findByText('50 %')).toBeInTheDocument();
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'The basemap was not added: This MBTiles file holds vector tiles; upload raster tiles (png, jpg or webp).',
    );
    expect(sent[0].url).toBe('/api/sugarbushes/3/basemaps');
    expect(sent[0].headers['x-csrf-token']).toBe('token-1');
    expect((sent[0].form.get('file') as File).name).toBe('ledge.mbtiles');
  });

  it('when an upload succeeds, then the new basemap becomes the background and is remembered', async () => {
    const basemap = {
      id: 12,
      sugarbushId: 3,
      name: 'Ledge 2025',
      format: 'png',
      minZoom: 14,
      maxZoom: 19,
      bounds: [-72.65, 44.3, -72.63, 44.32],
      center: null,
      sizeBytes: 1,
      createdAt: '2026-01-01',
    };
    let listed = false;
    const list: Handler = () => ({ status: 200, body: page(listed ? [basemap] : []) });
    const { user } = openMap({ routes: { 'GET /api/sugarbushes/3/basemaps': list } });
    fakeUpload(201, basemap);
    listed = true;
    await user.upload(
      await screen.findByLabelText('MBTiles file'),
      new File(['x'], 'ledge.mbtiles'),
    );
    const group = screen.getByRole('radiogroup', { name: 'Background' });
    await waitFor(() =>
      expect(within(group).getByRole('radio', { name: 'Ledge 2025' })).toBeChecked(),
    );
    expect(window.localStorage.getItem('clearwood.mapBackground.3')).toBe('basemap:12');
    await waitFor(() =>
      expect(screen.getByTestId('map-view')).toHaveAttribute('data-background', 'basemap'),
    );
  });

  it('offers the demo tiles only when they cover the trees', async () => {
    const { user } = openMap({
      routes: {
        'GET /tiles/owl-ledge/tiles.json': {
          name: 'Owl Ledge',
          minZoom: 14,
          maxZoom: 19,
          bounds: [-72.65, 44.3, -72.63, 44.32],
          attribution: 'Invented terrain',
        },
      },
    });
    const group = await screen.findByRole('radiogroup', { name: 'Background' });
    await user.click(await within(group).findByRole('radio', { name: 'Demo tiles' }));
    expect(screen.getByTestId('map-view')).toHaveAttribute('data-background', 'demo');
    expect(window.localStorage.getItem('clearwood.mapBackground.3')).toBe('demo');
  });

  it('when a tree is added by clicking the map, then it is posted with that position and chosen', async () => {
    const { api, user, router } = openMap({
      routes: { 'POST /api/sugarbushes/3/trees': json(201, { id: 77, tag: '0999' }) },
    });
    await user.click(await screen.findByRole('button', { name: 'Add tree by clicking the map' }));
    await user.click(screen.getByRole('button', { name: 'Click the ground' }));
    const form = screen.getByRole('form', { name: 'Add a tree' });
    await user.type(within(form).getByLabelText('Tag'), '0999');
    await user.selectOptions(within(form).getByLabelText('Species'), 'red-maple');
    await user.click(within(form).getByRole('button', { name: 'Add tree' }));
    await waitFor(() =>
      expect(new URLSearchParams(router.state.location.search).get('tree')).toBe('77'),
    );
    expect(api.to('POST /api/sugarbushes/3/trees')[0].body).toEqual({
      tag: '0999',
      species: 'red-maple',
      status: 'active',
      lat: 44.3141,
      lng: -72.6402,
    });
  });

  it('when location is blocked, then Where am I says how to allow it', async () => {
    vi.stubGlobal('navigator', {
      ...navigator,
      geolocation: {
        getCurrentPosition: (_ok: unknown, fail: (e: { code: number }) => void) =>
          fail({ code: 1 }),
      },
    });
    const { user } = openMap({ role: 'tapper' });
    await user.click(await screen.findByRole('button', { name: 'Where am I' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      "Location is blocked for Clearwood. Allow it in your browser's site settings, then try again.",
    );
  });

  it('when a tree is moved and the new position confirmed, then it is patched with the new lat/lng; cancel sends nothing', async () => {
    const { api, user } = openMap({
      url: '/sugarbushes/3/map?tree=1',
      routes: {
        'PATCH /api/trees/1': (req: { body: unknown }) => ({ status: 200, body: req.body }),
      },
    });
    const card = await screen.findByRole('region', { name: 'Tree 0412' });
    await user.click(within(card).getByRole('button', { name: 'Move this tree' }));
    await user.click(screen.getByRole('button', { name: 'Drop the marker' }));
    expect(within(card).getByText('Save new position?')).toBeInTheDocument();
    await user.click(within(card).getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('button', { name: 'Drop the marker' })).not.toBeInTheDocument();
    expect(api.to('PATCH /api/trees/1')).toHaveLength(0);

    await user.click(within(card).getByRole('button', { name: 'Move this tree' }));
    await user.click(screen.getByRole('button', { name: 'Drop the marker' }));
    await user.click(within(card).getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(api.to('PATCH /api/trees/1')).toHaveLength(1));
    expect(api.to('PATCH /api/trees/1')[0].body).toEqual({ lat: 44.3131, lng: -72.6411 });
    await waitFor(() =>
      expect(within(card).queryByText('Save new position?')).not.toBeInTheDocument(),
    );
  });
});

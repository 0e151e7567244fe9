import { onlineManager, QueryObserver } from '@tanstack/react-query';
import { act, screen, waitFor, within } from '@testing-library/react';
import { registerFieldEntryDefaults, refusedEntries, type FieldEntry } from '@/lib/field-entries';
import { treeDetailKeys } from '@/lib/tree-detail-keys';
import { json, mockApi } from '@/test/api-mock';
import { meAs } from '@/test/fixtures';
import { renderPage } from '@/test/render';
import { FieldEntryStatus } from './field-entry-status';

const entry: FieldEntry = {
  kind: 'measurement',
  clientId: '0b6f3c3e-5d1a-4c1e-9d7a-3e2f1a0b9c8d',
  treeId: 5,
  tag: 'B-5',
  input: { measuredOn: '2026-10-02', dbhCm: 41.2 },
};

afterEach(() => refusedEntries.clear());

describe('entries the server refused', () => {
  it('when a sent entry is refused, then it is listed with the reason and stays until discarded after a confirmation', async () => {
    mockApi({
      'GET /api/auth/me': meAs('forester'),
      'POST /api/trees/5/measurements': json(409, {
        error: { code: 'tree-retired', message: 'Tree B-5 is marked removed' },
      }),
    });
    const { queryClient, user } = renderPage({
      path: '/',
      url: '/',
      element: <FieldEntryStatus />,
    });
    registerFieldEntryDefaults(queryClient);
    await act(() =>
      queryClient
        .getMutationCache()
        .build(queryClient, { mutationKey: ['field-entry'] })
        .execute(entry)
        .catch(() => undefined),
    );
    expect(await screen.findByText('1 entry not accepted')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Review' }));
    expect(screen.getByText('Tree B-5 is marked removed')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Discard…' }));
    expect(screen.getByText(/Discard this entry\?/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Discard it' }));
    await waitFor(() => expect(screen.queryByText('1 entry not accepted')).not.toBeInTheDocument());
    expect(refusedEntries.list()).toEqual([]);
  });

  it('when a refused reading is edited, then it is sent again with a new client id and leaves the list', async () => {
    const api = mockApi({
      'GET /api/auth/me': meAs('forester'),
      'POST /api/trees/5/measurements': json(201, { id: 1 }),
    });
    refusedEntries.add({
      entry,
      code: 'unconfirmed-outlier',
      message: '4.5 cm more than last season — re-measure or confirm.',
      fields: { confirmedOutlier: '4.5 cm more than last season — re-measure or confirm' },
      refusedAt: '2026-10-02T12:00:00Z',
    });
    const { queryClient, user } = renderPage({
      path: '/',
      url: '/',
      element: <FieldEntryStatus />,
    });
    registerFieldEntryDefaults(queryClient);
    await user.click(await screen.findByRole('button', { name: 'Review' }));
    await user.click(screen.getByRole('button', { name: 'Edit and send again' }));
    await user.clear(screen.getByLabelText('DBH (cm)'));
    await user.type(screen.getByLabelText('DBH (cm)'), '40.9');
    await user.click(screen.getByLabelText('I measured again: this reading is right'));
    await user.click(screen.getByRole('button', { name: 'Send again' }));
    await waitFor(() => expect(api.to('POST /api/trees/5/measurements')).toHaveLength(1));
    const body = api.to('POST /api/trees/5/measurements')[0].body as Record<string, unknown>;
    expect(body.dbhCm).toBe(40.9);
    expect(body.confirmedOutlier).toBe(true);
    expect(body.clientId).not.toBe(entry.clientId);
    expect(refusedEntries.list()).toEqual([]);
  });
});

const sap: FieldEntry = {
  kind: 'sap',
  clientId: '5d2c1b7e-8f3a-4b6c-9e1d-2a3b4c5d6e7f',
  sugarbushId: 3,
  input: { collectedOn: '2026-03-14', volumeL: 860, sugarPct: 2.5 },
};
const weather: FieldEntry = {
  kind: 'weather',
  clientId: '7a8b9c0d-1e2f-4a3b-8c4d-5e6f7a8b9c0d',
  sugarbushId: 3,
  input: { date: '2026-03-14', minC: -4, maxC: 5 },
};

describe('an entry the server stored', () => {
  it('when the refresh after its answer cannot finish (the device went offline), then it no longer counts as waiting to send', async () => {
    mockApi({
      'GET /api/auth/me': meAs('forester'),
      'POST /api/trees/5/measurements': json(201, { id: 1 }),
    });
    const { queryClient } = renderPage({ path: '/', url: '/', element: <FieldEntryStatus /> });
    registerFieldEntryDefaults(queryClient);
    // The tree's page is open: the answer refreshes it, and that read never comes back.
    let reads = 0;
    const treePage = new QueryObserver(queryClient, {
      queryKey: treeDetailKeys.tree(5),
      queryFn: () => (reads++ === 0 ? Promise.resolve({ id: 5 }) : new Promise(() => undefined)),
    });
    const unsubscribe = treePage.subscribe(() => undefined);
    await waitFor(() => expect(treePage.getCurrentResult().status).toBe('success'));
    let sent = false;
    act(() => {
      void queryClient
        .getMutationCache()
        .build(queryClient, { mutationKey: ['field-entry'] })
        .execute(entry)
        .then(() => (sent = true));
    });
    await waitFor(() => expect(sent).toBe(true));
    expect(reads).toBe(2);
    expect(treePage.getCurrentResult().fetchStatus).toBe('fetching');
    expect(screen.queryByText(/waiting to send/)).not.toBeInTheDocument();
    expect(queryClient.isMutating({ mutationKey: ['field-entry'] })).toBe(0);
    unsubscribe();
  });
});

describe('a stand’s sap and weather in the queue', () => {
  afterEach(() => act(() => onlineManager.setOnline(true)));

  it('when a day’s sap waits offline, then the shell counts it as waiting to send', async () => {
    mockApi({ 'GET /api/auth/me': meAs('tapper') });
    const { queryClient } = renderPage({ path: '/', url: '/', element: <FieldEntryStatus /> });
    registerFieldEntryDefaults(queryClient);
    act(() => onlineManager.setOnline(false));
    act(() => {
      void queryClient
        .getMutationCache()
        .build(queryClient, { mutationKey: ['field-entry'] })
        .execute(sap)
        .catch(() => undefined);
    });
    expect(await screen.findByText('1 waiting to send')).toBeInTheDocument();
  });

  it('when sap and weather were refused, then the list names them by day, and one sent again goes to its stand with a new id', async () => {
    const api = mockApi({
      'GET /api/auth/me': meAs('tapper'),
      'POST /api/sugarbushes/3/sap': json(201, { id: 9 }),
    });
    for (const entry of [sap, weather])
      refusedEntries.add({
        entry,
        code: 'forbidden',
        message: 'Your role in this sugarbush does not record the season log',
        refusedAt: '2026-03-14T12:00:00Z',
      });
    const { queryClient, user } = renderPage({
      path: '/',
      url: '/',
      element: <FieldEntryStatus />,
    });
    registerFieldEntryDefaults(queryClient);
    await user.click(await screen.findByRole('button', { name: 'Review' }));
    const items = screen.getAllByRole('listitem');
    expect(items[0]).toHaveTextContent('Sap of Mar 14, 2026');
    expect(items[1]).toHaveTextContent('Weather of Mar 14, 2026');
    expect(items[0]).not.toHaveTextContent('Tree');
    await user.click(within(items[0]).getByRole('button', { name: 'Send again' }));
    await waitFor(() => expect(api.to('POST /api/sugarbushes/3/sap')).toHaveLength(1));
    const body = api.to('POST /api/sugarbushes/3/sap')[0].body as Record<string, unknown>;
    expect(body).toMatchObject({ collectedOn: '2026-03-14', volumeL: 860, sugarPct: 2.5 });
    expect(body.clientId).not.toBe(sap.clientId);
    expect(refusedEntries.list().map((r) => r.entry.kind)).toEqual(['weather']);
  });
});

describe('editing a refused entry of any kind', () => {
  const renderRefused = (refused: Parameters<typeof refusedEntries.add>[0]) => {
    refusedEntries.add(refused);
    const rendered = renderPage({ path: '/', url: '/', element: <FieldEntryStatus /> });
    registerFieldEntryDefaults(rendered.queryClient);
    return rendered;
  };

  it('when a refused day of weather is edited, then the server’s reason sits on its field, the shared schema checks the change, and the corrected day is sent', async () => {
    const api = mockApi({
      'GET /api/auth/me': meAs('tapper'),
      'POST /api/sugarbushes/3/weather': json(201, { date: '2026-03-14' }),
    });
    const { user } = renderRefused({
      entry: weather,
      code: 'invalid-input',
      message: 'Check the day high',
      fields: { maxC: 'The day high was typed in °F' },
      refusedAt: '2026-03-14T12:00:00Z',
    });
    await user.click(await screen.findByRole('button', { name: 'Review' }));
    await user.click(screen.getByRole('button', { name: 'Edit and send again' }));
    const high = screen.getByLabelText('Day high (°C)');
    expect(high).toHaveAccessibleDescription('The day high was typed in °F');
    await user.clear(high);
    await user.type(high, '-6');
    await user.click(screen.getByRole('button', { name: 'Send again' }));
    expect(await screen.findByText('The day high cannot be below the night low')).toBeVisible();
    expect(api.to('POST /api/sugarbushes/3/weather')).toHaveLength(0);
    await user.clear(high);
    await user.type(high, '6.5');
    await user.click(screen.getByRole('button', { name: 'Send again' }));
    await waitFor(() => expect(api.to('POST /api/sugarbushes/3/weather')).toHaveLength(1));
    const body = api.to('POST /api/sugarbushes/3/weather')[0].body as Record<string, unknown>;
    expect(body).toMatchObject({ date: '2026-03-14', minC: -4, maxC: 6.5 });
    expect(body.clientId).not.toBe(weather.clientId);
    expect(refusedEntries.list()).toEqual([]);
  });

  it('when a refused day of sap is edited, then its optional fields go as null when left empty and the rest as typed', async () => {
    const api = mockApi({
      'GET /api/auth/me': meAs('tapper'),
      'POST /api/sugarbushes/3/sap': json(201, { id: 9 }),
    });
    const { user } = renderRefused({
      entry: { ...sap, input: { ...sap.input, heldAtC: 3, note: 'Tank 2' } },
      code: 'invalid-input',
      message: 'Check the sugar content',
      fields: { sugarPct: 'Maple sap is rarely above 12 °Brix: check the refractometer' },
      refusedAt: '2026-03-14T12:00:00Z',
    });
    await user.click(await screen.findByRole('button', { name: 'Review' }));
    await user.click(screen.getByRole('button', { name: 'Edit and send again' }));
    expect(screen.getByLabelText('Sugar (°Brix)')).toHaveAccessibleDescription(
      /rarely above 12 °Brix/,
    );
    await user.clear(screen.getByLabelText('Sugar (°Brix)'));
    await user.type(screen.getByLabelText('Sugar (°Brix)'), '2.8');
    await user.clear(screen.getByLabelText('Held at (°C)'));
    await user.selectOptions(screen.getByLabelText('Collection'), 'Vacuum tubing');
    await user.click(screen.getByRole('button', { name: 'Send again' }));
    await waitFor(() => expect(api.to('POST /api/sugarbushes/3/sap')).toHaveLength(1));
    const body = api.to('POST /api/sugarbushes/3/sap')[0].body as Record<string, unknown>;
    expect(body).toMatchObject({
      collectedOn: '2026-03-14',
      volumeL: 860,
      sugarPct: 2.8,
      heldAtC: null,
      collection: 'vacuum',
      syrupMadeL: null,
      note: 'Tank 2',
    });
  });

  it('when a refused taphole is edited, then an out-of-range depth is stopped by the shared schema and the corrected hole is sent to its tree', async () => {
    const api = mockApi({
      'GET /api/auth/me': meAs('tapper'),
      'POST /api/trees/5/tapholes': json(201, { id: 4 }),
    });
    const taphole: FieldEntry = {
      kind: 'taphole',
      clientId: '9c8b7a6d-5e4f-4a3b-9c2d-1e0f9a8b7c6d',
      treeId: 5,
      tag: 'B-5',
      input: {
        season: 2026,
        heightCm: 95,
        azimuthDeg: 140,
        depthCm: 5,
        bitCm: 0.79,
        collection: 'gravity',
        stainHit: true,
      },
    };
    const { user } = renderRefused({
      entry: taphole,
      code: 'too-close',
      message: 'Within 15 cm of a hole drilled in 2025',
      refusedAt: '2026-03-02T12:00:00Z',
    });
    await user.click(await screen.findByRole('button', { name: 'Review' }));
    await user.click(screen.getByRole('button', { name: 'Edit and send again' }));
    expect(screen.getByText('Tree B-5: Taphole for 2026')).toBeVisible();
    expect(screen.getAllByText('Within 15 cm of a hole drilled in 2025')).toHaveLength(1);
    expect(screen.getByLabelText(/Hit stained wood/)).toHaveValue('yes');
    await user.clear(screen.getByLabelText('Depth (cm)'));
    await user.type(screen.getByLabelText('Depth (cm)'), '12');
    await user.click(screen.getByRole('button', { name: 'Send again' }));
    expect(await screen.findByText(/A hole is 1–8 cm deep/)).toBeVisible();
    await user.clear(screen.getByLabelText('Depth (cm)'));
    await user.type(screen.getByLabelText('Depth (cm)'), '4.5');
    await user.clear(screen.getByLabelText('Azimuth (°)'));
    await user.type(screen.getByLabelText('Azimuth (°)'), '200');
    await user.selectOptions(screen.getByLabelText(/Hit stained wood/), 'Not noted');
    await user.click(screen.getByRole('button', { name: 'Send again' }));
    await waitFor(() => expect(api.to('POST /api/trees/5/tapholes')).toHaveLength(1));
    const body = api.to('POST /api/trees/5/tapholes')[0].body as Record<string, unknown>;
    expect(body).toMatchObject({ season: 2026, azimuthDeg: 200, depthCm: 4.5, stainHit: null });
    expect(body.clientId).not.toBe(taphole.clientId);
  });
});

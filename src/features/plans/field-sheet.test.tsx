import { screen, waitFor, within } from '@testing-library/react';
import type { FieldSheetLine, FieldSheetPage } from '@shared/schemas/issued-plan';
import { FieldSheetRoute } from '@/app/routes/field-sheet';
import { json, mockApi, type Handler } from '@/test/api-mock';
import { meAs, sugarbush } from '@/test/fixtures';
import { renderPage } from '@/test/render';

const SHEET = 'GET /api/sugarbushes/3/plan/field-sheet';

const line = (n: number, extra: Partial<FieldSheetLine> = {}): FieldSheetLine => ({
  treeId: 100 + n,
  tag: `W-${String(n).padStart(4, '0')}`,
  verdict: 'tap',
  taps: 1,
  placements: [{ azimuthDeg: 200, heightCm: 110 }],
  bitCm: 0.79375,
  depthCm: 5.08,
  hazards: [],
  position: n,
  ...extra,
});

/** A stand of `total` lines to tap, answered 500 at a time as the API pages them. */
const sheetOf =
  (total: number, head: Partial<FieldSheetPage> = {}): Handler =>
  (req) => {
    const page = Number(req.url.searchParams.get('page'));
    const size = Number(req.url.searchParams.get('pageSize'));
    const items = Array.from(
      { length: Math.max(0, Math.min(size, total - (page - 1) * size)) },
      (_, i) => line((page - 1) * size + i + 1),
    );
    if (page === 1 && items.length > 0)
      items[0] = line(1, {
        hazards: ['Hornets in the crotch at 2 m.'],
        taps: 2,
        placements: [
          { azimuthDeg: 200, heightCm: 110 },
          { azimuthDeg: 20, heightCm: 85 },
        ],
      });
    const body: FieldSheetPage = {
      season: 2026,
      printing: 'issued',
      issued: { version: 2, issuedAt: '2026-02-20T15:04:00.000Z', issuedBy: 'Ada Fernwood' },
      profile: { key: 'conservative', label: 'Conservative', source: 'Common practice' },
      standName: 'Owl Ledge',
      taps: total + 1,
      items,
      total,
      page,
      pageSize: size,
      ...head,
    };
    return { status: 200, body };
  };

function open(
  routes: Record<string, unknown>,
  url = '/sugarbushes/3/plan/field-sheet?season=2026',
) {
  const api = mockApi({
    'GET /api/auth/me': meAs('tapper', 'metric'),
    'GET /api/sugarbushes/3': sugarbush(),
    ...routes,
  });
  const view = renderPage({
    path: '/sugarbushes/:id/plan/field-sheet',
    url,
    element: <FieldSheetRoute />,
  });
  return { api, ...view };
}

describe('the printed field sheet', () => {
  it('loads page after page until the last, then lists each tree once with hazards first, every tap in words and degrees, bit and depth, and prints', async () => {
    const print = vi.fn();
    vi.stubGlobal('print', print);
    const { api, user } = open({ [SHEET]: sheetOf(520) });
    const table = await screen.findByRole('table', { name: 'Field sheet' }, { timeout: 10_000 });
    expect(api.to(SHEET).map((r) => r.url.searchParams.get('page'))).toEqual(['1', '2']);
    expect(api.to(SHEET)[0].url.searchParams.get('season')).toBe('2026');
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(521);
    const first = rows[1];
    expect(within(first).getByText('W-0001')).toBeInTheDocument();
    expect(within(first).getByText('Hazard: Hornets in the crotch at 2 m.')).toBeInTheDocument();
    expect(within(first).getByText('south (200°) at 1.10 m')).toBeInTheDocument();
    expect(within(first).getByText('north (20°) at 0.85 m')).toBeInTheDocument();
    expect(within(first).getByText('7.9 mm bit, 5.1 cm deep including bark')).toBeInTheDocument();
    expect(within(first).getByRole('img', { name: 'Box to tick for W-0001' })).toBeInTheDocument();
    expect(within(rows[520]).getByText('W-0520')).toBeInTheDocument();

    expect(screen.getByText('Owl Ledge')).toBeInTheDocument();
    expect(screen.getByText('Conservative')).toBeInTheDocument();
    expect(
      screen.getByText('The issued plan, version 2, issued Feb 20, 2026 by Ada Fernwood.'),
    ).toBeInTheDocument();
    expect(screen.getByText(/520 to tap, 521 taps — the whole stand/)).toBeInTheDocument();
    const cautions = screen.getByRole('complementary', { name: 'Cautions for the crew' });
    expect(cautions).toHaveTextContent(/eye protection/);
    expect(cautions).toHaveTextContent(/Ladders/);
    expect(cautions).toHaveTextContent(/local codes/);

    await user.click(screen.getByRole('button', { name: 'Print' }));
    expect(print).toHaveBeenCalledOnce();
  }, 20_000);

  it('while pages are on their way, then it shows how many lines have come and printing waits', async () => {
    let release: () => void = () => undefined;
    const gate = new Promise<void>((resolve) => (release = resolve));
    const pages = sheetOf(700);
    open({
      [SHEET]: async (req: Parameters<Handler>[0]) => {
        if (req.url.searchParams.get('page') === '2') await gate;
        return pages(req);
      },
    });
    expect(await screen.findByText('Loading the sheet: 500 of 700 trees')).toBeInTheDocument();
    expect(screen.getByRole('progressbar', { name: 'Sheet lines loaded' })).toHaveAttribute(
      'value',
      '500',
    );
    expect(screen.getByRole('button', { name: 'Print' })).toBeDisabled();
    release();
    await waitFor(() => expect(screen.getByRole('button', { name: 'Print' })).toBeEnabled());
  });

  it('when the plan was filtered and not issued, then the sheet asks with those filters and says what it prints', async () => {
    const { api } = open(
      { [SHEET]: sheetOf(0, { printing: 'advice', issued: null }) },
      '/sugarbushes/3/plan/field-sheet?season=2026&verdict=tap-reduced&q=W-01',
    );
    expect(await screen.findByText(/No tree to tap among the trees chosen/)).toBeInTheDocument();
    const asked = api.to(SHEET)[0].url.searchParams;
    expect([asked.get('verdict'), asked.get('q')]).toEqual(['tap-reduced', 'W-01']);
    expect(
      screen.getByText('Today’s advice: no plan has been issued for this season.'),
    ).toBeInTheDocument();
    expect(screen.getByText(/only tags containing “W-01”, verdict Tap fewer/)).toBeInTheDocument();
  });

  it('when a page fails, then the sheet says so and offers a retry', async () => {
    open({ [SHEET]: json(500, { error: { code: 'internal', message: 'Boom' } }) });
    expect(await screen.findByText("We couldn't load the field sheet.")).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Retry' })).toBeInTheDocument();
  });
});

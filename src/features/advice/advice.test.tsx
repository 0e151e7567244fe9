import { render, screen, waitFor, within } from '@testing-library/react';
import { upcomingSeason } from '@shared/schemas/plan';
import { VerdictBadge } from '@/components/verdict-badge';
import { treeAdvice } from '@/test/advice-fixtures';
import { json, mockApi, type Handler } from '@/test/api-mock';
import { meAs, page, taphole } from '@/test/fixtures';
import { renderPage } from '@/test/render';
import { AdviceCard } from './components/advice-card';

const ADVICE = 'GET /api/trees/7/advice';

function openAdvice(
  unitSystem: 'imperial' | 'metric',
  routes: Record<string, unknown> = {},
  url = '/trees/7',
) {
  const api = mockApi({
    'GET /api/auth/me': meAs('tapper', unitSystem),
    [ADVICE]: treeAdvice({
      holesInReach: [
        { ...taphole({ season: 2026, azimuthDeg: 225, heightCm: 70 }) },
        { ...taphole({ season: 2026, azimuthDeg: 60, heightCm: 120 }) },
      ],
    }),
    'GET /api/trees/7/tapholes': page([]),
    ...routes,
  });
  const view = renderPage({ path: '/trees/:treeId', url, element: <AdviceCard treeId={7} /> });
  return { api, ...view };
}

describe('the advice card', () => {
  it('when the advice is to tap twice in metric, then the first line names each side and its height in metres, and the drill in millimetres', async () => {
    const { api } = openAdvice('metric');
    expect(
      await screen.findByText('Tap twice: south at 1.10 m, north at 0.80 m.'),
    ).toBeInTheDocument();
    expect(
      screen.getByText('Drill with a 7.9 mm bit, 5.1 cm deep including bark.'),
    ).toBeInTheDocument();
    expect(api.to(ADVICE)[0].url.searchParams.get('season')).toBe(String(upcomingSeason()));
  });

  it('when the user works in imperial units, then heights read in feet and inches and the bit as a fraction', async () => {
    openAdvice('imperial');
    expect(
      await screen.findByText('Tap twice: south at 3 ft 7 in, north at 2 ft 7 in.'),
    ).toBeInTheDocument();
    expect(
      screen.getByText('Drill with a 5/16 in bit, 2 in deep including bark.'),
    ).toBeInTheDocument();
  });

  it('when a warning has a source, then the source is one click away behind "Why?"', async () => {
    const { user } = openAdvice('metric', {
      [ADVICE]: treeAdvice({
        verdict: 'tap-reduced',
        taps: 1,
        placements: [{ azimuthDeg: 135, heightCm: 100 }],
        reasons: ['Growth is below the minimum for two taps.'],
        warnings: [
          {
            code: 'slow-growth',
            message: 'Basal area grew 1.10 in² a year; a tree this size needs 2.60 in².',
            source: 'van den Berg and others 2016, Forest Science',
          },
          { code: 'stale-measurement', message: 'Last measured in 2021.' },
        ],
      }),
    });
    const warnings = await screen.findByRole('region', { name: 'Warnings' });
    const slow = within(warnings)
      .getByText(/Basal area grew 1.10/)
      .closest('li')!;
    expect(within(slow).getByText('Slow growth.')).toBeInTheDocument();
    const source = within(slow).getByText(/Source: van den Berg/);
    expect(source).not.toBeVisible();

    await user.click(within(slow).getByRole('button', { name: 'Why?' }));
    expect(source).toBeVisible();
    expect(within(slow).getByRole('button', { name: 'Why?' })).toHaveAttribute(
      'aria-expanded',
      'true',
    );
    // A warning without a source offers no "Why?".
    const stale = within(warnings)
      .getByText(/Last measured in 2021/)
      .closest('li')!;
    expect(within(stale).queryByRole('button', { name: 'Why?' })).toBeNull();
    expect(screen.getByText('Growth is below the minimum for two taps.')).toBeInTheDocument();
  });

  it('shows clear wood now, after drilling and in the long run, and growth against the minimum', async () => {
    openAdvice('imperial');
    expect(
      await screen.findByText('94 % now → 93 % after drilling → 92 % in the long run at this rate'),
    ).toBeInTheDocument();
    expect(await screen.findByText('7.05 in²/yr measured')).toBeInTheDocument();
    expect(
      screen.getByText(/2 taps a year at this bit and depth need at least 2.60 in²\/yr/),
    ).toBeInTheDocument();
    // The 2016 study's healthy trees are context, not the test.
    expect(
      screen.getByText(/healthy trees in the 2016 study grew about 1.8 in²\/yr at 10 in/),
    ).toBeInTheDocument();
    expect(
      screen.getByRole('img', { name: /Clear wood tapped twice a year: 94 % in 2027/ }),
    ).toBeInTheDocument();
  });

  it('draws the trunk with every earlier hole from the record and the advised spots, summed up in its name and listed as text', async () => {
    openAdvice('metric', {
      'GET /api/trees/7/tapholes': page([
        taphole({ id: 1, season: 2026, azimuthDeg: 225, heightCm: 70 }),
        taphole({ id: 2, season: 2026, azimuthDeg: 60, heightCm: 120 }),
      ]),
    });
    const diagram = await screen.findByRole('img', { name: /Trunk of tree 0412/ });
    expect(diagram).toHaveAccessibleName(
      'Trunk of tree 0412, unrolled from north round to north: 2 earlier holes, 2 still in reach of new holes; 2 advised spots.',
    );
    const list = screen.getByRole('list', { name: 'Holes on this trunk' });
    expect(list).toHaveTextContent('Advised spot: south (180°) at 1.10 m');
    expect(list).toHaveTextContent(
      '2026: south-west (225°) at 0.70 m, 94 % of its stain still in reach',
    );
  });

  it('beside the projection, gives the long-run share and says when old stain stays in reach for decades', async () => {
    openAdvice('metric', {
      [ADVICE]: treeAdvice({ steadyStateShare: 0.86, stainReachSeasons: 45 }),
    });
    const longRun = await screen.findByText('In the long run at this rate');
    const figures = longRun.closest('dl')!;
    expect(within(figures).getByText('86 % clear wood')).toBeInTheDocument();
    expect(within(figures).getByText('About 45 years')).toBeInTheDocument();
    expect(
      within(figures).getByText(/stays within reach of new holes for decades/),
    ).toBeInTheDocument();
  });

  it('with the drilling, says not to drill a frozen trunk, and when the log knows it is frozen, to wait', async () => {
    openAdvice('metric');
    const notes = await screen.findByRole('list', { name: 'With the drilling' });
    expect(within(notes).getByText(/no colder than about −5 °C/)).toBeInTheDocument();
    expect(screen.queryByText('Wait to drill: the trunk is frozen.')).toBeNull();
  });

  it('when the log knows the trunk is frozen, then it says to wait', async () => {
    openAdvice('metric', { [ADVICE]: treeAdvice({ frozen: true }) });
    expect(await screen.findByText('Wait to drill: the trunk is frozen.')).toBeInTheDocument();
  });

  it('labels a growth that carries fewer taps apart from slow growth', async () => {
    openAdvice('metric', {
      [ADVICE]: treeAdvice({
        warnings: [
          {
            code: 'growth-limits-taps',
            message: 'Basal area grew 1.80 in² a year: enough for 1 tap.',
            source: 'Clearwood tapping-zone model',
          },
        ],
      }),
    });
    const warnings = await screen.findByRole('region', { name: 'Warnings' });
    expect(within(warnings).getByText('Growth carries fewer taps.')).toBeInTheDocument();
    expect(within(warnings).queryByText('Slow growth.')).toBeNull();
  });

  it('when the stand was moved to the rule in force, then the notice shows with the advice', async () => {
    openAdvice('metric', {
      [ADVICE]: treeAdvice({
        profile: { ...treeAdvice().profile, notice: 'This stand followed a repealed table.' },
      }),
    });
    const notice = await screen.findByRole('complementary', { name: 'Guideline changed' });
    expect(within(notice).getByText('This stand followed a repealed table.')).toBeInTheDocument();
  });

  it('when the user steps to the season before, then that season is asked for and kept in the URL', async () => {
    const before = upcomingSeason() - 1;
    const { api, router, user } = openAdvice('metric', {
      [ADVICE]: ((req) => ({
        status: 200,
        body: treeAdvice({ season: Number(req.url.searchParams.get('season')) }),
      })) satisfies Handler,
    });
    await screen.findByRole('heading', { name: `Advice for ${upcomingSeason()}` });
    await user.click(screen.getByRole('button', { name: 'Previous season' }));
    expect(await screen.findByRole('heading', { name: `Advice for ${before}` })).toBeInTheDocument();
    await waitFor(() =>
      expect(api.to(ADVICE).at(-1)!.url.searchParams.get('season')).toBe(String(before)),
    );
    expect(new URLSearchParams(router.state.location.search).get('season')).toBe(String(before));
  });

  it('when a tree is resting, then it says so and gives no drilling', async () => {
    openAdvice('metric', {
      [ADVICE]: treeAdvice({ verdict: 'rest', taps: 0, placements: [] }),
      'GET /api/trees/7/tapholes': page([]),
    });
    expect(
      await screen.findByText('Rest this tree in 2027: drill no new holes.'),
    ).toBeInTheDocument();
    expect(screen.queryByText(/Drill with a/)).toBeNull();
    expect(screen.queryByRole('img', { name: /Trunk of tree/ })).toBeNull();
  });

  it('when the advice fails to load, then Retry asks again', async () => {
    let calls = 0;
    const { user } = openAdvice('metric', {
      [ADVICE]: ((req) =>
        ++calls === 1
          ? json(500, { error: { code: 'internal', message: 'Something went wrong' } })(req)
          : { status: 200, body: treeAdvice() }) satisfies Handler,
    });
    expect(await screen.findByText(/We couldn't work out the advice/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByText(/Tap twice/)).toBeInTheDocument();
  });
});

describe('the verdict badge', () => {
  it('shows the letter beside the label, so the verdict never rests on colour alone', () => {
    render(<VerdictBadge verdict="tap-reduced" />);
    expect(screen.getByText('F')).toBeInTheDocument();
    expect(screen.getByText('Tap fewer')).toBeInTheDocument();
  });

  it('in its compact form, shows the letter and names the verdict for assistive tech', () => {
    render(<VerdictBadge verdict="rest" showLabel={false} />);
    const badge = screen.getByRole('img', { name: 'Rest' });
    expect(badge).toHaveTextContent('R');
  });
});

import { screen, waitFor, within } from '@testing-library/react';
import { json } from '@/test/api-mock';
import { mapTree } from './map-fixtures';
import { cardRoutes, openMap, params } from './map-testing';

// jsdom has no canvas, so Leaflet stays out: see the stand-in.
vi.mock('./components/map-view', () => import('./map-view-stand-in'));

describe('the woods map', () => {
  it('when it opens, then the legend counts every verdict, puts unmapped trees under Not mapped, and totals the stand', async () => {
    openMap();
    const legend = await screen.findByRole('region', { name: 'Legend' });
    expect(within(legend).getByRole('heading', { name: '4 trees' })).toBeInTheDocument();
    expect(within(legend).getByText('Advice for season 2027')).toBeInTheDocument();
    expect(within(legend).getByTestId('legend-count-tap')).toHaveTextContent('1');
    expect(within(legend).getByTestId('legend-count-rest')).toHaveTextContent('1');
    expect(within(legend).getByTestId('legend-count-too-small')).toHaveTextContent('1');
    expect(within(legend).getByTestId('legend-count-not-mapped')).toHaveTextContent('1');
    expect(within(legend).getByText('Tap fewer')).toBeInTheDocument();
    expect(await screen.findAllByRole('button', { name: /^Marker / })).toHaveLength(3);
  });

  it('when the user filters by advice, then the URL carries it, the map shows only those trees, and the legend says how many match', async () => {
    const { router, user } = openMap();
    await screen.findByRole('region', { name: 'Legend' });
    await user.selectOptions(screen.getByLabelText('Advice'), 'rest');
    await waitFor(() => expect(params(router).get('verdict')).toBe('rest'));
    expect(await screen.findAllByRole('button', { name: /^Marker / })).toHaveLength(1);
    expect(screen.getByRole('button', { name: 'Marker 0007' })).toBeInTheDocument();
    expect(screen.getByText(/1 match the filters/)).toBeInTheDocument();
  });

  it('when a tree is clicked, then its card shows the tag, DBH in inches, the advice, taps and where, warnings and a link to the tree', async () => {
    const { router, user } = openMap({ unitSystem: 'imperial' });
    await user.click(await screen.findByRole('button', { name: 'Marker 0412' }));
    const card = await screen.findByRole('region', { name: 'Tree 0412' });
    expect(params(router).get('tree')).toBe('1');
    expect(await within(card).findByText('18.0 in')).toBeInTheDocument();
    expect(within(card).getByText('Oct 3, 2026')).toBeInTheDocument();
    expect(within(card).getByText('Tap')).toBeInTheDocument();
    expect(within(card).getByText('Tap 2 times')).toBeInTheDocument();
    const where = await within(card).findByRole('list', { name: 'Where to drill' });
    expect(
      within(where)
        .getAllByRole('listitem')
        .map((li) => li.textContent),
    ).toEqual(['south at 43 in (180°)', 'north at 31 in (0°)']);
    expect(within(card).getByText('Slow growth')).toBeInTheDocument();
    expect(within(card).getByRole('link', { name: 'Open tree 0412' })).toHaveAttribute(
      'href',
      '/trees/1',
    );
  });

  it('when the chosen tree has an open hazard note, then the card shows its text before the taps and where to drill', async () => {
    const { user } = openMap({
      routes: {
        'GET /api/trees/1/advice': {
          ...cardRoutes['GET /api/trees/1/advice'],
          hazards: [
            {
              noteId: 5,
              body: 'Dead limb hangs over the drop line.',
              createdAt: '2026-10-14T14:10:00Z',
            },
          ],
        },
      },
    });
    await user.click(await screen.findByRole('button', { name: 'Marker 0412' }));
    const card = await screen.findByRole('region', { name: 'Tree 0412' });
    const hazard = await within(card).findByRole('complementary', { name: 'Hazard at this tree' });
    expect(hazard).toHaveTextContent('Dead limb hangs over the drop line.');
    const where = await within(card).findByRole('list', { name: 'Where to drill' });
    const taps = within(card).getByText('Tap 2 times');
    for (const advice of [where, taps])
      expect(
        hazard.compareDocumentPosition(advice) & Node.DOCUMENT_POSITION_FOLLOWING,
      ).toBeTruthy();
  });

  it("when a tree is chosen, then the card shows the map's advice at once and only then asks for the tree and its advice for the map's season, saying it is loading", async () => {
    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    const { api, user } = openMap({
      routes: {
        'GET /api/trees/1/advice': async () => {
          await held;
          return { status: 200, body: cardRoutes['GET /api/trees/1/advice'] };
        },
      },
    });
    const marker = await screen.findByRole('button', { name: 'Marker 0412' });
    expect(api.to('GET /api/trees/1')).toHaveLength(0);
    expect(api.to('GET /api/trees/1/advice')).toHaveLength(0);

    await user.click(marker);
    const card = await screen.findByRole('region', { name: 'Tree 0412' });
    expect(within(card).getByText('Tap 2 times')).toBeInTheDocument();
    expect(within(card).getByText('Slow growth')).toBeInTheDocument();
    expect(within(card).getByRole('status')).toHaveTextContent('Loading the tree’s details…');
    expect(within(card).queryByRole('list', { name: 'Where to drill' })).not.toBeInTheDocument();
    await waitFor(() => expect(api.to('GET /api/trees/1/advice')).toHaveLength(1));
    expect(api.to('GET /api/trees/1/advice')[0].url.searchParams.get('season')).toBe('2027');
    expect(api.to('GET /api/trees/1')).toHaveLength(1);
    expect(api.to('GET /api/trees/2/advice')).toHaveLength(0);

    release();
    const where = await within(card).findByRole('list', { name: 'Where to drill' });
    expect(within(where).getAllByRole('listitem')).toHaveLength(2);
    expect(within(card).getByText('45.7 cm')).toBeInTheDocument();
    expect(within(card).queryByRole('status')).not.toBeInTheDocument();
  });

  it("when a tree's details cannot be loaded, then the card says so and a retry asks again", async () => {
    const { api, user } = openMap({
      routes: {
        'GET /api/trees/1/advice': json(500, { error: { code: 'x', message: 'Disk full' } }),
      },
    });
    await user.click(await screen.findByRole('button', { name: 'Marker 0412' }));
    const card = await screen.findByRole('region', { name: 'Tree 0412' });
    const alert = await within(card).findByRole('alert');
    expect(alert).toHaveTextContent('We couldn’t load this tree’s details.');
    expect(within(card).getByText('Tap 2 times')).toBeInTheDocument();
    await user.click(within(alert).getByRole('button', { name: 'Retry' }));
    await waitFor(() => expect(api.to('GET /api/trees/1/advice')).toHaveLength(2));
    expect(api.to('GET /api/trees/1')).toHaveLength(1);
  });

  it('when a tag is found, then that tree is chosen; arrow keys step on in tag order; Esc closes the card', async () => {
    const { router, user } = openMap();
    await screen.findByRole('region', { name: 'Legend' });
    await user.type(screen.getByLabelText('Find tree by tag'), '7{Enter}');
    expect(await screen.findByRole('region', { name: 'Tree 0007' })).toBeInTheDocument();
    expect(screen.getByText('1 of 3 on the map')).toBeInTheDocument();

    await user.click(screen.getByLabelText('Woods map'));
    await user.keyboard('{ArrowRight}');
    expect(await screen.findByRole('region', { name: 'Tree 0100' })).toBeInTheDocument();
    await user.keyboard('{ArrowRight}');
    expect(await screen.findByRole('region', { name: 'Tree 0412' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Next tree →' }));
    expect(await screen.findByRole('region', { name: 'Tree 0007' })).toBeInTheDocument();

    await user.keyboard('{Escape}');
    await waitFor(() => expect(params(router).has('tree')).toBe(false));
    expect(screen.queryByRole('region', { name: /^Tree / })).not.toBeInTheDocument();

    await user.clear(screen.getByLabelText('Find tree by tag'));
    await user.type(screen.getByLabelText('Find tree by tag'), '9999{Enter}');
    expect(
      await screen.findByText('No tree is tagged ‘9999’ in this sugarbush.'),
    ).toBeInTheDocument();
  });

  it('when no tree has a position, then it says how to map the first one', async () => {
    openMap({ stand: [mapTree({ id: 9, tag: '9', lat: null, lng: null })] });
    expect(
      await screen.findByText(
        'No mapped trees yet — import a CSV with lat/lng or add a tree on the map',
      ),
    ).toBeInTheDocument();
    const legend = screen.getByRole('region', { name: 'Legend' });
    expect(within(legend).getByTestId('legend-count-not-mapped')).toHaveTextContent('1');
  });

  it('when the map cannot be loaded, then it says so and a retry asks again', async () => {
    const { api, user } = openMap({
      routes: {
        'GET /api/sugarbushes/3/map': json(500, { error: { code: 'x', message: 'Disk full' } }),
      },
    });
    expect(await screen.findByText("We couldn't load the map.")).toBeInTheDocument();
    expect(screen.getByText('Disk full')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Retry' }));
    await waitFor(() => expect(api.to('GET /api/sugarbushes/3/map')).toHaveLength(2));
  });

  it('shows stand figures in the chosen units, and a tag outside the boundary chooses that tree', async () => {
    const { user } = openMap({ unitSystem: 'imperial' });
    const heading = await screen.findByRole('heading', { name: 'Stand figures' });
    const panel = heading.closest('section') as HTMLElement;
    expect(await within(panel).findByText('4.9 ac (2.0 ha)')).toBeInTheDocument();
    expect(within(panel).getByText('1 ft²/ac (0.3 m²/ha)')).toBeInTheDocument();
    expect(
      within(panel).getByText('median 19.0 ft, mean 20.3 ft (3.9–45.9 ft)'),
    ).toBeInTheDocument();
    await user.click(within(panel).getByRole('button', { name: '0100' }));
    expect(await screen.findByRole('region', { name: 'Tree 0100' })).toBeInTheDocument();
  });

  it('when a tapper opens the map, then no editing tools are offered', async () => {
    openMap({ role: 'tapper' });
    await screen.findByRole('region', { name: 'Legend' });
    expect(screen.getByRole('button', { name: 'Where am I' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Upload MBTiles' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Import boundary file' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Add tree here' })).not.toBeInTheDocument();
  });
});

import { configure, screen, waitFor, within } from '@testing-library/react';
import { vi } from 'vitest';
import { profiles } from '@shared/rules/index';
import type { GuidelinePreviewInput } from '@shared/schemas/guideline-preview';
import { upcomingSeason } from '@shared/schemas/plan';
import type { Sugarbush } from '@shared/schemas/sugarbush';
import { SettingsRoute } from '@/app/routes/settings';
import { queryRoots } from '@/lib/query-roots';
import { json, mockApi, type Handler } from '@/test/api-mock';
import { meAs, page, sugarbush } from '@/test/fixtures';
import { renderPage } from '@/test/render';
import { guidelinePreview, invitation, team } from './settings-fixtures';

// The page reads the stand, the user and the team before it shows; a busy machine is slow at it.
configure({ asyncUtilTimeout: 5000 });
vi.setConfig({ testTimeout: 20_000 });

const PREVIEW = 'POST /api/sugarbushes/3/guideline-preview';
const PATCH = 'PATCH /api/sugarbushes/3';

function openAsOwner(
  routes: Record<string, unknown> = {},
  unitSystem: 'imperial' | 'metric' = 'metric',
) {
  let stand: Sugarbush = sugarbush({ role: 'owner' });
  const api = mockApi({
    'GET /api/auth/me': meAs('owner', unitSystem),
    'GET /api/sugarbushes/3': () => ({ status: 200, body: stand }),
    'GET /api/sugarbushes/3/members': page(team()),
    'GET /api/sugarbushes/3/invitations': page([invitation()]),
    [PREVIEW]: guidelinePreview(),
    [PATCH]: ((req) => {
      stand = { ...stand, ...(req.body as Partial<Sugarbush>) };
      return { status: 200, body: stand };
    }) satisfies Handler,
    ...routes,
  });
  const view = renderPage({
    path: '/sugarbushes/:id/settings',
    url: '/sugarbushes/3/settings',
    element: <SettingsRoute />,
    strict: true,
  });
  return { api, ...view };
}

const season = upcomingSeason();
const previewButton = () =>
  screen.getByRole('button', { name: `See what this changes in ${season}` });
const figure = (panel: HTMLElement, label: string) =>
  within(panel).getByText(label, { selector: 'dt' }).nextElementSibling;
const sent = (api: ReturnType<typeof openAsOwner>['api']) =>
  api.to(PREVIEW).at(-1)!.body as GuidelinePreviewInput & { customProfile?: Record<string, never> };

describe('choosing a published guideline', () => {
  it('when the owner picks traditional and asks, then the preview shows the figures the API computed', async () => {
    const { api, user } = openAsOwner();
    const inUse = await screen.findByRole('radio', { name: profiles.conservative.label });
    expect(inUse).toBeChecked();
    expect(previewButton()).toBeDisabled();

    await user.click(screen.getByRole('radio', { name: profiles.traditional.label }));
    await user.click(previewButton());

    const panel = await screen.findByRole('region', { name: 'What this changes in 2027' });
    expect(sent(api)).toEqual({ profile: 'traditional', season });
    expect(figure(panel, 'Taps now')).toHaveTextContent('1,412');
    expect(figure(panel, 'Taps after')).toHaveTextContent('1,876');
    expect(figure(panel, 'Trees whose taps change')).toHaveTextContent('388');
    expect(figure(panel, 'Taps added')).toHaveTextContent('501');
    expect(figure(panel, 'Taps removed')).toHaveTextContent('37');
    expect(figure(panel, 'Trees become too small')).toHaveTextContent('0');
    expect(panel).toHaveTextContent(
      'From Conservative to Traditional: 1,412 taps on 905 trees become 1,876 taps on 1,004 trees.',
    );
    expect(panel).toHaveTextContent('The 2 biggest changes of 388.');

    const rows = within(
      within(panel).getByRole('table', { name: 'Trees that change' }),
    ).getAllByRole('row');
    expect(rows[1]).toHaveTextContent(/HC-0021\s*53\.3 cm\s*2 → 3/);
    expect(within(rows[1]).getByRole('link', { name: 'HC-0021' })).toHaveAttribute(
      'href',
      '/trees/21?season=2027',
    );
    expect(rows[2]).toHaveTextContent(/HC-0022\s*26\.1 cm\s*0 → 1/);
    expect(within(rows[2]).getByText('Too small')).toBeInTheDocument();
    expect(api.to(PATCH)).toHaveLength(0);
  });

  it('when another stand gives other figures, then the preview shows those instead', async () => {
    const { user } = openAsOwner({
      [PREVIEW]: guidelinePreview({
        from: { profile: 'conservative', label: 'Conservative', taps: 40, tappedTrees: 31 },
        to: { profile: 'ontario-buckets', label: 'Ontario, buckets', taps: 38, tappedTrees: 30 },
        tapsAdded: 0,
        tapsRemoved: 2,
        treesChanged: 2,
        treesBecomeTooSmall: 1,
        changes: [],
        changesTotal: 0,
      }),
    });
    await user.click(await screen.findByRole('radio', { name: profiles['ontario-buckets'].label }));
    await user.click(previewButton());
    const panel = await screen.findByRole('region', { name: 'What this changes in 2027' });
    expect(figure(panel, 'Taps now')).toHaveTextContent('40');
    expect(figure(panel, 'Taps after')).toHaveTextContent('38');
    expect(figure(panel, 'Trees become too small')).toHaveTextContent('1');
    expect(panel).toHaveTextContent("No tree's tap count changes this season.");
  });

  it('when the owner saves the previewed guideline, then it is sent, marked in use, and the season plan is fetched afresh', async () => {
    const { api, user, queryClient } = openAsOwner();
    const planKey = [...queryRoots.plans, 'list', 3, { season }];
    queryClient.setQueryData(planKey, { cached: true });
    await user.click(await screen.findByRole('radio', { name: profiles.traditional.label }));
    await user.click(previewButton());
    await user.click(await screen.findByRole('button', { name: 'Save this guideline' }));

    await waitFor(() => expect(api.to(PATCH)).toHaveLength(1));
    expect(api.to(PATCH)[0].body).toEqual({ profile: 'traditional' });
    const status = await screen.findByText(
      `Saved. The ${season} plan now follows ${profiles.traditional.label}.`,
      { exact: false },
    );
    expect(within(status).getByRole('link', { name: 'Open the season plan' })).toHaveAttribute(
      'href',
      `/sugarbushes/3/plan?season=${season}`,
    );
    expect(queryClient.getQueryState(planKey)?.isInvalidated).toBe(true);
    expect(screen.queryByRole('region', { name: /What this changes/ })).not.toBeInTheDocument();
    await waitFor(() =>
      expect(
        screen.getByRole('radio', { name: profiles.traditional.label }),
      ).toHaveAccessibleDescription(/^In use\./),
    );
  });

  it('when the owner cancels the preview, then nothing is saved and the guideline in use stays', async () => {
    const { api, user } = openAsOwner();
    await user.click(await screen.findByRole('radio', { name: profiles.traditional.label }));
    await user.click(previewButton());
    await user.click(await screen.findByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('region', { name: /What this changes/ })).not.toBeInTheDocument();
    expect(api.to(PATCH)).toHaveLength(0);
    expect(
      screen.getByRole('radio', { name: profiles.conservative.label }),
    ).toHaveAccessibleDescription(/^In use\./);
  });

  it('when the preview cannot be worked out, then the reason shows and nothing is saved', async () => {
    const { api, user } = openAsOwner({
      [PREVIEW]: json(500, {
        error: { code: 'server', message: 'The plan could not be computed' },
      }),
    });
    await user.click(await screen.findByRole('radio', { name: profiles.traditional.label }));
    await user.click(previewButton());
    expect(await screen.findByRole('alert')).toHaveTextContent('The plan could not be computed');
    expect(api.to(PATCH)).toHaveLength(0);
  });
});

describe("the stand's own guideline", () => {
  it('when the owner in inches sets 3 in sideways and previews, then the custom set goes in centimetres with the table in inches', async () => {
    const { api, user } = openAsOwner({}, 'imperial');
    await user.click(await screen.findByRole('radio', { name: 'Your own figures' }));
    const sideways = screen.getByRole('textbox', { name: 'Sideways, around the trunk (in)' });
    expect(sideways).toHaveValue('4');
    expect(screen.getByRole('textbox', { name: '1 tap from DBH (in)' })).toHaveValue('12');
    expect(screen.getByRole('textbox', { name: 'Vacuum tubing: bit (in)' })).toHaveValue('5/16');

    await user.clear(sideways);
    await user.type(sideways, '3');
    await user.click(previewButton());

    await screen.findByRole('region', { name: 'What this changes in 2027' });
    const body = sent(api);
    expect(body.profile).toBe('custom');
    expect(body.customProfile).toMatchObject({
      unit: 'in',
      bands: [
        { from: 12, taps: 1 },
        { from: 18, taps: 2 },
      ],
      spacing: { sidewaysCm: 7.62, verticalCm: 30.48 },
    });
  });

  it('when the first band starts below 20 cm, then the band says so and nothing is sent', async () => {
    const { api, user } = openAsOwner();
    await user.click(await screen.findByRole('radio', { name: 'Your own figures' }));
    await user.selectOptions(screen.getByRole('combobox', { name: 'Table written in' }), 'cm');
    const first = screen.getByRole('textbox', { name: '1 tap from DBH (cm)' });
    expect(first).toHaveValue('30.48');
    await user.clear(first);
    await user.type(first, '15');
    await user.click(previewButton());

    const message = 'No guideline taps a tree under 20 cm (7.9 in)';
    expect(await screen.findByText(message)).toBeInTheDocument();
    expect(first).toHaveAccessibleDescription(message);
    expect(api.to(PREVIEW)).toHaveLength(0);
  });

  it('when a length is not a number or over its bound, then each field says so in the units shown', async () => {
    const { api, user } = openAsOwner({}, 'imperial');
    await user.click(await screen.findByRole('radio', { name: 'Your own figures' }));
    const vertical = screen.getByRole('textbox', { name: 'Above or below (in)' });
    await user.clear(vertical);
    await user.type(vertical, 'a foot');
    const highest = screen.getByRole('textbox', { name: 'Highest hole (in)' });
    await user.clear(highest);
    await user.type(highest, '200');
    await user.click(previewButton());

    expect(await screen.findByText('Enter a number')).toBeInTheDocument();
    expect(vertical).toHaveAccessibleDescription('Enter a number');
    // The schema allows at most 200 cm (tapholes go about 30–200 cm above ground): 78.74 in.
    expect(highest).toHaveAccessibleDescription('Use 78.74 in or less');
    expect(vertical).toHaveValue('a foot');
    expect(api.to(PREVIEW)).toHaveLength(0);
  });

  it('when the API refuses a field of the custom set, then its message shows under that field and the rest above the button', async () => {
    const { user } = openAsOwner({
      [PREVIEW]: json(400, {
        error: {
          code: 'invalid-input',
          message: 'The custom profile needs attention',
          fields: {
            'customProfile.spacing.verticalCm': 'Keep holes at least 15 cm apart up or down',
            'customProfile.somethingNew': 'A figure this page does not show yet is out of range',
          },
        },
      }),
    });
    await user.click(await screen.findByRole('radio', { name: 'Your own figures' }));
    await user.click(previewButton());

    expect(
      await screen.findByText('Keep holes at least 15 cm apart up or down'),
    ).toBeInTheDocument();
    expect(
      screen.getByRole('textbox', { name: 'Above or below (cm)' }),
    ).toHaveAccessibleDescription('Keep holes at least 15 cm apart up or down');
    expect(screen.getByRole('alert')).toHaveTextContent(
      'A figure this page does not show yet is out of range',
    );
  });

  it('when a figure changes after the preview, then the preview is set aside until asked again', async () => {
    const { user } = openAsOwner();
    await user.click(await screen.findByRole('radio', { name: 'Your own figures' }));
    await user.click(previewButton());
    await screen.findByRole('region', { name: 'What this changes in 2027' });
    await user.click(screen.getByRole('button', { name: 'Add a band' }));
    expect(screen.queryByRole('region', { name: /What this changes/ })).not.toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: '3 taps from DBH (in)' })).toHaveValue('23');
  });
});

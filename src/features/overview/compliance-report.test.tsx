import { screen, within } from '@testing-library/react';
import { ComplianceReportRoute } from '@/app/routes/compliance-report';
import { mockApi } from '@/test/api-mock';
import { meAs, sugarbush } from '@/test/fixtures';
import { complianceReport } from '@/test/overview-fixtures';
import { renderPage } from '@/test/render';

const COMPLIANCE = 'GET /api/sugarbushes/3/compliance';

describe('the printable compliance report', () => {
  it('names the stand, the season, the guideline with its source and the day, lists every tree with a finding, and carries the cautions', async () => {
    const api = mockApi({
      'GET /api/auth/me': meAs('owner', 'metric'),
      'GET /api/sugarbushes/3': sugarbush({ role: 'owner' }),
      [COMPLIANCE]: complianceReport(),
    });
    renderPage({
      path: '/sugarbushes/:id/overview/compliance-report',
      url: '/sugarbushes/3/overview/compliance-report?season=2026&profile=conservative',
      element: <ComplianceReportRoute />,
    });
    expect(
      await screen.findByRole('heading', { name: 'Tapping against the guideline, season 2026' }),
    ).toBeInTheDocument();
    const request = api.to(COMPLIANCE).at(-1)!.url.searchParams;
    expect([
      request.get('season'),
      request.get('profile'),
      request.get('finding'),
      request.get('pageSize'),
    ]).toEqual(['2026', 'conservative', 'any', '500']);
    const facts = screen.getByRole('article');
    expect(within(facts).getByText('Hollow Creek')).toBeInTheDocument();
    expect(
      within(facts).getByText(/North American Maple Syrup Producers Manual/),
    ).toBeInTheDocument();
    expect(within(facts).getByText('Dec 2, 2026')).toBeInTheDocument();
    const trees = screen.getByRole('table', { name: 'Tapped trees against the guideline' });
    expect(within(trees).getAllByRole('row')).toHaveLength(3);
    const cautions = screen.getByRole('complementary', { name: 'Cautions' });
    expect(cautions).toHaveTextContent('Never work alone in the woods');
    expect(cautions).toHaveTextContent('licensed foresters take precedence');
    expect(screen.getByRole('link', { name: 'Back to the overview' })).toHaveAttribute(
      'href',
      '/sugarbushes/3/overview?season=2026&profile=conservative',
    );
  });
});

import { ComplianceReport } from '@/features/overview/components/compliance-report';
import { NotFoundRoute } from './not-found';
import { sugarbushTitle, useSugarbushIdParam } from './sugarbush-param';

export function ComplianceReportRoute() {
  const { sugarbushId, name } = useSugarbushIdParam();
  if (sugarbushId === undefined) return <NotFoundRoute />;
  return (
    <>
      <title>{sugarbushTitle('Compliance report', name)}</title>
      <ComplianceReport key={sugarbushId} sugarbushId={sugarbushId} />
    </>
  );
}

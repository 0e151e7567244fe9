import { PageHeader } from '@/components/ui/page-header';
import { UnitToggle } from '@/components/ui/unit-toggle';
import { can, useRole } from '@/lib/auth';
import { AuditSection } from './audit-section';
import { ComplianceSection } from './compliance-section';
import { TrendsSection } from './trends-section';

/** How the stand is doing season by season, whether the tapping kept to the guideline, and who changed what. */
export function OverviewPage({
  sugarbushId,
  standName,
}: {
  sugarbushId: number;
  standName: string | undefined;
}) {
  const role = useRole(sugarbushId);
  return (
    <>
      <PageHeader title="Overview" subtitle={standName ?? ' '} actions={<UnitToggle />} />
      <div className="flex flex-col gap-10">
        <TrendsSection sugarbushId={sugarbushId} />
        <ComplianceSection sugarbushId={sugarbushId} />
        {can(role, 'read-audit') && <AuditSection sugarbushId={sugarbushId} />}
      </div>
    </>
  );
}

import { useParams } from 'react-router';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { can, roleLabels, rolesFor, useRole } from '@/lib/auth';
import { useCurrentSection } from '../shell/current-sugarbush';
import { sectionByKey } from '../shell/sections';
import { NotFoundRoute } from './not-found';

/** A section that is planned but not built yet: a calm note, not an error. */
export function ComingSoonRoute() {
  const key = useCurrentSection();
  const { id } = useParams();
  const role = useRole(Number(id));
  if (!key) return <NotFoundRoute />;
  const section = sectionByKey(key);
  const allowed = role === undefined || can(role, section.permission);

  return (
    <>
      <title>{`${section.label} · Clearwood`}</title>
      <PageHeader title={section.label} />
      {allowed ? (
        <EmptyState title="Coming soon in Clearwood">{section.summary}</EmptyState>
      ) : (
        <EmptyState title={`${section.label} is for other roles`}>
          In this sugarbush it is used by:{' '}
          {rolesFor(section.permission)
            .map((r) => roleLabels[r].toLowerCase())
            .join(', ')}
          .
        </EmptyState>
      )}
    </>
  );
}

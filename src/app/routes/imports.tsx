import { PageHeader } from '@/components/ui/page-header';
import { TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { ImportPanel, importableKinds } from '@/features/imports/components/import-panel';
import { useRole } from '@/lib/auth';
import { NotFoundRoute } from './not-found';
import { sugarbushTitle, useSugarbushIdParam } from './sugarbush-param';

export function ImportsRoute() {
  const { sugarbushId, name } = useSugarbushIdParam();
  const role = useRole(sugarbushId);
  if (sugarbushId === undefined) return <NotFoundRoute />;

  return (
    <>
      <title>{sugarbushTitle('Import records', name)}</title>
      <PageHeader
        title="Import records"
        subtitle={name ?? ' '}
        actions={<TextLink to={paths.trees.href(sugarbushId)}>Back to the trees</TextLink>}
      />
      {role === undefined ? (
        <p role="status">Loading…</p>
      ) : importableKinds(role).length === 0 ? (
        <p>Your role in this stand does not import records: the owner or the forester does.</p>
      ) : (
        <ImportPanel key={sugarbushId} sugarbushId={sugarbushId} role={role} />
      )}
    </>
  );
}

import { NotesPage } from '@/features/notes/components/notes-page';
import { NotFoundRoute } from './not-found';
import { sugarbushTitle, useSugarbushIdParam } from './sugarbush-param';

export function NotesRoute() {
  const { sugarbushId, name } = useSugarbushIdParam();
  if (sugarbushId === undefined) return <NotFoundRoute />;
  return (
    <>
      <title>{sugarbushTitle('Notes', name)}</title>
      {/* A new stand starts the page afresh: its own filters and forms. */}
      <NotesPage key={sugarbushId} sugarbushId={sugarbushId} standName={name} />
    </>
  );
}

import { SeasonStepper } from '@/components/season-stepper';
import { PageHeader } from '@/components/ui/page-header';
import { can, useRole } from '@/lib/auth';
import { AttentionQueue } from './attention-queue';
import { useAttentionSearchParams } from './attention-search-params';
import { NoteForm } from './note-form';
import { NoteList } from './note-list';

/**
 * The stand's notes page: first the trees that need a look, then the notes on the stand and its
 * trees, and for whoever writes notes a form for one on the whole stand.
 */
export function NotesPage({
  sugarbushId,
  standName,
}: {
  sugarbushId: number;
  standName: string | undefined;
}) {
  const role = useRole(sugarbushId);
  const canWrite = can(role, 'write-notes');
  const { filters, update } = useAttentionSearchParams();
  const owner = { sugarbushId };
  return (
    <>
      <PageHeader
        title="Notes"
        subtitle={standName ?? ' '}
        actions={
          <SeasonStepper season={filters.season} onChange={(season) => update({ season })} />
        }
      />
      <AttentionQueue sugarbushId={sugarbushId} />
      <div className="grid grid-cols-1 gap-8 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        {canWrite && (
          <div className="lg:order-2">
            <NoteForm
              owner={owner}
              title="Write a note on the stand"
              defaultCategory="management"
            />
          </div>
        )}
        <section aria-labelledby="stand-notes-heading" className="min-w-0 lg:order-1">
          <h2 id="stand-notes-heading" className="mb-3 text-lg font-bold">
            Notes on the stand and its trees
          </h2>
          <NoteList
            owner={owner}
            label="Notes"
            canWrite={canWrite}
            emptyHint={
              canWrite
                ? 'Write the first one here, or on a tree’s page.'
                : 'The owner and the consultant write notes here and on each tree’s page.'
            }
          />
        </section>
      </div>
    </>
  );
}

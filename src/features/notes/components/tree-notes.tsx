import { useId } from 'react';
import { NoteForm } from './note-form';
import { NoteList } from './note-list';
import { TreePhotos } from './tree-photos';

/** The tree page's notes and photos: write, resolve and reopen for the owner and consultant. */
export function TreeNotes({
  treeId,
  tag,
  canWrite,
}: {
  treeId: number;
  tag: string;
  canWrite: boolean;
}) {
  const headingId = useId();
  return (
    <div className="flex flex-col gap-8">
      {canWrite && (
        <NoteForm owner={{ treeId }} title="Write a note on this tree" defaultCategory="health" />
      )}
      <section aria-labelledby={headingId}>
        <h2 id={headingId} className="mb-3 text-lg font-bold">
          Notes
        </h2>
        <NoteList
          owner={{ treeId }}
          label={`Notes on tree ${tag}`}
          canWrite={canWrite}
          emptyHint={
            canWrite
              ? 'Write the first note above.'
              : 'The owner and the consultant write notes on each tree.'
          }
        />
      </section>
      <TreePhotos treeId={treeId} tag={tag} canWrite={canWrite} />
    </div>
  );
}

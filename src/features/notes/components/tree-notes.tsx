import { useId } from 'react';
import { NoteForm } from './note-form';
import { NoteList } from './note-list';
import { TreePhotos } from './tree-photos';

/** Writing a note on one tree: on the tree page it sits with the other work, ahead of the record. */
export function TreeNoteForm({ treeId }: { treeId: number }) {
  return <NoteForm owner={{ treeId }} title="Write a note on this tree" defaultCategory="health" />;
}

/** The tree's notes and photos: resolve and reopen for the owner and the consultant. */
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
              ? 'Write the first one with the note form on this page.'
              : 'The owner and the consultant write notes on each tree.'
          }
        />
      </section>
      <TreePhotos treeId={treeId} tag={tag} canWrite={canWrite} />
    </div>
  );
}

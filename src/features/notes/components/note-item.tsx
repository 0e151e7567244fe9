import { Link } from 'react-router';
import type { Note } from '@shared/schemas/note';
import { Button } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/units';
import { FollowUpLabel } from './follow-up-label';
import { NoteCategoryLabel } from './note-category-label';
import { PhotoThumbs } from './photo-thumbs';

/** One note: what, on which tree, who wrote it when, its follow-up, its photos, resolve or reopen. */
export function NoteItem({
  note,
  days,
  showTree,
  canWrite,
  busy,
  onResolve,
}: {
  note: Note;
  days: { today: string; dueBy: string };
  showTree: boolean;
  canWrite: boolean;
  busy: boolean;
  onResolve: (resolved: boolean) => void;
}) {
  const open = note.resolvedAt === null;
  const about = note.treeTag ? `the note on tree ${note.treeTag}` : 'the note on the stand';
  return (
    <article
      aria-label={`${open ? 'Note' : 'Resolved note'} ${note.treeTag ? `on tree ${note.treeTag}` : 'on the stand'}`}
      className={open ? 'py-3' : 'py-3 text-ink/70'}
    >
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
        <NoteCategoryLabel category={note.category} />
        {showTree &&
          (note.treeId !== null ? (
            <Link
              to={paths.tree.href(note.treeId)}
              className="font-bold underline underline-offset-4"
            >
              Tree {note.treeTag}
            </Link>
          ) : (
            <span className="font-bold">Whole stand</span>
          ))}
        <span className="text-bark">
          {note.authorName ?? 'Someone no longer on the team'} · {formatDate(note.createdAt)}
        </span>
      </div>
      <p className="mt-1 max-w-prose whitespace-pre-line">{note.body}</p>
      <div className="mt-1 flex flex-wrap items-center gap-x-4 gap-y-1 text-sm">
        <FollowUpLabel on={note.followUpOn} open={open} {...days} />
        {!open && (
          <span className="text-moss">
            <span aria-hidden="true">✓ </span>Resolved
            {note.resolvedByName ? ` by ${note.resolvedByName}` : ''} on{' '}
            {formatDate(note.resolvedAt)}
          </span>
        )}
      </div>
      <PhotoThumbs photos={note.photos} about={about} />
      {canWrite && (
        <Button className="mt-2" disabled={busy} onClick={() => onResolve(open)}>
          {open ? 'Resolve' : 'Reopen'}
        </Button>
      )}
    </article>
  );
}

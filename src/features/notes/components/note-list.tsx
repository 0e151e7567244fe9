import { useEffect, useId, useState } from 'react';
import { noteCategories, noteCategoryLabels } from '@shared/schemas/enums';
import { isoDay } from '@shared/schemas/iso-date';
import { FOLLOW_UP_DUE_DAYS } from '@shared/schemas/note';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { FilterSelects, type FilterSelectSpec } from '@/components/ui/filter-selects';
import { Pager } from '@/components/ui/pager';
import { SearchInput } from '@/components/ui/search-input';
import { Skeleton } from '@/components/ui/skeleton';
import { isApiError } from '@/lib/api-client';
import { NOTE_PAGE_SIZE, useNotes } from '../api/get-notes';
import type { NoteListFilters, NoteOwner } from '../api/note-keys';
import { useUpdateNote } from '../api/update-note';
import { NoteItem } from './note-item';

type Filters = Omit<NoteListFilters, 'page' | 'pageSize'>;

const selectsFor = (standList: boolean): FilterSelectSpec<Filters> => ({
  category: {
    label: 'Category',
    all: 'Every category',
    options: noteCategories.map((c) => ({ value: c, label: noteCategoryLabels[c] })),
  },
  status: {
    label: 'State',
    all: 'Open and resolved',
    options: [
      { value: 'open', label: 'Open' },
      { value: 'resolved', label: 'Resolved' },
    ],
  },
  followUp: {
    label: 'Follow-up',
    all: 'Any',
    options: [
      { value: 'due', label: 'Due or overdue' },
      { value: 'overdue', label: 'Overdue' },
      { value: 'scheduled', label: 'Has a date' },
    ],
  },
  ...(standList
    ? {
        scope: {
          label: 'On',
          all: 'The stand and its trees',
          options: [
            { value: 'stand', label: 'The whole stand' },
            { value: 'trees', label: 'Single trees' },
          ],
        },
      }
    : {}),
  sort: {
    label: 'Order',
    all: 'Newest first',
    options: [
      { value: 'created', label: 'Oldest first' },
      { value: 'followUp', label: 'Follow-up soonest' },
      { value: '-followUp', label: 'Follow-up latest' },
    ],
  },
});

/** A list of notes with its filters, paged; resolve and reopen for those who write notes. */
export function NoteList({
  owner,
  label,
  canWrite,
  emptyHint,
}: {
  owner: NoteOwner;
  label: string;
  canWrite: boolean;
  emptyHint: string;
}) {
  const searchId = useId();
  const [filters, setFilters] = useState<Filters>({});
  const [text, setText] = useState('');
  const [page, setPage] = useState(1);
  const notes = useNotes(owner, { ...filters, page, pageSize: NOTE_PAGE_SIZE });
  const update = useUpdateNote();
  const [changeError, setChangeError] = useState<string | null>(null);
  const standList = 'sugarbushId' in owner;
  const days = { today: isoDay(), dueBy: isoDay(new Date(), FOLLOW_UP_DUE_DAYS) };
  const filtered = Object.values(filters).some(Boolean);
  const change = (patch: Partial<Filters>) => {
    setFilters((f) => ({ ...f, ...patch }));
    setPage(1);
  };

  // The search follows the typing after a short pause.
  useEffect(() => {
    const q = text.trim() || undefined;
    if (q === filters.q) return;
    const timer = setTimeout(() => {
      setFilters((f) => ({ ...f, q }));
      setPage(1);
    }, 250);
    return () => clearTimeout(timer);
  }, [text, filters.q]);

  const resolve = (noteId: number, resolved: boolean) => {
    setChangeError(null);
    update.mutate(
      { noteId, change: { resolved } },
      {
        onError: (error) =>
          setChangeError(isApiError(error) ? error.message : 'The note could not be changed.'),
      },
    );
  };

  let body;
  if (notes.isPending)
    body = (
      <div role="status" aria-label="Loading notes" className="flex flex-col gap-3">
        <Skeleton className="h-16 w-full" />
        <Skeleton className="h-16 w-full" />
      </div>
    );
  else if (notes.isError)
    body = (
      <ErrorState
        title="We couldn't load the notes."
        error={notes.error}
        onRetry={() => void notes.refetch()}
      />
    );
  else if (notes.data.total === 0)
    body = (
      <EmptyState title={filtered ? 'No notes match these filters' : 'No notes yet'}>
        {filtered ? 'Change or clear the filters to see more.' : emptyHint}
      </EmptyState>
    );
  else
    body = (
      <>
        <ul
          aria-label={label}
          aria-busy={notes.isPlaceholderData || undefined}
          className="divide-y divide-rule"
        >
          {notes.data.items.map((note) => (
            <li key={note.id}>
              <NoteItem
                note={note}
                days={days}
                showTree={standList}
                canWrite={canWrite}
                busy={update.isPending && update.variables?.noteId === note.id}
                onResolve={(resolved) => resolve(note.id, resolved)}
              />
            </li>
          ))}
        </ul>
        <Pager label={`${label} pages`} list={notes.data} onPage={setPage} />
      </>
    );

  return (
    <div>
      <div className="mb-3 grid grid-cols-2 gap-3 sm:grid-cols-3">
        <div className="col-span-2 flex flex-col gap-1 sm:col-span-3">
          <label htmlFor={searchId} className="text-sm font-bold">
            Search the notes
          </label>
          <SearchInput id={searchId} value={text} onChange={setText} />
        </div>
        <FilterSelects values={filters} selects={selectsFor(standList)} onChange={change} />
      </div>
      {changeError && (
        <p role="alert" className="mb-2 text-alert">
          {changeError}
        </p>
      )}
      {body}
    </div>
  );
}

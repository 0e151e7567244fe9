import { noteCategoryLabels, type NoteCategory } from '@shared/schemas/enums';
import { cn } from '@/components/ui/cn';

/** A note's category in words; a hazard also in the alert colour with its mark. */
export function NoteCategoryLabel({ category }: { category: NoteCategory }) {
  const hazard = category === 'hazard';
  return (
    <span
      className={cn(
        'inline-flex items-center gap-1 whitespace-nowrap rounded px-1.5 py-0.5 text-sm font-bold',
        hazard ? 'bg-alert text-paper' : 'bg-frost text-ink',
      )}
    >
      {hazard && <span aria-hidden="true">!</span>}
      {noteCategoryLabels[category]}
    </span>
  );
}

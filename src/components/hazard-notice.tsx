import type { Hazard } from '@shared/schemas/note';
import { cn } from '@/components/ui/cn';
import { formatDate } from '@/lib/units';

/**
 * A tree's open hazard notes, shown ahead of any drilling advice: the alert colour, a mark and
 * the word "Hazard", so it never rests on colour alone. Nothing when there is none.
 */
export function HazardNotice({
  hazards,
  tag,
  className,
}: {
  hazards: readonly Hazard[] | undefined;
  /** Names the tree, where the notice stands apart from it (a plan's row). */
  tag?: string;
  className?: string;
}) {
  if (!hazards || hazards.length === 0) return null;
  const label = tag ? `Hazard at tree ${tag}` : 'Hazard at this tree';
  return (
    <aside
      aria-label={label}
      className={cn(
        'rounded border-l-4 border-alert bg-alert/5 px-3 py-2 text-sm print:border print:border-ink',
        className,
      )}
    >
      <p className="flex items-center gap-1.5 font-bold text-alert print:text-ink">
        <span
          aria-hidden="true"
          className="inline-grid size-5 place-items-center rounded-full bg-alert text-xs text-paper print:border print:border-ink print:bg-transparent print:text-ink"
        >
          !
        </span>
        {hazards.length === 1 ? label : `${label}: ${hazards.length} notes`}
      </p>
      <ul className="mt-1 max-w-prose space-y-1">
        {hazards.map((h) => (
          <li key={h.noteId}>
            <span className="whitespace-pre-line">{h.body}</span>{' '}
            <span className="whitespace-nowrap text-bark">({formatDate(h.createdAt)})</span>
          </li>
        ))}
      </ul>
    </aside>
  );
}

import { formatDate } from '@/lib/units';

/** When a follow-up is due, and whether it is late; a resolved note's date is only a date. */
export function FollowUpLabel({
  on,
  today,
  dueBy,
  open,
}: {
  on: string | null;
  today: string;
  dueBy: string;
  open: boolean;
}) {
  if (!on) return null;
  if (!open) return <span>Follow up by {formatDate(on)}</span>;
  if (on < today)
    return (
      <span className="font-bold text-alert">
        <span aria-hidden="true">! </span>Follow-up overdue since {formatDate(on)}
      </span>
    );
  if (on <= dueBy)
    return <span className="font-bold text-bark">Follow-up due {formatDate(on)}</span>;
  return <span>Follow up by {formatDate(on)}</span>;
}

import { treeStatusLabels, type TreeStatus } from '@shared/schemas/enums';
import { cn } from '@/components/ui/cn';

const marks: Record<TreeStatus, string> = {
  active: 'bg-moss',
  'held-out': 'bg-sap',
  dead: 'bg-bark',
  removed: 'border border-bark bg-paper',
};

/** Status as words, with a small mark beside them; the words carry the meaning. */
export function TreeStatusLabel({ status }: { status: TreeStatus }) {
  return (
    <span className="inline-flex items-center gap-2 whitespace-nowrap">
      <span
        aria-hidden="true"
        className={cn('inline-block h-2.5 w-2.5 rounded-full', marks[status])}
      />
      {treeStatusLabels[status]}
    </span>
  );
}

import type { WarningCode } from '@shared/rules/index';
import { cn } from '@/components/ui/cn';
import { warningLabel, warningMarks, warningWeight } from '@/lib/warning-labels';

/** A warning's short name with its mark: "! Holes too close". */
export function WarningMark({ code }: { code: WarningCode | string }) {
  const weight = warningWeight(code);
  const { mark, name } = warningMarks[weight];
  return (
    <span
      role="img"
      aria-label={name}
      className={cn(
        'inline-grid size-5 shrink-0 place-items-center rounded-full text-xs font-bold leading-none',
        'print:border print:border-ink print:bg-transparent print:text-ink',
        weight === 'caution' ? 'bg-alert text-paper' : 'border border-bark text-bark',
      )}
    >
      {mark}
    </span>
  );
}

export function WarningChip({ code }: { code: WarningCode | string }) {
  return (
    <span className="inline-flex items-center gap-1 whitespace-nowrap rounded border border-rule px-1.5 py-0.5 text-sm print:border-ink">
      <WarningMark code={code} />
      {warningLabel(code)}
    </span>
  );
}

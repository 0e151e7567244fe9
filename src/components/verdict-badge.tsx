import { verdictByKey, type VerdictKey } from '@shared/rules/index';
import { cn } from '@/components/ui/cn';

// Written out whole so Tailwind finds every class. Ink on the light fills, paper on black.
const fills: Record<VerdictKey, string> = {
  tap: 'bg-advice-tap text-ink',
  'tap-reduced': 'bg-advice-reduced text-ink',
  rest: 'bg-advice-rest text-ink',
  'too-small': 'bg-advice-small text-ink',
  retired: 'bg-advice-retired text-paper',
  unmeasured: 'bg-advice-unknown text-ink',
};

/**
 * The advisor's verdict as a colour and its letter, with the label beside it (or, where room
 * is short, as the letter's accessible name). Print drops the fill and keeps the letter.
 */
export function VerdictBadge({
  verdict,
  size = 'md',
  showLabel = true,
  letterOnlyOnPhone = false,
}: {
  verdict: VerdictKey;
  size?: 'md' | 'lg';
  showLabel?: boolean;
  /** Keeps the label for assistive tech but shows only the letter below the sm breakpoint. */
  letterOnlyOnPhone?: boolean;
}) {
  const v = verdictByKey[verdict];
  return (
    <span
      className={cn('inline-flex items-center gap-2 whitespace-nowrap', size === 'lg' && 'text-lg')}
      data-verdict={verdict}
      title={showLabel ? undefined : v.label}
    >
      <span
        aria-hidden={showLabel || undefined}
        role={showLabel ? undefined : 'img'}
        aria-label={showLabel ? undefined : v.label}
        className={cn(
          'inline-grid shrink-0 place-items-center rounded-sm font-bold leading-none',
          'print:border print:border-ink print:bg-transparent print:text-ink',
          size === 'lg' ? 'size-8 text-lg' : 'size-6 text-sm',
          fills[verdict],
        )}
      >
        {v.letter}
      </span>
      {showLabel && (
        <span
          className={cn(
            size === 'lg' && 'font-bold',
            letterOnlyOnPhone && 'max-sm:sr-only print:not-sr-only',
          )}
        >
          {v.label}
        </span>
      )}
    </span>
  );
}

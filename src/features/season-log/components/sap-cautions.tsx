import type { SapCaution } from '@shared/rules/index';
import { cn } from '@/components/ui/cn';

const levelWords = { warning: 'Warning', caution: 'Caution' } as const;

/**
 * Keep-it-cold cautions as text: a warning (sap spoiling) in alert colour with a bold word, a
 * caution (sap warming) quieter; the word says which, so nothing rests on colour.
 */
export function SapCautions({
  cautions,
  compact = false,
  className,
}: {
  cautions: readonly SapCaution[];
  /** In a table cell: the level and the message's first sentence only. */
  compact?: boolean;
  className?: string;
}) {
  if (cautions.length === 0) return null;
  return (
    <ul className={cn('flex flex-col gap-1', className)}>
      {cautions.map((c) => (
        <li
          key={c.code}
          data-caution={c.code}
          data-level={c.level}
          className={cn(
            compact ? 'text-sm' : 'rounded border-l-4 px-3 py-2 text-sm',
            !compact &&
              (c.level === 'warning' ? 'border-alert bg-alert/10' : 'border-sap bg-sap/10'),
          )}
        >
          <strong className={c.level === 'warning' ? 'text-alert' : 'text-bark'}>
            {levelWords[c.level]}:
          </strong>{' '}
          {compact ? firstSentence(c.message) : c.message}
          {!compact && <span className="mt-1 block text-bark">Source: {c.source}.</span>}
        </li>
      ))}
    </ul>
  );
}

/** "Sap held at 45 °F: above 40 °F it spoils faster." */
function firstSentence(message: string): string {
  const end = message.indexOf('. ');
  return end === -1 ? message : message.slice(0, end + 1);
}

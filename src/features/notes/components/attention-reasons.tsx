import type { AttentionItem } from '@shared/schemas/attention';
import { WarningChip } from '@/components/warning-chip';
import { formatDate } from '@/lib/units';

const chip = 'inline-flex items-center gap-1 whitespace-nowrap rounded px-1.5 py-0.5 text-sm';

/** Why a tree is in the queue, in words with a mark each: hazards, follow-ups, warnings. */
export function AttentionReasons({ item }: { item: AttentionItem }) {
  return (
    <ul aria-label={`Why tree ${item.tag} needs a look`} className="flex flex-wrap gap-1.5">
      {item.openHazards > 0 && (
        <li className={`${chip} bg-alert font-bold text-paper`}>
          <span aria-hidden="true">!</span>
          {item.openHazards === 1 ? 'Hazard' : `${item.openHazards} hazards`}
        </li>
      )}
      {item.reasons.includes('overdue') && (
        <li className={`${chip} border border-alert font-bold text-alert`}>
          <span aria-hidden="true">⏰</span>
          Follow-up overdue since {formatDate(item.nextFollowUpOn)}
        </li>
      )}
      {item.reasons.includes('due') && (
        <li className={`${chip} border border-bark text-bark`}>
          <span aria-hidden="true">⏰</span>
          Follow-up due {formatDate(item.nextFollowUpOn)}
        </li>
      )}
      {item.warnings.map((code) => (
        <li key={code}>
          <WarningChip code={code} />
        </li>
      ))}
    </ul>
  );
}

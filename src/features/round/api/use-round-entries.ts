import { useMutationState } from '@tanstack/react-query';
import { useMemo } from 'react';
import { fieldEntryKeys, type FieldEntry } from '@/lib/field-entries';

/**
 * The trees this device has measured in the season and not had refused: entries waiting to send,
 * being sent, or sent (until the round is read again).
 */
export function useMeasuredHere(season: number | undefined): ReadonlySet<number> {
  const entries = useMutationState({
    filters: { mutationKey: fieldEntryKeys.all },
    select: (m) => ({ status: m.state.status, entry: m.state.variables as FieldEntry }),
  });
  return useMemo(() => {
    const ids = new Set<number>();
    for (const { status, entry } of entries) {
      if (status !== 'pending' && status !== 'success') continue;
      if (entry?.kind === 'measurement' && entry.input.measuredOn.startsWith(`${season}-`))
        ids.add(entry.treeId);
    }
    return ids;
  }, [entries, season]);
}

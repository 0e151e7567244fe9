import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CustomProfileInput } from '@shared/rules/index';
import type { Sugarbush } from '@shared/schemas/sugarbush';
import { api } from '@/lib/api-client';
import { refreshStandAdvice } from './refresh-stand';

/** A published guideline by key, or `custom` with the owner's own set. */
export type GuidelineChoice =
  | { profile: string; customProfile?: undefined }
  | { profile: 'custom'; customProfile: CustomProfileInput };

export const updateGuideline = (sugarbushId: number, choice: GuidelineChoice) =>
  api.patch<Sugarbush>(`/sugarbushes/${sugarbushId}`, choice);

export function useUpdateGuideline(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (choice: GuidelineChoice) => updateGuideline(sugarbushId, choice),
    onSuccess: () => refreshStandAdvice(queryClient),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { IssuePlanInput, IssuedPlanHeader } from '@shared/schemas/issued-plan';
import { api } from '@/lib/api-client';
import { planKeys } from './plan-keys';

export const issuePlan = (sugarbushId: number, input: IssuePlanInput) =>
  api.post<IssuedPlanHeader>(`/sugarbushes/${sugarbushId}/issued-plans`, input);

/** Freeze the season's plan for the crew; the issued copy, progress and sheet read it again. */
export function useIssuePlan(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: IssuePlanInput) => issuePlan(sugarbushId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: planKeys.all }),
  });
}

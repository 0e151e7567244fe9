import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  measurementInputSchema,
  type Measurement,
  type MeasurementInput,
} from '@shared/schemas/measurement';
import { api } from '@/lib/api-client';
import { treeKeys } from '@/features/trees/api/tree-keys';
import { planKeys } from '@/features/plans/api/plan-keys';
import { measurementKeys } from './measurement-keys';

export { measurementInputSchema as createMeasurementInputSchema };

export const createMeasurement = (treeId: number, input: MeasurementInput) =>
  api.post<Measurement>(`/trees/${treeId}/measurements`, input);

export function useCreateMeasurement(treeId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: MeasurementInput) => createMeasurement(treeId, input),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: measurementKeys.list(treeId) }),
        // The tree's latest DBH changes, in its header and in every register page.
        queryClient.invalidateQueries({ queryKey: treeKeys.detail(treeId) }),
        queryClient.invalidateQueries({ queryKey: treeKeys.lists() }),
        // A new diameter can change the season plan's verdicts and totals.
        queryClient.invalidateQueries({ queryKey: planKeys.all }),
      ]),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  measurementInputSchema,
  type Measurement,
  type MeasurementInput,
} from '@shared/schemas/measurement';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-roots';
import { treeDetailKeys } from '@/lib/tree-detail-keys';
import { treeListKeys } from '@/lib/tree-list-keys';
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
        queryClient.invalidateQueries({ queryKey: treeDetailKeys.tree(treeId) }),
        queryClient.invalidateQueries({ queryKey: treeListKeys.all() }),
        // A new diameter can change the season plan's verdicts and totals.
        queryClient.invalidateQueries({ queryKey: queryRoots.plans }),
      ]),
  });
}

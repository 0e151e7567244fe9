import { useMutation, useQueryClient } from '@tanstack/react-query';
import { tapholeInputSchema, type Taphole, type TapholeInput } from '@shared/schemas/taphole';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-roots';
import { treeDetailKeys } from '@/lib/tree-detail-keys';
import { tapholeKeys } from '@/lib/taphole-keys';

export { tapholeInputSchema as createTapholeInputSchema };

export const createTaphole = (treeId: number, input: TapholeInput) =>
  api.post<Taphole>(`/trees/${treeId}/tapholes`, input);

export function useCreateTaphole(treeId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: TapholeInput) => createTaphole(treeId, input),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: tapholeKeys.list(treeId) }),
        // A new hole stains the zone and takes a spot: every season's advice for the tree moves.
        queryClient.invalidateQueries({ queryKey: treeDetailKeys.advice(treeId) }),
        // So do the season plan's verdicts and totals, and the map's colours and stand figures.
        queryClient.invalidateQueries({ queryKey: queryRoots.plans }),
        queryClient.invalidateQueries({ queryKey: queryRoots.map }),
      ]),
  });
}

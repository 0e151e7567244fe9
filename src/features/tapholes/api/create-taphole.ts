import { useMutation, useQueryClient } from '@tanstack/react-query';
import { tapholeInputSchema, type Taphole, type TapholeInput } from '@shared/schemas/taphole';
import { adviceKeys } from '@/features/advice/api/advice-keys';
import { mapKeys } from '@/features/map/api/map-keys';
import { planKeys } from '@/features/plans/api/plan-keys';
import { api } from '@/lib/api-client';
import { tapholeKeys } from './taphole-keys';

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
        queryClient.invalidateQueries({ queryKey: adviceKeys.tree(treeId) }),
        // So do the season plan's verdicts and totals, and the map's colours and stand figures.
        queryClient.invalidateQueries({ queryKey: planKeys.all }),
        queryClient.invalidateQueries({ queryKey: mapKeys.all }),
      ]),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Boundary, Sugarbush } from '@shared/schemas/sugarbush';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-roots';
import { sugarbushDetailKeys } from '@/lib/sugarbush-detail-keys';
import { mapKeys } from './map-keys';

export const updateBoundary = (sugarbushId: number, boundary: Boundary | null) =>
  api.patch<Sugarbush>(`/sugarbushes/${sugarbushId}`, { boundary });

/** A new boundary changes the stand's figures and which trees fall outside it. */
export function useUpdateBoundary(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (boundary: Boundary | null) => updateBoundary(sugarbushId, boundary),
    onSuccess: (sugarbush) => {
      queryClient.setQueryData(sugarbushDetailKeys.sugarbush(sugarbushId), sugarbush);
    },
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: queryRoots.sugarbushes }),
        queryClient.invalidateQueries({ queryKey: mapKeys.all }),
      ]),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Boundary, Sugarbush } from '@shared/schemas/sugarbush';
import { sugarbushKeys } from '@/features/sugarbushes/api/sugarbush-keys';
import { api } from '@/lib/api-client';
import { mapKeys } from './map-keys';

export const updateBoundary = (sugarbushId: number, boundary: Boundary | null) =>
  api.patch<Sugarbush>(`/sugarbushes/${sugarbushId}`, { boundary });

/** A new boundary changes the stand's figures and which trees fall outside it. */
export function useUpdateBoundary(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (boundary: Boundary | null) => updateBoundary(sugarbushId, boundary),
    onSuccess: (sugarbush) => {
      queryClient.setQueryData(sugarbushKeys.detail(sugarbushId), sugarbush);
    },
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: sugarbushKeys.all }),
        queryClient.invalidateQueries({ queryKey: mapKeys.all }),
      ]),
  });
}

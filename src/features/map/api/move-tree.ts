import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Tree } from '@shared/schemas/tree';
import { treeKeys } from '@/features/trees/api/tree-keys';
import { api } from '@/lib/api-client';
import { mapKeys } from './map-keys';
import type { MapColumns } from '@shared/schemas/map';

export interface MoveTreeInput {
  treeId: number;
  lat: number;
  lng: number;
}

export const moveTree = ({ treeId, lat, lng }: MoveTreeInput) =>
  api.patch<Tree>(`/trees/${treeId}`, { lat, lng });

/** Moves the dot at once; the map and the tree are read again when the server has answered. */
export function useMoveTree(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: moveTree,
    onSuccess: (_tree, { treeId, lat, lng }) => {
      queryClient.setQueriesData<MapColumns>(
        { queryKey: [...mapKeys.all, 'trees', sugarbushId] },
        (data) => {
          const at = data?.ids.indexOf(treeId) ?? -1;
          if (!data || at === -1) return data;
          return {
            ...data,
            lat: data.lat.with(at, lat),
            lng: data.lng.with(at, lng),
          };
        },
      );
    },
    onSettled: (_tree, _error, { treeId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: mapKeys.all }),
        queryClient.invalidateQueries({ queryKey: treeKeys.detail(treeId) }),
        queryClient.invalidateQueries({ queryKey: treeKeys.lists() }),
      ]),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { speciesSchema, treeStatusSchema } from '@shared/schemas/enums';
import type { Tree } from '@shared/schemas/tree';
import { treeInputSchema } from '@shared/schemas/tree';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-roots';
import { treeListKeys } from '@/lib/tree-list-keys';
import { mapKeys } from './map-keys';

/** A tree placed on the map: the register's own rules, with a position it must have. */
export const mapTreeInputSchema = z.object({
  tag: treeInputSchema.shape.tag,
  species: speciesSchema,
  status: treeStatusSchema,
  lat: z.number().min(-90).max(90),
  lng: z.number().min(-180).max(180),
});
export type MapTreeInput = z.infer<typeof mapTreeInputSchema>;

export const createTree = (sugarbushId: number, input: MapTreeInput) =>
  api.post<Tree>(`/sugarbushes/${sugarbushId}/trees`, input);

export function useCreateTree(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: MapTreeInput) => createTree(sugarbushId, input),
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: mapKeys.all }),
        queryClient.invalidateQueries({ queryKey: treeListKeys.all() }),
        queryClient.invalidateQueries({ queryKey: queryRoots.sugarbushes }),
      ]),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { sugarbushPatchSchema, type Sugarbush } from '@shared/schemas/sugarbush';
import { api } from '@/lib/api-client';
import { refreshStandAdvice } from './refresh-stand';

/** The stand's own details: its name and the side the first tap faces. */
export const standFormSchema = sugarbushPatchSchema
  .pick({ name: true, sunnyAzimuthDeg: true })
  .required();
export type StandFormInput = z.input<typeof standFormSchema>;
export type StandPatch = z.output<typeof standFormSchema>;

export const updateStand = (sugarbushId: number, patch: StandPatch) =>
  api.patch<Sugarbush>(`/sugarbushes/${sugarbushId}`, patch);

export function useUpdateStand(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (patch: StandPatch) => updateStand(sugarbushId, patch),
    // The name shows in the rail and the switcher; the sunny side moves every advised spot.
    onSuccess: () => refreshStandAdvice(queryClient),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { WeatherImportResult } from '@shared/schemas/weather';
import { api } from '@/lib/api-client';
import { seasonLogKeys } from './season-log-keys';

export interface WeatherImportRequest {
  file: File;
  unit: 'F' | 'C';
  /** Check only: the answer lists the days as they would be kept and nothing is written. */
  dryRun: boolean;
}

export const importWeather = (sugarbushId: number, r: WeatherImportRequest) => {
  const form = new FormData();
  form.append('unit', r.unit);
  // The field is read as a boolean of its text: leave it out rather than send "false".
  if (r.dryRun) form.append('dryRun', 'true');
  form.append('file', r.file);
  return api.postForm<WeatherImportResult>(`/sugarbushes/${sugarbushId}/weather/imports`, form);
};

/** A weather station's daily summary (CSV), checked first, then imported. */
export function useImportWeather(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (r: WeatherImportRequest) => importWeather(sugarbushId, r),
    onSuccess: async (result) => {
      if (result.dryRun) return;
      await queryClient.invalidateQueries({ queryKey: seasonLogKeys.stand(sugarbushId) });
    },
  });
}

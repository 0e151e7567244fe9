import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { WeatherDay, WeatherDayInput } from '@shared/schemas/weather';
import { api } from '@/lib/api-client';
import { seasonLogKeys } from './season-log-keys';

/** A day's low and high; a second reading for the same date replaces the first. */
export const recordWeather = (sugarbushId: number, input: WeatherDayInput) =>
  api.post<WeatherDay>(`/sugarbushes/${sugarbushId}/weather`, input);

export function useRecordWeather(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: WeatherDayInput) => recordWeather(sugarbushId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: seasonLogKeys.stand(sugarbushId) }),
  });
}

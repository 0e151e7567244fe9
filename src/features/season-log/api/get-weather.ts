import { queryOptions, useQuery } from '@tanstack/react-query';
import type { WeatherSeason } from '@shared/schemas/weather';
import { api } from '@/lib/api-client';
import { seasonLogKeys } from './season-log-keys';

/** A season's days of weather, oldest first, and the forecast's coming days. */
export const getWeather = (sugarbushId: number, season: number | undefined, signal?: AbortSignal) =>
  api.get<WeatherSeason>(`/sugarbushes/${sugarbushId}/weather`, { signal, query: { season } });

export const weatherQueryOptions = (sugarbushId: number, season: number | undefined) =>
  queryOptions({
    queryKey: seasonLogKeys.weather(sugarbushId, season),
    queryFn: ({ signal }) => getWeather(sugarbushId, season, signal),
  });

export const useWeather = (sugarbushId: number, season: number | undefined) =>
  useQuery(weatherQueryOptions(sugarbushId, season));

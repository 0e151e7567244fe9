import { useSearchParams } from 'react-router';
import { usePhone } from '@/lib/use-media-query';
import type { PlanFilters } from '../api/plan-keys';

const coordinate = (raw: string | null, limit: number) => {
  if (raw === null || raw.trim() === '') return undefined;
  const value = Number(raw);
  return Number.isFinite(value) && Math.abs(value) <= limit ? value : undefined;
};

/** `?fromLat=&fromLng=`: where a walking order starts; both or neither. */
export function walkStartParams(params: URLSearchParams): Pick<PlanFilters, 'fromLat' | 'fromLng'> {
  const fromLat = coordinate(params.get('fromLat'), 90);
  const fromLng = coordinate(params.get('fromLng'), 180);
  return fromLat === undefined || fromLng === undefined ? {} : { fromLat, fromLng };
}

/** A position to about 10 m, as the server keeps a walk's start: finer is noise in a phone's fix. */
export const roundedStart = (deg: number) => Math.round(deg * 1e4) / 1e4;

/**
 * On a phone the plan is walked: unless a sort was picked, the trees come in walking order.
 * Returns the filters the plan is asked for, and whether it is shown as cards.
 */
export function useWalkedPlan(filters: PlanFilters): { filters: PlanFilters; cards: boolean } {
  const phone = usePhone();
  const [params] = useSearchParams();
  if (!phone) return { filters, cards: false };
  return { filters: params.has('sort') ? filters : { ...filters, sort: 'walk' }, cards: true };
}

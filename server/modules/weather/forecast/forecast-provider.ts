/** One day of a forecast, in °C. */
export interface ForecastDay {
  date: string;
  minC: number;
  maxC: number;
}

/** Where the coming days' weather comes from: the stand-in by default, an HTTP service by config. */
export interface ForecastProvider {
  /** Named in the page's footnote. */
  name: string;
  /** `days` days from `fromDate` (YYYY-MM-DD) at this position; rejects when it cannot say. */
  daily(lat: number, lng: number, fromDate: string, days: number): Promise<ForecastDay[]>;
}

/**
 * Keeps each answer a short while per place and start date, so a page read again and again asks
 * the provider once. A failure is not kept: the next read asks again.
 */
export function cachedForecast(
  provider: ForecastProvider,
  ttlMs: number,
  now: () => number = Date.now,
): ForecastProvider {
  const kept = new Map<string, { at: number; days: Promise<ForecastDay[]> }>();
  return {
    name: provider.name,
    daily(lat, lng, fromDate, days) {
      const key = `${lat.toFixed(3)},${lng.toFixed(3)},${fromDate},${days}`;
      const hit = kept.get(key);
      if (hit && now() - hit.at < ttlMs) return hit.days;
      for (const [k, v] of kept) if (now() - v.at >= ttlMs) kept.delete(k);
      const answer = provider.daily(lat, lng, fromDate, days);
      kept.set(key, { at: now(), days: answer });
      answer.catch(() => {
        if (kept.get(key)?.days === answer) kept.delete(key);
      });
      return answer;
    },
  };
}

/**
 * A stored timestamp as an ISO instant in UTC. SQLite's column default writes
 * `YYYY-MM-DD HH:MM:SS` (UTC, no zone); PostgreSQL's come back as ISO strings already.
 */
export function instant(value: unknown): string {
  if (value instanceof Date) return value.toISOString();
  const text = String(value);
  if (/^\d{4}-\d\d-\d\d \d\d:\d\d:\d\d(\.\d+)?$/.test(text))
    return new Date(`${text.replace(' ', 'T')}Z`).toISOString();
  return text;
}

export const instantOrNull = (value: unknown): string | null =>
  value === null || value === undefined ? null : instant(value);

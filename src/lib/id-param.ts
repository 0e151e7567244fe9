import { useParams } from 'react-router';

/** A route's `:name` as a database id: a positive whole number, or undefined for anything else. */
export function useIdParam(name: string): number | undefined {
  const id = Number(useParams()[name]);
  return Number.isInteger(id) && id > 0 ? id : undefined;
}

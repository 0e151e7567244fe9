import { verdicts, type VerdictKey } from '@shared/rules/verdicts';
import { warningCodes, type WarningCode } from '@shared/rules/warnings';
import {
  species as speciesList,
  treeStatuses,
  type Species,
  type TreeStatus,
} from '@shared/schemas/enums';
import type { MapTree, MappedTree } from './map-stand';

export interface MapFilters {
  species?: Species;
  status?: TreeStatus;
  verdict?: VerdictKey;
  warning?: WarningCode;
}

export const filterKeys = ['species', 'status', 'verdict', 'warning'] as const;

const oneOf = <T extends string>(values: readonly T[], value: string | null): T | undefined =>
  value !== null && (values as readonly string[]).includes(value) ? (value as T) : undefined;

/** Reads the filters from a URL; unknown values are ignored rather than matching nothing. */
export function filtersFromParams(params: URLSearchParams): MapFilters {
  return {
    species: oneOf(speciesList, params.get('species')),
    status: oneOf(treeStatuses, params.get('status')),
    verdict: oneOf(
      verdicts.map((v) => v.key),
      params.get('verdict'),
    ),
    warning: oneOf(warningCodes, params.get('warning')),
  };
}

/** Writes a change of filters into the URL, keeping every other parameter. */
export function withFilters(params: URLSearchParams, patch: Partial<MapFilters>): URLSearchParams {
  const next = new URLSearchParams(params);
  for (const [key, value] of Object.entries(patch)) {
    if (value) next.set(key, value);
    else next.delete(key);
  }
  return next;
}

export const hasFilters = (filters: MapFilters) => filterKeys.some((k) => filters[k] !== undefined);

export function matches(tree: MapTree, filters: MapFilters): boolean {
  if (filters.species && tree.species !== filters.species) return false;
  if (filters.status && tree.status !== filters.status) return false;
  if (filters.verdict && tree.verdict !== filters.verdict) return false;
  if (filters.warning && !tree.warnings.includes(filters.warning)) return false;
  return true;
}

/**
 * The trees the map shows for these filters, in the order given: a decoded stand's `mapped`
 * trees are in tag order, the order arrow keys step through. No filter, no copy.
 */
export function visibleTrees(
  mapped: readonly MappedTree[],
  filters: MapFilters,
): readonly MappedTree[] {
  if (!hasFilters(filters)) return mapped;
  return mapped.filter((t) => matches(t, filters));
}

/** The next (or previous) tree from the current one, wrapping round; the first when none is chosen. */
export function stepFrom<T extends { id: number }>(
  ordered: readonly T[],
  currentId: number | undefined,
  direction: 1 | -1,
): T | undefined {
  if (ordered.length === 0) return undefined;
  const at = currentId === undefined ? -1 : ordered.findIndex((t) => t.id === currentId);
  if (at === -1) return direction === 1 ? ordered[0] : ordered[ordered.length - 1];
  return ordered[(at + direction + ordered.length) % ordered.length];
}

/** Finds a tree by its tag as typed: exact first, then ignoring leading zeros and case. */
export function findByTag<T extends { tag: string }>(trees: readonly T[], typed: string) {
  const q = typed.trim();
  if (!q) return undefined;
  const exact = trees.find((t) => t.tag === q);
  if (exact) return exact;
  const norm = (s: string) =>
    s
      .trim()
      .toLowerCase()
      .replace(/^0+(?=.)/, '');
  const loose = trees.find((t) => norm(t.tag) === norm(q));
  if (loose || !/^\d+$/.test(q)) return loose;
  // Just the number of a tag that carries a prefix ("412" for "OL-0412"), when only one does.
  const number = Number(q);
  const byNumber = trees.filter((t) => Number(/(\d+)$/.exec(t.tag)?.[1] ?? Number.NaN) === number);
  return byNumber.length === 1 ? byNumber[0] : undefined;
}

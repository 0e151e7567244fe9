import type { VerdictKey } from '@shared/rules/verdicts';
import { matches, type MapFilters } from './map-filters';
import { isMapped, type MapTree } from './map-stand';
import { verdictStyles } from './verdict-style';

export interface LegendCounts {
  /** Every tree of the stand, as the API counted it. */
  total: number;
  /** Trees that pass the filters, mapped or not. */
  matching: number;
  /** Mapped trees passing the filters, per verdict; these sum to the dots on the map. */
  byVerdict: Record<VerdictKey, number>;
  mapped: number;
  /** Trees passing the filters that have no position yet. */
  notMapped: number;
}

export function countLegend(trees: readonly MapTree[], filters: MapFilters = {}): LegendCounts {
  const byVerdict = Object.fromEntries(verdictStyles.map((s) => [s.key, 0])) as Record<
    VerdictKey,
    number
  >;
  let mapped = 0;
  let notMapped = 0;
  for (const tree of trees) {
    if (!matches(tree, filters)) continue;
    if (isMapped(tree)) {
      mapped++;
      byVerdict[tree.verdict] = (byVerdict[tree.verdict] ?? 0) + 1;
    } else notMapped++;
  }
  return { total: trees.length, matching: mapped + notMapped, byVerdict, mapped, notMapped };
}

import type {
  ComplianceFilter,
  ComplianceItem,
  ComplianceReading,
  ComplianceSort,
  ComplianceTotals,
} from '../../../shared/schemas/compliance';
import type { EvaluatedTree } from './compliance-task';

/** A tree's rows as the report lists them: the first guideline's reading, the second beside it. */
export function toItems(trees: readonly EvaluatedTree[]): ComplianceItem[] {
  return trees.map(({ readings, ...tree }) => ({
    ...tree,
    ...readings[0],
    compare: readings[1] ?? null,
  }));
}

/** The season's figures under one guideline, over every tapped tree. */
export function totalsOf(
  items: readonly ComplianceItem[],
  reading: (i: ComplianceItem) => ComplianceReading,
): ComplianceTotals {
  const t: ComplianceTotals = {
    treesTapped: items.length,
    tapsSet: 0,
    tapsAllowed: 0,
    tapsOver: 0,
    treesOver: 0,
    holesTooClose: 0,
    treesTooClose: 0,
    treesTooSmall: 0,
    treesDeclining: 0,
    treesUnmeasured: 0,
    treesWithFindings: 0,
    treesCompliant: 0,
  };
  for (const item of items) {
    const r = reading(item);
    t.tapsSet += item.tapsSet;
    t.tapsAllowed += r.tapsAllowed ?? 0;
    t.tapsOver += r.tapsOver;
    t.holesTooClose += r.holesTooClose;
    if (r.findings.includes('over')) t.treesOver++;
    if (r.findings.includes('too-close')) t.treesTooClose++;
    if (r.findings.includes('too-small')) t.treesTooSmall++;
    if (r.findings.includes('declining')) t.treesDeclining++;
    if (r.findings.includes('unmeasured')) t.treesUnmeasured++;
    if (r.findings.length > 0) t.treesWithFindings++;
    else t.treesCompliant++;
  }
  return t;
}

/** Whether the two guidelines read a tree differently: other taps allowed, or other findings. */
export function readsDifferently(item: ComplianceItem): boolean {
  const other = item.compare;
  if (!other) return false;
  return other.tapsAllowed !== item.tapsAllowed || other.findings.join() !== item.findings.join();
}

const compareTags = (a: ComplianceItem, b: ComplianceItem) =>
  a.tag < b.tag ? -1 : a.tag > b.tag ? 1 : 0;

/** The rows a filter keeps, in a sort's order (ties by tag). */
export function filterAndSort(
  items: readonly ComplianceItem[],
  f: { q?: string; finding?: ComplianceFilter; changed?: boolean; sort?: ComplianceSort },
): ComplianceItem[] {
  const q = f.q?.toLowerCase();
  const kept = items.filter((i) => {
    if (q && !i.tag.toLowerCase().includes(q)) return false;
    if (f.changed && !readsDifferently(i)) return false;
    if (f.finding === 'any') return i.findings.length > 0;
    if (f.finding === 'none') return i.findings.length === 0;
    if (f.finding) return i.findings.includes(f.finding);
    return true;
  });
  const sort = f.sort ?? 'tag';
  const dir = sort.startsWith('-') ? -1 : 1;
  const key = sort.replace(/^-/, '');
  const value = (i: ComplianceItem) =>
    key === 'over' ? i.tapsOver : key === 'dbh' ? (i.dbhBeforeCm ?? -1) : 0;
  return kept.sort((a, b) =>
    key === 'tag' ? dir * compareTags(a, b) : dir * (value(a) - value(b)) || compareTags(a, b),
  );
}

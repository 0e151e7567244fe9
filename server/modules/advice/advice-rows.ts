import { warningCodes, type Advice, type WarningCode } from '../../../shared/rules/index';

/** One bit per warning code, in the order of `warningCodes` (so filters are one `&` in SQL). */
export const warningBit = (code: WarningCode): number => 1 << warningCodes.indexOf(code);

export const warningMask = (codes: readonly WarningCode[]): number =>
  codes.reduce((mask, code) => mask | warningBit(code), 0);

export interface AdviceRow {
  tree_id: number;
  season: number;
  sugarbush_id: number;
  tree_version: number;
  stand_version: number;
  verdict: string;
  taps: number;
  dbh_cm: number | null;
  conductive_share: number;
  warning_mask: number;
  payload: string;
}

export const adviceColumns = [
  'tree_id',
  'season',
  'sugarbush_id',
  'tree_version',
  'stand_version',
  'verdict',
  'taps',
  'dbh_cm',
  'conductive_share',
  'warning_mask',
  'payload',
] as const satisfies readonly (keyof AdviceRow)[];

/** The stored form of one tree's advice for a season, stamped with the versions it was made from. */
export function toAdviceRow(
  advice: Advice,
  at: {
    treeId: number;
    season: number;
    sugarbushId: number;
    treeVersion: number;
    standVersion: number;
  },
): AdviceRow {
  const { projection: _projection, ...kept } = advice as Advice & { projection?: unknown };
  return {
    tree_id: at.treeId,
    season: at.season,
    sugarbush_id: at.sugarbushId,
    tree_version: at.treeVersion,
    stand_version: at.standVersion,
    verdict: advice.verdict,
    taps: advice.taps,
    dbh_cm: advice.dbhCm,
    conductive_share: advice.conductiveShare,
    warning_mask: warningMask(advice.warnings.map((w) => w.code)),
    payload: JSON.stringify(kept),
  };
}

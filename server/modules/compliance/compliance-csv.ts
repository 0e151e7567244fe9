import { stringify } from 'csv-stringify/sync';
import {
  complianceCsvColumns,
  complianceCsvCompareColumns,
  type ComplianceItem,
} from '../../../shared/schemas/compliance';

/** A cell a spreadsheet would run as a formula is kept as text. */
const asText = (value: string) => (/^[=+\-@\t\r]/.test(value) ? `'${value}` : value);

/** The report as CSV: a header row, lengths in cm, guidelines by their keys, one tree a row. */
export function complianceCsv(report: {
  season: number;
  profileKey: string;
  compareKey: string | null;
  items: readonly ComplianceItem[];
}): string {
  const columns: string[] = [
    ...complianceCsvColumns,
    ...(report.compareKey ? complianceCsvCompareColumns : []),
  ];
  const rows = report.items.map((i) => ({
    tag: asText(i.tag),
    season: report.season,
    profile: report.profileKey,
    dbhBeforeCm: i.dbhBeforeCm === null ? '' : i.dbhBeforeCm.toFixed(1),
    dbhMeasuredOn: i.dbhMeasuredOn ?? '',
    crownDiebackBeforePct: i.diebackBeforePct ?? '',
    tapsSet: i.tapsSet,
    tapsAllowed: i.tapsAllowed ?? '',
    tapsOver: i.tapsOver,
    holesTooClose: i.holesTooClose,
    findings: i.findings.join(' '),
    ...(report.compareKey && i.compare
      ? {
          compareProfile: report.compareKey,
          compareTapsAllowed: i.compare.tapsAllowed ?? '',
          compareTapsOver: i.compare.tapsOver,
          compareHolesTooClose: i.compare.holesTooClose,
          compareFindings: i.compare.findings.join(' '),
        }
      : {}),
  }));
  return stringify(rows, { header: true, columns, record_delimiter: 'unix' });
}

/** "owl-ledge-compliance-2026-conservative.csv". */
export function complianceFileName(standName: string, season: number, profileKey: string) {
  const slug =
    standName
      .toLowerCase()
      .normalize('NFKD')
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '') || 'stand';
  return `${slug}-compliance-${season}-${profileKey}.csv`;
}

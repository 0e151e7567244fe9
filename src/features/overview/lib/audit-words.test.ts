import { describe, expect, it } from 'vitest';
import type { AuditItem } from '@shared/schemas/audit';
import { auditKinds } from '@shared/schemas/audit';
import { auditKindLabels, auditWords } from './audit-words';

const item = (kind: string, action: string, detail: unknown): AuditItem =>
  ({
    id: 1,
    at: '2026-03-04T12:00:00Z',
    userId: 1,
    userName: 'A',
    kind,
    action,
    entityId: 1,
    detail,
    tree: null,
  }) as unknown as AuditItem;

describe('the audit trail in words', () => {
  it('names every kind the trail filter offers', () => {
    for (const kind of auditKinds) expect(auditKindLabels[kind], kind).toBeTruthy();
  });

  it('says what a season-log entry did', () => {
    expect(
      auditWords(item('weather-day', 'replace', { date: '2026-03-04', earlier: {} }), 'cm'),
    ).toBe('Replaced the weather for 2026-03-04');
    expect(auditWords(item('sap-entry', 'create', { collectedOn: '2026-03-05' }), 'cm')).toBe(
      'Recorded the sap of 2026-03-05',
    );
    expect(
      auditWords(item('sap-entry', 'correct', { earlier: { sugarPct: 2 }, sugarPct: 2.4 }), 'cm'),
    ).toBe('Corrected a sap entry (sugarPct)');
  });

  it('names a stand’s changed fields in either shape, and a tree’s without its earlier values', () => {
    expect(auditWords(item('sugarbush', 'update', ['profile']), 'cm')).toBe(
      'Changed the stand’s guideline',
    );
    expect(
      auditWords(
        item('sugarbush', 'update', { fields: ['name', 'boundary'], earlier: { name: 'Old' } }),
        'cm',
      ),
    ).toBe('Changed the stand’s name and boundary');
    expect(
      auditWords(item('tree', 'update', { status: 'dead', earlier: { status: 'active' } }), 'cm'),
    ).toBe('Set the status to Dead');
  });
});

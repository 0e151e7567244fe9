import { trendSeason, trendsResponse, auditItem } from '@/test/overview-fixtures';
import { auditWords } from './audit-words';
import { basalAreaSentence, dbhSentence, densitySentence, statusSentence } from './trend-words';

const seasons = (...basal: number[]) =>
  trendsResponse({
    items: basal.map((b, n) => trendSeason(2020 + n, { basalFt2: b })),
  });

describe('the sentences that read the trends', () => {
  // BA(ft²) = π/576 · DBH(in)² and BA(m²) = π/40000 · DBH(cm)² (DOMAIN §4 — P): ft²/acre to
  // m²/ha is × 0.229568.
  it('say whether basal area rose, fell or held, rounded as shown', () => {
    expect(basalAreaSentence(seasons(86, 92), 'imperial')).toBe(
      'Basal area per acre rose from 86 to 92 ft² since 2020',
    );
    expect(basalAreaSentence(seasons(92, 88.6), 'imperial')).toBe(
      'Basal area per acre fell from 92 to 89 ft² since 2020',
    );
    expect(basalAreaSentence(seasons(86.2, 85.9), 'imperial')).toBe(
      'Basal area per acre held at 86 ft² from 2020 to 2021',
    );
    // A thinning between the ends is named, so "held" never hides a dip.
    expect(basalAreaSentence(seasons(103, 110, 93, 98, 103.2), 'imperial')).toBe(
      'Basal area per acre was 103 ft² in 2020 and again in 2024, lowest at 93 ft² in 2022',
    );
    expect(basalAreaSentence(seasons(86, 80, 92), 'imperial')).toBe(
      'Basal area per acre rose from 86 to 92 ft² since 2020, lowest at 80 ft² in 2021',
    );
    expect(basalAreaSentence(seasons(86, 84, 92), 'imperial')).toBe(
      'Basal area per acre rose from 86 to 92 ft² since 2020',
    );
    expect(basalAreaSentence(seasons(100), 'metric')).toBe(
      'Basal area per hectare was 23.0 m² in 2020',
    );
  });

  it('leave the planned season out of what was recorded', () => {
    const t = trendsResponse();
    expect(statusSentence(t)).toBe(
      'Living trees went from 994 in 2024 to 994 in 2026; 4 dead and 2 removed by then',
    );
    expect(dbhSentence(t, 'metric')).toBe('Median DBH held at 42.5 cm from 2024 to 2026');
    expect(densitySentence(t, 'imperial')).toBe(
      'Taps set per acre went from 75 in 2024 to 75 in 2026, on 60 trees per acre',
    );
  });
});

describe('the words of the record of changes', () => {
  it('names what each entry did, lengths in the unit shown', () => {
    expect(auditWords(auditItem(), 'cm')).toBe(
      'Recorded DBH 41.2 cm, crown dieback 5 % of 2026-10-02',
    );
    expect(
      auditWords(
        auditItem({ action: 'correct', detail: { measuredOn: '2026-10-02', dbhCm: 41.4 } }),
        'cm',
      ),
    ).toBe('Corrected the measurement of 2026-10-02 to DBH 41.4 cm');
    expect(
      auditWords(
        auditItem({ kind: 'taphole', detail: { season: 2026, heightCm: 110, azimuthDeg: 180 } }),
        'in',
      ),
    ).toBe('Recorded a taphole for 2026 at 43 in, bearing 180°');
    expect(
      auditWords(auditItem({ kind: 'tree', action: 'update', detail: { status: 'dead' } }), 'cm'),
    ).toBe('Set the status to Dead');
    expect(
      auditWords(auditItem({ kind: 'sugarbush', action: 'update', detail: ['profile'] }), 'cm'),
    ).toBe('Changed the stand’s guideline');
    expect(
      auditWords(
        auditItem({
          kind: 'member',
          action: 'change-role',
          detail: { from: 'tapper', to: 'forester' },
        }),
        'cm',
      ),
    ).toBe('Changed a member’s role from tapper to forester');
  });
});

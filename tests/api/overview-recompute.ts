/**
 * The overview's figures worked out again from the raw rows — SQL over trees, measurements,
 * tapholes and the audit trail, and the advisor's public functions — without the trends or
 * compliance services, so an API test can compare the two.
 */
import type { Knex } from 'knex';
import { boundaryAreaM2, M2_PER_ACRE, M2_PER_HA } from '../../shared/geo/area';
import type { Boundary } from '../../shared/geo/boundary';
import { isOutside } from '../../shared/geo/inside';
import {
  adviseTree,
  ASSUMED_RADIAL_GROWTH_CM,
  basalAreaFt2FromIn,
  basalAreaM2,
  cmToIn,
  growth,
  holesInReach,
  keepsClear,
  profiles,
  screenReadings,
  tapsForDbh,
  WIDE_SPOUT_BIT_CM,
  type AdvisorMeasurement,
  type AdvisorTaphole,
  type ProfileKey,
} from '../../shared/rules/index';
import type { TreeStatus } from '../../shared/schemas/enums';

export interface RawTree {
  id: number;
  tag: string;
  lat: number | null;
  lng: number | null;
  status: TreeStatus;
  createdOn: string;
  measurements: AdvisorMeasurement[];
  tapholes: AdvisorTaphole[];
  /** Statuses the audit trail gave it: [YYYY-MM-DD, status, at creation]. */
  statuses: [string, TreeStatus, boolean][];
}

export async function rawStand(db: Knex, standId: number) {
  const stand = await db('sugarbushes').where({ id: standId }).first();
  const trees: RawTree[] = (
    await db('trees').where({ sugarbush_id: standId }).orderBy('tag').select()
  ).map((t) => ({
    id: t.id,
    tag: t.tag,
    lat: t.lat,
    lng: t.lng,
    status: t.status,
    createdOn: String(t.created_at).slice(0, 10),
    measurements: [],
    tapholes: [],
    statuses: [],
  }));
  const byId = new Map(trees.map((t) => [t.id, t]));
  const measurements = await db.raw(
    `select m.* from measurements m join trees t on t.id = m.tree_id
     where t.sugarbush_id = ? and not exists (select 1 from measurements c where c.corrects_id = m.id)
     order by m.tree_id, m.measured_on, m.id`,
    [standId],
  );
  for (const m of measurements.rows ?? measurements)
    byId.get(m.tree_id)!.measurements.push({
      measuredOn: m.measured_on,
      dbhCm: m.dbh_cm,
      crownDiebackPct: m.crown_dieback_pct,
      confirmedOutlier: Boolean(m.confirmed_outlier),
    });
  const holes = await db.raw(
    `select h.* from tapholes h join trees t on t.id = h.tree_id
     where t.sugarbush_id = ? order by h.tree_id, h.season, h.id`,
    [standId],
  );
  for (const h of holes.rows ?? holes)
    byId.get(h.tree_id)!.tapholes.push({
      season: h.season,
      heightCm: h.height_cm,
      azimuthDeg: h.azimuth_deg,
      depthCm: h.depth_cm,
      bitCm: h.bit_cm,
      collection: h.collection,
    });
  const events = await db('audit_events')
    .where({ sugarbush_id: standId, entity: 'tree' })
    .whereIn('action', ['create', 'update'])
    .orderBy(['created_at', 'id'])
    .select();
  for (const e of events) {
    const status = e.detail ? JSON.parse(e.detail).status : undefined;
    if (status)
      byId
        .get(e.entity_id)
        ?.statuses.push([String(e.created_at).slice(0, 10), status, e.action === 'create']);
  }
  return {
    profile: stand.profile as ProfileKey,
    sunnyAzimuthDeg: Number(stand.sunny_azimuth_deg),
    boundary: stand.boundary ? (JSON.parse(stand.boundary) as Boundary) : null,
    trees,
  };
}

export type RawStand = Awaited<ReturnType<typeof rawStand>>;

const yearOf = (iso: string) => Number(iso.slice(0, 4));

/** Quartiles by linear interpolation between ranks (R's type 7, numpy's default). */
export function quartiles(values: number[]) {
  if (values.length === 0) return null;
  const s = [...values].sort((a, b) => a - b);
  const at = (p: number) => {
    const h = (s.length - 1) * p;
    const lo = Math.floor(h);
    return s[lo] + (h - lo) * ((s[lo + 1] ?? s[lo]) - s[lo]);
  };
  return { trees: s.length, q1: at(0.25), median: at(0.5), q3: at(0.75) };
}

function statusAt(t: RawTree, season: number): TreeStatus {
  if (t.statuses.length === 0) return t.status;
  const given = t.statuses.filter(([on]) => on <= `${season}-12-31`);
  if (given.length > 0) return given[given.length - 1][1];
  return t.statuses[0][2] ? t.statuses[0][1] : 'active';
}

/** One season's figures, from the record and the advisor run tree by tree. */
export function recomputeSeason(stand: RawStand, season: number) {
  const areaM2 = stand.boundary ? boundaryAreaM2(stand.boundary) : null;
  const counted = stand.trees.filter((t) => {
    const seasons = [
      ...t.measurements.map((m) => yearOf(m.measuredOn)),
      ...t.tapholes.map((h) => h.season),
    ];
    return (seasons.length > 0 ? Math.min(...seasons) : yearOf(t.createdOn)) <= season;
  });
  const byStatus: Record<string, number> = { active: 0, 'held-out': 0, dead: 0, removed: 0 };
  const warnings: Record<string, number> = {};
  const dbhs: number[] = [];
  const growths: number[] = [];
  const crown: Record<number, number> = {};
  // Conductive-share bands: under 80 %, 80–85, 85–90, 90–95, 95 % and more.
  const bands = [0, 0, 0, 0, 0];
  let tapsSet = 0;
  let tapsAdvised = 0;
  let treesTapped = 0;
  let treesOverAdvice = 0;
  let tapsOverAdvice = 0;
  let inside = 0;
  let insideTapsSet = 0;
  let insideTapsAdvised = 0;
  let basalM2 = 0;
  let basalFt2 = 0;
  for (const t of counted) {
    const status = statusAt(t, season);
    byStatus[status]++;
    const living = status === 'active' || status === 'held-out';
    const history = t.statuses.map(([on, s, created]) => ({ on, status: s, created }));
    const advice = adviseTree(
      { ...t, statusHistory: history },
      {
        season,
        profile: stand.profile,
        sunnyAzimuthDeg: stand.sunnyAzimuthDeg,
      },
    );
    for (const code of new Set(advice.warnings.map((w) => w.code)))
      warnings[code] = (warnings[code] ?? 0) + 1;
    if (living && advice.dbhCm !== null) dbhs.push(advice.dbhCm);
    const accepted = screenReadings(t.measurements).accepted;
    const readIn = (s: number) => accepted.filter((m) => yearOf(m.measuredOn) === s).at(-1);
    const now = readIn(season);
    const before = readIn(season - 1);
    // BA(m²) = π/40000 · DBH(cm)² (DOMAIN §4 — P), here in cm².
    if (living && now && before)
      growths.push((basalAreaM2(now.dbhCm) - basalAreaM2(before.dbhCm)) * 10_000);
    const set = t.tapholes.filter((h) => h.season === season).length;
    tapsSet += set;
    tapsAdvised += advice.taps;
    if (set > 0) treesTapped++;
    if (set > advice.taps) {
      treesOverAdvice++;
      tapsOverAdvice += set - advice.taps;
    }
    if (['tap', 'tap-reduced', 'rest'].includes(advice.verdict)) {
      bands[[0.8, 0.85, 0.9, 0.95].filter((edge) => advice.conductiveShare >= edge).length]++;
    }
    const rated = t.measurements.filter(
      (m) => yearOf(m.measuredOn) === season && m.crownDiebackPct !== null,
    );
    if (rated.length > 0) {
      const pct = rated.at(-1)!.crownDiebackPct!;
      crown[pct] = (crown[pct] ?? 0) + 1;
    }
    const mapped = t.lat !== null && t.lng !== null;
    if (mapped && !isOutside(stand.boundary, t.lng, t.lat)) {
      if (status !== 'removed') {
        inside++;
        insideTapsSet += set;
        insideTapsAdvised += advice.taps;
      }
      if (living && advice.dbhCm !== null) {
        // BA(ft²) = π/576 · DBH(in)² (DOMAIN §4 — P).
        basalM2 += basalAreaM2(advice.dbhCm);
        basalFt2 += basalAreaFt2FromIn(cmToIn(advice.dbhCm));
      }
    }
  }
  const per = (n: number, unit: number) => (areaM2 === null ? null : n / (areaM2 / unit));
  return {
    trees: counted.length,
    byStatus,
    warnings,
    dbhCm: quartiles(dbhs),
    basalAreaGrowthCm2: quartiles(growths),
    tapsSet,
    tapsAdvised,
    treesTapped,
    treesOverAdvice,
    tapsOverAdvice,
    bands,
    crown,
    basalAreaFt2PerAcre: per(basalFt2, M2_PER_ACRE),
    basalAreaM2PerHa: per(basalM2, M2_PER_HA),
    treesPerAcre: per(inside, M2_PER_ACRE),
    treesPerHa: per(inside, M2_PER_HA),
    tapsSetPerAcre: per(insideTapsSet, M2_PER_ACRE),
    tapsAdvisedPerAcre: per(insideTapsAdvised, M2_PER_ACRE),
  };
}

/** One tree's tapping in a season against a published guideline, from its raw record. */
export function recomputeCompliance(t: RawTree, season: number, key: ProfileKey) {
  const profile = profiles[key];
  const holes = t.tapholes.filter((h) => h.season === season);
  const startOfSeason = `${season}-01-01`;
  const accepted = screenReadings(t.measurements).accepted.filter(
    (m) => m.measuredOn < startOfSeason,
  );
  const dbh = accepted.at(-1)?.dbhCm ?? null;
  const rated = t.measurements.filter(
    (m) => m.measuredOn < startOfSeason && m.crownDiebackPct !== null,
  );
  const dieback = rated.at(-1)?.crownDiebackPct ?? null;
  let allowed = dbh === null ? null : tapsForDbh(dbh, profile);
  // With 7/16 in spouts at most 1 tap per tree (OMAFRA — P).
  if (allowed !== null && holes.some((h) => h.bitCm >= WIDE_SPOUT_BIT_CM))
    allowed = Math.min(allowed, 1);
  const over = allowed === null ? 0 : Math.max(0, holes.length - allowed);
  let tooClose = 0;
  if (dbh !== null) {
    const fit = growth(accepted);
    const radial = fit && !fit.suspect ? fit.radialCmPerYear : ASSUMED_RADIAL_GROWTH_CM;
    const older = t.tapholes.filter((h) => h.season < season);
    const rules = {
      spacing: profile.spacing,
      column: {
        stainLengthCm: profile.zone.stainLengthCm,
        stainMarginCm: profile.zone.stainMarginCm,
      },
    };
    for (const h of holes) {
      const reach = holesInReach(older, {
        season,
        depthCm: h.depthCm,
        radialGrowthCmPerYear: radial,
        zone: profile.zone,
      });
      const others = [...holes.filter((o) => o !== h), ...reach];
      if (others.some((o) => !keepsClear(h, h.bitCm, o, rules, Math.PI * dbh))) tooClose++;
    }
  }
  const findings: string[] = [];
  if (holes.length > 0) {
    if (over > 0) findings.push('over');
    if (tooClose > 0) findings.push('too-close');
    if (allowed !== null && tapsForDbh(dbh!, profile) === 0) findings.push('too-small');
    // Crown dieback over 15 % is cause for concern (UVM Forest Ecosystem Monitoring Cooperative — S).
    if (dieback !== null && dieback > profile.stressed.diebackPct) findings.push('declining');
    if (dbh === null) findings.push('unmeasured');
  }
  return { tapsSet: holes.length, dbh, dieback, allowed, over, tooClose, findings };
}

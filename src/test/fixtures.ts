import type { MeResponse } from '@shared/schemas/auth';
import type { Role } from '@shared/schemas/enums';
import type { Page } from '@shared/schemas/list-query';
import type { Measurement } from '@shared/schemas/measurement';
import type { Sugarbush } from '@shared/schemas/sugarbush';
import type { Taphole } from '@shared/schemas/taphole';
import type { Tree } from '@shared/schemas/tree';

export const SUGARBUSH_ID = 3;

export const meAs = (role: Role, unitSystem: 'imperial' | 'metric' = 'metric'): MeResponse => ({
  user: { id: 11, email: `${role}@example.test`, name: `Pat ${role}`, unitSystem },
  memberships: [{ sugarbushId: SUGARBUSH_ID, role }],
});

export const sugarbush = (overrides: Partial<Sugarbush> = {}): Sugarbush => ({
  id: SUGARBUSH_ID,
  name: 'Hollow Creek',
  boundary: null,
  profile: 'conservative',
  customProfile: null,
  sunnyAzimuthDeg: 180,
  role: 'forester',
  treeCount: 1203,
  ...overrides,
});

export const tree = (overrides: Partial<Tree> = {}): Tree => ({
  id: 7,
  sugarbushId: SUGARBUSH_ID,
  tag: '0412',
  species: 'sugar-maple',
  lat: null,
  lng: null,
  status: 'active',
  latestDbhCm: 38.1,
  latestMeasuredOn: '2026-04-02',
  latestCrownDiebackPct: 10,
  ...overrides,
});

export const measurement = (overrides: Partial<Measurement> = {}): Measurement => ({
  id: 1,
  treeId: 7,
  measuredOn: '2025-04-01',
  season: 2025,
  dbhCm: 37.6,
  crownDiebackPct: 10,
  note: null,
  correctsId: null,
  confirmedOutlier: false,
  superseded: false,
  recordedBy: 11,
  clientId: null,
  createdAt: '2025-04-01T12:00:00Z',
  ...overrides,
});

export const taphole = (overrides: Partial<Taphole> = {}): Taphole => ({
  id: 1,
  treeId: 7,
  season: 2026,
  heightCm: 110,
  azimuthDeg: 180,
  depthCm: 5,
  bitCm: 0.79375,
  collection: 'vacuum',
  recordedBy: 11,
  clientId: null,
  createdAt: '2026-03-01T12:00:00Z',
  ...overrides,
});

export const page = <T>(items: T[], extra: Partial<Page<T>> = {}): Page<T> => ({
  items,
  total: items.length,
  page: 1,
  pageSize: 50,
  ...extra,
});

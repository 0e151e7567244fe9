/**
 * What the crew does in the mixed load run: each step of a user's loop is one action (a page,
 * which may be more than one request, or one write), drawn by weight: about 80 % reads and 20 %
 * writes. Foresters record measurements, tappers record tapholes, owners both; one forester's
 * reading in ten is a slip of the tape (8 cm over), which the server must refuse until confirmed.
 */
import { randomUUID } from 'node:crypto';
import Database from 'better-sqlite3';
import type { Role } from '../../shared/schemas/enums';

export interface PoolTree {
  id: number;
  latestDbhCm: number;
}

export interface Step {
  kind: string;
  method: 'GET' | 'POST';
  path: string;
  body?: unknown;
  /** Send the user's last ETag for this kind and count 304 as an answer. */
  conditional?: boolean;
  /** The answer should be this 400 refusal (its error code), not a 2xx. */
  refusal?: string;
}

export interface StandAt {
  standId: number;
  /** The season the plan, map and advice are read for. */
  season: number;
  /** The season the season log (sap, weather) is read for. */
  logSeason: number;
  trees: readonly PoolTree[];
}

type Rng = () => number;
type Action = (at: StandAt, rng: Rng) => Step[];

const pick = <T>(xs: readonly T[], rng: Rng) => xs[Math.floor(rng() * xs.length)];
const page = (rng: Rng) => 1 + Math.floor(rng() * 10);
export const OUTLIER_SHARE = 0.1;
const OUTLIER_CM = 8;

/** The kinds of request, in the order the report lists them, with the route each stands for. */
export const KINDS = {
  'plan page': 'GET /api/sugarbushes/:id/plan?page=1–10&pageSize=50',
  'tree list page': 'GET /api/sugarbushes/:id/trees?page=1–10&pageSize=50',
  'tree page: the tree': 'GET /api/trees/:id',
  'tree page: its advice': 'GET /api/trees/:id/advice',
  'map data': 'GET /api/sugarbushes/:id/map (If-None-Match)',
  'season log: sap list': 'GET /api/sugarbushes/:id/sap?page=1&pageSize=50',
  'season log: weather': 'GET /api/sugarbushes/:id/weather',
  'record a measurement': 'POST /api/trees/:id/measurements',
  'record a taphole': 'POST /api/trees/:id/tapholes',
} as const;
export type Kind = keyof typeof KINDS;
export const TRIVIAL_KIND = 'trivial route';

const get = (kind: Kind, path: string, conditional = false): Step => ({
  kind,
  method: 'GET',
  path,
  conditional,
});

const reads: [number, Action][] = [
  [
    18,
    (a, r) => [
      get(
        'plan page',
        `/api/sugarbushes/${a.standId}/plan?season=${a.season}&page=${page(r)}&pageSize=50`,
      ),
    ],
  ],
  [
    14,
    (a, r) => [
      get('tree list page', `/api/sugarbushes/${a.standId}/trees?page=${page(r)}&pageSize=50`),
    ],
  ],
  [
    20,
    (a, r) => {
      const t = pick(a.trees, r);
      return [
        get('tree page: the tree', `/api/trees/${t.id}`),
        get('tree page: its advice', `/api/trees/${t.id}/advice?season=${a.season}`),
      ];
    },
  ],
  [5, (a) => [get('map data', `/api/sugarbushes/${a.standId}/map?season=${a.season}`, true)]],
  [
    12,
    (a) => [
      get(
        'season log: sap list',
        `/api/sugarbushes/${a.standId}/sap?season=${a.logSeason}&page=1&pageSize=50`,
      ),
    ],
  ],
  [
    11,
    (a) => [
      get('season log: weather', `/api/sugarbushes/${a.standId}/weather?season=${a.logSeason}`),
    ],
  ],
];

const measurement: Action = (a, r) => {
  const t = pick(a.trees, r);
  const slip = r() < OUTLIER_SHARE;
  const grown = t.latestDbhCm + (slip ? OUTLIER_CM : 0.1 + r() * 0.2);
  return [
    {
      kind: 'record a measurement',
      method: 'POST',
      path: `/api/trees/${t.id}/measurements`,
      body: {
        measuredOn: `${a.season - 1}-11-20`,
        dbhCm: Math.round(grown * 10) / 10,
        crownDiebackPct: 0,
        clientId: randomUUID(),
      },
      ...(slip ? { refusal: 'unconfirmed-outlier' } : {}),
    },
  ];
};

const taphole: Action = (a, r) => {
  const t = pick(a.trees, r);
  return [
    {
      kind: 'record a taphole',
      method: 'POST',
      path: `/api/trees/${t.id}/tapholes`,
      body: {
        season: a.season,
        heightCm: 60 + Math.round(r() * 80),
        azimuthDeg: Math.floor(r() * 360),
        depthCm: 5.08,
        bitCm: 0.79,
        collection: 'vacuum',
        clientId: randomUUID(),
      },
    },
  ];
};

const writes: Record<Role, [number, Action][]> = {
  owner: [
    [10, measurement],
    [10, taphole],
  ],
  forester: [[20, measurement]],
  tapper: [[20, taphole]],
  consultant: [],
};

/** Draw a user's next action by weight. */
export function nextAction(role: Role): Action {
  const table = [...reads, ...writes[role]];
  const total = table.reduce((n, [w]) => n + w, 0);
  return (at, rng) => {
    let x = rng() * total;
    for (const [w, act] of table) if ((x -= w) < 0) return act(at, rng);
    return table[table.length - 1][1](at, rng);
  };
}

/** The floor: the same users, the same loop, every step the trivial route. */
export const trivialAction = (): Action => () => [
  { kind: TRIVIAL_KIND, method: 'GET', path: '/api/auth/csrf' },
];

/** Living trees spread over the stand, with their latest DBH, read from the stand's file. */
export function treePool(file: string, standId: number, count: number): PoolTree[] {
  const sqlite = new Database(file, { readonly: true });
  try {
    const all = sqlite
      .prepare(
        `select t.id as id,
           (select m.dbh_cm from measurements m where m.tree_id = t.id
             order by m.measured_on desc, m.id desc limit 1) as latestDbhCm
         from trees t where t.sugarbush_id = ? and t.status = 'active' order by t.id`,
      )
      .all(standId) as { id: number; latestDbhCm: number | null }[];
    const measured = all.filter((t): t is PoolTree => t.latestDbhCm !== null);
    const step = Math.max(1, Math.floor(measured.length / count));
    return measured.filter((_, i) => i % step === 0).slice(0, count);
  } finally {
    sqlite.close();
  }
}

import fc from 'fast-check';
import { multipart, type Send } from './http-client';

/** Field names the API's bodies and queries use, so random objects hit real fields too. */
export const fieldNames = [
  'season',
  'heightCm',
  'azimuthDeg',
  'depthCm',
  'bitCm',
  'collection',
  'drilledOn',
  'stainHit',
  'measuredOn',
  'dbhCm',
  'crownDiebackPct',
  'confirmedOutlier',
  'correctsId',
  'clientId',
  'note',
  'tag',
  'species',
  'lat',
  'lng',
  'status',
  'category',
  'body',
  'followUpOn',
  'resolved',
  'name',
  'boundary',
  'profile',
  'customProfile',
  'sunnyAzimuthDeg',
  'email',
  'role',
  'password',
  'token',
  'collectedOn',
  'volumeL',
  'sugarPct',
  'heldAtC',
  'syrupMadeL',
  'date',
  'minC',
  'maxC',
  'type',
  'coordinates',
  'mapping',
  'unit',
  'dryRun',
] as const;

export const queryNames = [
  'page',
  'pageSize',
  'sort',
  'q',
  'season',
  'profile',
  'compare',
  'finding',
  'changed',
  'status',
  'species',
  'dieback',
  'diebackSeason',
  'fromLat',
  'fromLng',
  'verdict',
  'warning',
  'share',
  'kind',
  'userId',
  'size',
  'dryRun',
  'version',
  'changesPage',
  'changesPageSize',
  'category',
  'followUp',
  'scope',
  'reason',
  'collection',
] as const;

/** Dates no record can hold: year zero, the 31st of February, the end of time, a wrong shape. */
export const impossibleDates = [
  '0000-01-01',
  '2026-02-31',
  '2025-02-29',
  '2026-13-01',
  '2026-00-10',
  '9999-12-31',
  '1899-12-31',
  '26-01-01',
  '2026-1-1',
  '2026-01-01T00:00:00Z',
  '',
];

/** Numbers past sense, and strings standing for the ones JSON cannot carry. */
export const strangeNumbers = [
  0,
  -0,
  -1,
  5e-324,
  1e-300,
  1e308,
  -1e308,
  Number.MAX_SAFE_INTEGER,
  Number.MAX_SAFE_INTEGER + 2,
  2 ** 31,
  0.1 + 0.2,
];
export const numberStrings = [
  'NaN',
  'Infinity',
  '-Infinity',
  '1e309',
  '0x10',
  '1_000',
  ' 5 ',
  '5cm',
];

const hugeString = fc.constantFrom(200, 5_001, 100_001).map((n) => 'ä'.repeat(n));

/** Any value a field might be sent: wrong types, nesting, numbers and dates out of sense. */
export const strangeValue: fc.Arbitrary<unknown> = fc.oneof(
  { depthSize: 'small' },
  fc.constantFrom(...strangeNumbers),
  fc.constantFrom(...numberStrings),
  fc.constantFrom(...impossibleDates),
  fc.constantFrom(0, 1949, 1950, 2027, 2028, 9999, -2026, 2026.5),
  fc.double(),
  fc.integer(),
  fc.string({ maxLength: 40 }),
  fc.string({ unit: 'binary', maxLength: 20 }),
  hugeString,
  fc.boolean(),
  fc.constant(null),
  fc.constantFrom('bucket', 'vacuum', 'owner', 'sugar-maple', 'hazard', 'traditional', 'custom'),
  fc.constantFrom('<script>alert(1)</script>', "'; drop table trees; --", '../../etc/passwd'),
  fc.jsonValue({ maxDepth: 3 }),
);

const dangerousKey = fc.constantFrom('__proto__', 'constructor', 'prototype', 'toString', '');

/** A JSON object of real and unknown field names, some dangerous, with strange values. */
export const strangeObject: fc.Arbitrary<Record<string, unknown>> = fc
  .array(
    fc.tuple(
      fc.oneof(
        { weight: 4, arbitrary: fc.constantFrom(...fieldNames) },
        { weight: 1, arbitrary: dangerousKey },
        { weight: 1, arbitrary: fc.string({ maxLength: 12 }) },
      ),
      strangeValue,
    ),
    { maxLength: 8 },
  )
  .map((pairs) => {
    // Built by assignment-free definition, so `__proto__` is an own key as JSON.parse makes it.
    const o: Record<string, unknown> = {};
    for (const [k, v] of pairs)
      Object.defineProperty(o, k, {
        value: v,
        enumerable: true,
        writable: true,
        configurable: true,
      });
    return o;
  });

const nest = (depth: number, inner: string, open: string, close: string) =>
  open.repeat(depth) + inner + close.repeat(depth);

/** Bodies written as text: what no serializer writes, cut short, nested deep, too large. */
export const rawJsonBody: fc.Arbitrary<Send> = fc.oneof(
  fc
    .tuple(fc.constantFrom(...fieldNames), fc.constantFrom(...numberStrings))
    .map(([k, v]) => ({ raw: `{"${k}": ${v}}` })),
  fc.constantFrom(...fieldNames).map((k) => ({ raw: `{"${k}": 1e309, "__proto__": {"x": 1}}` })),
  fc
    .constantFrom(
      '{"__proto__": {"isAdmin": true}, "constructor": {"prototype": {"role": "owner"}}}',
      '{"a": 1,}',
      "{'a': 1}",
      '{"a": "\\ud800"}',
      '{"a": undefined}',
      'null',
      'true',
      '"just a string"',
      '[]',
      '[{"tag": "T-1"}]',
      '{',
      '',
      '\u0000',
    )
    .map((raw) => ({ raw })),
  fc.tuple(fc.constantFrom(50, 1_000, 20_000), fc.constantFrom('[', '{"a":')).map(([d, open]) => ({
    raw: open === '[' ? nest(d, '1', '[', ']') : nest(d, '1', '{"a":', '}'),
  })),
  strangeObject.map((o) => {
    const text = JSON.stringify(o);
    return { raw: text.slice(0, Math.max(1, Math.floor(text.length / 2))) };
  }),
  fc.constant({ raw: `{"note": "${'x'.repeat(1_100_000)}"}` }),
  strangeObject.map((o) => ({ raw: JSON.stringify(o), contentType: 'text/plain' })),
  strangeObject.map((o) => ({
    raw: new URLSearchParams(Object.entries(o).map(([k, v]) => [k, String(v)])).toString(),
    contentType: 'application/x-www-form-urlencoded',
  })),
);

/** A JSON body as a client would send it (or a non-object one). */
export const jsonBody: fc.Arbitrary<Send> = fc.oneof(
  { weight: 5, arbitrary: strangeObject.map((json) => ({ json })) },
  { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 4 }).map((json) => ({ json })) },
);

const bytes = fc.uint8Array({ maxLength: 2_000 }).map((a) => Buffer.from(a));

/** Multipart forms: random files and fields, a wrong field name, cut short, a broken boundary. */
export const multipartBody: fc.Arbitrary<Send> = fc.oneof(
  fc
    .tuple(
      fc.dictionary(fc.constantFrom('name', 'mapping', 'unit', 'dryRun', 'x'), fc.string()),
      bytes,
    )
    .map(([fields, b]) => multipart(fields, { name: 'f.csv', type: 'text/csv', bytes: b })),
  fc
    .tuple(fc.constantFrom('%PNG', 'tag,species\nT,x\n', 'SQLite format 3\u0000', '<gpx>'), bytes)
    .map(([head, b]) =>
      multipart(
        { mapping: '{"__proto__":{"a":1},"tag":"tag"}' },
        { name: '../../x.png', type: 'image/png', bytes: Buffer.concat([Buffer.from(head), b]) },
      ),
    ),
  fc.tuple(bytes, fc.double({ min: 0, max: 1, noNaN: true })).map(([b, cut]) => {
    const form = multipart({ name: 'x' }, { name: 'f.csv', type: 'text/csv', bytes: b });
    const raw = form.raw.subarray(0, Math.floor(form.raw.length * cut));
    return { raw, contentType: form.contentType };
  }),
  bytes.map((b) => ({ raw: b, contentType: 'multipart/form-data' })),
  bytes.map((b) => ({ raw: b, contentType: 'multipart/form-data; boundary=nope' })),
  // A well-formed form of a field or two and no file at all.
  fc
    .dictionary(fc.constantFrom('name', 'unit', 'dryRun', 'x'), fc.string({ maxLength: 12 }), {
      maxKeys: 2,
    })
    .map((fields) => multipart(fields)),
  fc.constant(multipart({ mapping: 'x'.repeat(70_000) })),
  fc.constant(multipart(Object.fromEntries(Array.from({ length: 20 }, (_, i) => [`f${i}`, 'v'])))),
);

/** A query string of real and unknown parameters, repeated ones, strange values. */
export const queryString: fc.Arbitrary<string> = fc
  .array(
    fc.tuple(
      fc.oneof(
        { weight: 5, arbitrary: fc.constantFrom(...queryNames) },
        { weight: 1, arbitrary: fc.constantFrom('__proto__', 'constructor', 'sort[]', 'a[b]') },
      ),
      fc.oneof(
        fc.constantFrom(...numberStrings),
        fc.constantFrom(...impossibleDates),
        fc.constantFrom('0', '-1', '1', '1950', '9999', '2026', 'tag', '-tag', 'walk', 'drop'),
        fc.string({ maxLength: 20 }),
        fc.constantFrom('x'.repeat(200), '%', '%00', 'a&b=c'),
      ),
    ),
    { maxLength: 5 },
  )
  .map((pairs) =>
    pairs.map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(v)}`).join('&'),
  );

/**
 * Entries that are right but for one field, whose value no record can hold: each must be refused
 * with 400 naming that field. `base` itself is accepted (the test sends it once to prove so).
 */
export interface SenseCase {
  route: string;
  base: Record<string, unknown>;
  nonsense: Record<string, unknown[]>;
}

const farFuture = (days: number) =>
  new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);
const badDays = [...impossibleDates, '1949-12-31', farFuture(3), farFuture(400)];
const badSeasons = [0, -2026, 1949, new Date().getUTCFullYear() + 2, 9999, 2026.5, '2026', null];

export const senseCases: SenseCase[] = [
  {
    route: 'POST /api/trees/:treeId/measurements',
    base: { measuredOn: '2025-11-01', dbhCm: 41.2, crownDiebackPct: 10 },
    nonsense: {
      measuredOn: badDays,
      dbhCm: [5e-324, 1e-300, 0, -1, 2.4, 250.1, 1e308, 'NaN', '40', null],
      crownDiebackPct: [-5, 12, 101, 1e308, 'NaN'],
    },
  },
  {
    route: 'POST /api/trees/:treeId/tapholes',
    base: {
      season: 2025,
      heightCm: 100,
      azimuthDeg: 180,
      depthCm: 5,
      bitCm: 0.79,
      collection: 'vacuum',
    },
    nonsense: {
      season: badSeasons,
      heightCm: [-1, 300.1, 1e308, 'NaN'],
      azimuthDeg: [-1, 360, 1e308, 'NaN'],
      depthCm: [5e-324, 0.5, 8.1, 1e308, 0],
      bitCm: [5e-324, 0.2, 1.4, 2, 1e308],
      drilledOn: badDays,
      collection: ['pipe', '', 1],
    },
  },
  {
    route: 'POST /api/sugarbushes/:id/trees',
    base: { tag: 'S-100', species: 'sugar-maple', lat: 44.1, lng: -72.5 },
    nonsense: {
      tag: ['', ' ', 'x'.repeat(41), 5],
      species: ['oak', ''],
      lat: [90.1, -91, 1e308, 'NaN'],
      lng: [180.5, -1e308, 'Infinity'],
      status: ['gone'],
    },
  },
  {
    route: 'POST /api/trees/:treeId/notes',
    base: { category: 'health', body: 'Bark peeling on the north side.', followUpOn: '2027-04-01' },
    nonsense: {
      category: ['finding', ''],
      body: ['', ' ', 'x'.repeat(5_001)],
      followUpOn: [...impossibleDates.filter((d) => d !== ''), '1949-12-31', farFuture(365 * 11)],
    },
  },
  {
    route: 'POST /api/sugarbushes/:id/issued-plans',
    base: { season: 2026 },
    nonsense: { season: badSeasons.filter((s) => s !== '2026') },
  },
];

/** Queries no list takes: a season out of range, an order or filter it does not have. */
export const senseQueries: { route: string; query: string; field: string }[] = [
  ...['0', '1949', String(new Date().getUTCFullYear() + 2), '9999', 'NaN', '2026.5'].flatMap(
    (s) => [
      { route: 'GET /api/sugarbushes/:id/plan', query: `season=${s}`, field: 'season' },
      { route: 'GET /api/trees/:treeId/advice', query: `season=${s}`, field: 'season' },
      { route: 'GET /api/sugarbushes/:id/compliance', query: `season=${s}`, field: 'season' },
      { route: 'GET /api/sugarbushes/:id/map', query: `season=${s}`, field: 'season' },
      { route: 'GET /api/sugarbushes/:id/attention', query: `season=${s}`, field: 'season' },
      { route: 'GET /api/sugarbushes/:id/plan/progress', query: `season=${s}`, field: 'season' },
    ],
  ),
  { route: 'GET /api/sugarbushes/:id/trees', query: 'sort=height', field: 'sort' },
  {
    route: 'GET /api/sugarbushes/:id/trees',
    query: 'dieback=10&diebackSeason=1900',
    field: 'diebackSeason',
  },
  { route: 'GET /api/trees/:treeId/measurements', query: 'sort=dbhCm', field: 'sort' },
  { route: 'GET /api/trees/:treeId/tapholes', query: 'sort=season', field: 'sort' },
  { route: 'GET /api/trees/:treeId/photos', query: 'sort=size', field: 'sort' },
  { route: 'GET /api/sugarbushes', query: 'sort=name', field: 'sort' },
  { route: 'GET /api/sugarbushes/:id/basemaps', query: 'sort=name', field: 'sort' },
  { route: 'GET /api/sugarbushes/:id/invitations', query: 'sort=email', field: 'sort' },
  { route: 'GET /api/sugarbushes/:id/audit', query: 'sort=at', field: 'sort' },
  { route: 'GET /api/sugarbushes/:id/members', query: 'sort=password', field: 'sort' },
  { route: 'GET /api/sugarbushes/:id/notes', query: 'sort=body', field: 'sort' },
  { route: 'GET /api/sugarbushes/:id/plan', query: 'sort=random', field: 'sort' },
  { route: 'GET /api/sugarbushes/:id/plan', query: 'verdict=maybe', field: 'verdict' },
  { route: 'GET /api/sugarbushes/:id/plan', query: 'warning=sleepy', field: 'warning' },
  { route: 'GET /api/sugarbushes/:id/compliance', query: 'sort=-season', field: 'sort' },
  { route: 'GET /api/sugarbushes/:id/attention', query: 'sort=urgency', field: 'sort' },
];

/**
 * docs/benchmarks.md from one run's figures: the machine and commit, the targets met or missed,
 * then each figure beside its floor.
 */
import type { BundleFigures } from './bundle';
import type { LoadFigures } from './http';
import { pct, type BusyWindow, type MachineInfo } from './machine';
import type { MapFigures } from './map-draw';
import { fmt, kb, ms, ratio, Report, under, type Verdict } from './report';
import {
  CONNECTIONS,
  TRIVIAL,
  type GuidelineFigures,
  type MeasurementFigures,
  type PageFigures,
  type UnderRecompute,
} from './stand-bench';
import { IMPORT_ROWS, type ImportFigures } from './import-bench';
import { mixedHeader, mixedPara, mixedRows, mixedVerdicts } from './mixed-doc';
import type { MixedFigures } from './mixed-load';

export interface StandResult {
  trees: number;
  label: string;
  measurementsCount: number;
  tapholesCount: number;
  generatedS: number | null;
  writtenInS: number | null;
  serverReadyS: number;
  stored: boolean;
  warmMs: number;
  floor: {
    readMs: number;
    planMs: number;
    planOtherMs: number;
    profile: string;
    otherProfile: string;
    busy: BusyWindow;
  };
  pages: PageFigures[];
  map: { best: MapFigures; others: MapFigures[]; busy: BusyWindow } | null;
  measurements: (MeasurementFigures & { busy: BusyWindow }) | null;
  guideline: (GuidelineFigures & { busy: BusyWindow }) | null;
  during: UnderRecompute | null;
  /** The mixed load of the crew beside the trivial route (one stand only; null when it failed). */
  mixed?: MixedFigures | null;
  /** A 10,000-row CSV import beside a bare insert, and the trivial route meanwhile. */
  imports?: ImportFigures | null;
  /** Sections that failed, with the reason; their figures are missing. */
  errors: string[];
}

export interface RunFigures {
  machine: MachineInfo;
  endLoad: number[];
  busy: BusyWindow;
  seconds: number;
  build: { built: boolean; seconds: number };
  bundle: BundleFigures;
  stands: StandResult[];
  season: number;
  mapRuns: number;
}

const TARGETS = {
  pageP99Ms: 50,
  pageRatio: 3,
  oneTreeMs: 20,
  duringRecomputeP99Ms: 50,
  duringImportP99Ms: 50,
  firstDrawMs: { 20000: 1500, 100000: 3000 } as Record<number, number>,
  panMedianMs: 16.7,
  /** Frame intervals in headless Chromium jitter around 16.67 ms by a few tenths. */
  panJitterMs: 0.3,
  initialJsBytes: 180_000,
  runMinutes: 10,
};

const median = (xs: readonly number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length ? s[Math.floor(s.length / 2)] : NaN;
};
const others = (w: BusyWindow) => pct(w.others);
const times = (n: number) => `${fmt(n, n < 10 ? 1 : 0)}×`;
const load = (f: LoadFigures) =>
  (f.connections < CONNECTIONS
    ? ` (on ${f.connections} connection${f.connections > 1 ? 's' : ''}: one request alone took ${ms(f.probeMs ?? NaN)})`
    : '') + (f.failed ? ` (${f.failed} failed)` : f.capped ? ' (cut at the cap)' : '');
const failed = (what: string): Verdict => ({
  what,
  met: false,
  text: 'missed (no figure: the run failed)',
});

export function writeDoc(run: RunFigures): string {
  const r = new Report();
  const { machine: m } = run;
  const largest = run.stands.reduce<StandResult | undefined>(
    (a, s) => (!a || s.trees > a.trees ? s : a),
    undefined,
  );
  const stored = run.stands.some((s) => s.stored);

  // Targets first: what a reader looks for.
  const verdicts: Verdict[] = [];
  if (largest) {
    for (const p of largest.pages) {
      const what = `${p.page}: p99 at ${CONNECTIONS} connections, ${largest.label}`;
      const against = `${p.page}: p99 against the trivial route, ${largest.label}`;
      if (!p.figures) {
        verdicts.push(failed(what), failed(against));
        continue;
      }
      verdicts.push(under(what, p.figures.p99, TARGETS.pageP99Ms));
      verdicts.push(under(against, p.figures.p99 / p.floor.p99, TARGETS.pageRatio, times, 'ratio'));
    }
    const m = largest.measurements;
    const oneTree = `one-tree recompute: measurement POST end to end (median of ${m?.posts.length ?? 0}), ${largest.label}`;
    verdicts.push(m ? under(oneTree, median(m.posts), TARGETS.oneTreeMs) : failed(oneTree));
    const during = `trivial route p99 during a whole-stand recompute, ${largest.label}`;
    verdicts.push(
      largest.during
        ? under(during, largest.during.trivial.p99, TARGETS.duringRecomputeP99Ms)
        : failed(during),
    );
  }
  if (largest) {
    const during = `trivial route p99 during a ${IMPORT_ROWS.toLocaleString('en-US')}-row CSV import, ${largest.label}`;
    verdicts.push(
      largest.imports
        ? under(during, largest.imports.trivial.p99, TARGETS.duringImportP99Ms)
        : failed(during),
    );
  }
  for (const s of run.stands) {
    if (s.mixed) verdicts.push(...mixedVerdicts(s.mixed, s.label));
    else if (s.mixed === null)
      verdicts.push(
        failed(`mixed load: errors, ${s.label}`),
        failed(`mixed load: p99, ${s.label}`),
      );
  }
  for (const s of run.stands) {
    if (!s.map) continue;
    const limit = TARGETS.firstDrawMs[s.trees];
    if (limit)
      verdicts.push(under(`map first full draw, ${s.label}`, s.map.best.firstDrawMs, limit));
    verdicts.push(
      under(
        `map pan frames, median while dragging, ${s.label} (limit includes ${TARGETS.panJitterMs} ms of frame jitter)`,
        s.map.best.drag.median,
        TARGETS.panMedianMs + TARGETS.panJitterMs,
        (n) => `${fmt(n, 1)} ms`,
      ),
    );
  }
  verdicts.push(
    under('initial JavaScript, gzip', run.bundle.initialGzip, TARGETS.initialJsBytes, kb),
  );
  verdicts.push(
    under(
      'the whole `npm run bench`',
      run.seconds / 60,
      TARGETS.runMinutes,
      (n) => `${fmt(n, 1)} min`,
    ),
  );

  r.heading('Targets');
  const met = verdicts.filter((v) => v.met).length;
  r.para(`${met} of ${verdicts.length} met.\n`);
  r.table(
    ['', 'target', 'result'],
    verdicts.map((v) => [v.met ? 'met' : '**missed**', v.what, r.verdict(v)]),
  );

  r.heading('The stands');
  r.para(
    `Invented stands written by \`tests/bench/synthetic-stand.ts\` (cached under the temp dir by generator version), ${run.stands[0]?.measurementsCount ? 'ten seasons of autumn measurements and the tapholes of each season' : ''}; each run works on a fresh copy. Season advised: ${run.season}. Stored advice on the server: ${stored ? 'yes (advice-status route present)' : 'no (advice computed on request)'}.\n`,
  );
  r.table(
    [
      'stand',
      'measurements',
      'tapholes',
      'written',
      'server answering after start',
      'first plan page after start',
    ],
    run.stands.map((s) => [
      s.label,
      fmt(s.measurementsCount, 0),
      fmt(s.tapholesCount, 0),
      s.generatedS !== null
        ? `${fmt(s.generatedS, 1)} s`
        : `from the cache${s.writtenInS === null ? '' : ` (written in ${fmt(s.writtenInS, 1)} s)`}`,
      `${fmt(s.serverReadyS, 1)} s`,
      ms(s.warmMs),
    ]),
  );

  r.heading(`Pages at ${CONNECTIONS} connections, beside the trivial route`);
  r.para(
    `autocannon, signed in as the stand's owner, ${CONNECTIONS} connections, a few seconds a run (a route whose single request takes more than a twentieth of the run is sent one request per connection instead, so its slowest answers are counted, and on as many connections as it can answer within 30 s). The floor is \`GET ${TRIVIAL}\` of the same app with the same cookie, measured the same way just before each page. Tree pages cycle through 200 trees spread over the stand.\n`,
  );
  r.table(
    [
      'stand',
      'page',
      'p50',
      'p99',
      'req/s',
      'trivial p50',
      'trivial p99',
      'trivial req/s',
      'p99 ÷ trivial p99',
      'others used',
    ],
    run.stands.flatMap((s) =>
      s.pages.map((p) =>
        p.figures
          ? [
              s.label,
              `${p.page}${load(p.figures)}`,
              ms(p.figures.p50),
              ms(p.figures.p99),
              fmt(p.figures.rps, 0),
              ms(p.floor.p50),
              ms(p.floor.p99),
              fmt(p.floor.rps, 0),
              ratio(p.figures.p99, p.floor.p99),
              others(p.busy),
            ]
          : [s.label, `${p.page} (failed: ${p.error})`, '', '', '', '', '', '', '', others(p.busy)],
      ),
    ),
  );

  r.heading('Recompute, beside a single-thread planStand of the whole stand');
  r.para(
    `The floor is the pure advisor (\`planStand\` from \`shared/rules\`) over the whole stand on one thread in the benchmark's own process, with the record already in memory (reading it straight from the file took ${run.stands.map((s) => `${ms(s.floor.readMs)} at ${s.label}`).join(', ')}). A measurement is a plausible autumn reading on ${run.stands[0]?.measurements?.posts.length ?? 0} trees in turn; the guideline change is \`PATCH /api/sugarbushes/:id { profile }\`, then ${stored ? 'polling advice-status until current' : 'the next plan page (before stored advice, the next plan request does the work)'}.\n`,
  );
  r.table(
    ['stand', 'what', 'time', 'planStand', '÷ planStand', 'others used'],
    run.stands.flatMap((s) => {
      const m = s.measurements;
      const g = s.guideline;
      const floor = s.floor.planMs;
      const other = s.floor.planOtherMs;
      const rows: string[][] = [];
      if (!m) rows.push([s.label, 'after a measurement (failed)', '', ms(floor), '', '']);
      if (!g) rows.push([s.label, 'after a guideline change (failed)', '', ms(other), '', '']);
      return [
        ...rows,
        ...(m
          ? [
              [
                s.label,
                `measurement POST, median (max ${ms(Math.max(...m.posts))})`,
                ms(median(m.posts)),
                ms(floor),
                ratio(median(m.posts), floor),
                others(m.busy),
              ],
              [
                s.label,
                `then the tree's advice, median (max ${ms(Math.max(...m.adviceReads))})`,
                ms(median(m.adviceReads)),
                ms(floor),
                ratio(median(m.adviceReads), floor),
                others(m.busy),
              ],
              [
                s.label,
                'then a plan page',
                ms(m.planAfter),
                ms(floor),
                ratio(m.planAfter, floor),
                others(m.busy),
              ],
            ]
          : []),
        ...(g
          ? [
              [
                s.label,
                `guideline → ${s.floor.otherProfile}: the PATCH`,
                ms(g.patchMs),
                ms(other),
                ratio(g.patchMs, other),
                others(g.busy),
              ],
              [
                s.label,
                g.stored ? 'PATCH sent → advice current' : 'PATCH sent → next plan page answered',
                ms(g.recomputeMs),
                ms(other),
                ratio(g.recomputeMs, other),
                others(g.busy),
              ],
              [
                s.label,
                'then a plan page',
                ms(g.planAfterMs),
                ms(other),
                ratio(g.planAfterMs, other),
                others(g.busy),
              ],
            ]
          : []),
      ];
    }),
  );

  r.heading('The trivial route while the whole stand is re-advised');
  r.para(
    `The guideline is changed back (\`${run.stands[0]?.floor.profile ?? ''}\`), ${stored ? 'and autocannon runs on the trivial route until advice-status says current' : 'a plan page is requested, and autocannon runs on the trivial route until it answers'}; the idle figure is the first trivial run of the same stand.\n`,
  );
  r.table(
    [
      'stand',
      'recompute under load',
      'trivial p50',
      'trivial p99',
      'req/s',
      'requests',
      'idle trivial p99',
      'p99 ÷ idle',
      'others used',
    ],
    run.stands.map((s) => {
      const idle = s.pages.find((p) => p.floor)?.floor;
      if (!s.during) return [s.label, 'failed', '', '', '', '', '', '', ''];
      const t = s.during.trivial;
      return [
        s.label,
        ms(s.during.recomputeMs),
        ms(t.p50),
        ms(t.p99),
        fmt(t.rps, 0),
        `${fmt(t.requests, 0)}${load(t)}`,
        idle ? ms(idle.p99) : 'n/a',
        idle ? ratio(t.p99, idle.p99) : 'n/a',
        others(s.during.busy),
      ];
    }),
  );

  for (const s of run.stands.filter((x) => x.mixed)) {
    r.heading(`Mixed load: ${s.mixed!.users} users for ${s.mixed!.seconds} s, ${s.label}`);
    r.para(`${mixedPara(s.mixed!)}\n`);
    r.table(mixedHeader, mixedRows(s.mixed!));
    r.para(
      `Others used ${others(s.mixed!.floor.busy)} of the cores during the floor run and ${others(s.mixed!.mixed.busy)} during the mixed run.` +
        (s.mixed!.mixed.errorSamples.length
          ? ` The first errors: ${s.mixed!.mixed.errorSamples.map((e) => `\`${e}\``).join('; ')}.`
          : ''),
    );
  }

  r.heading('A CSV import of 10,000 trees');
  r.para(
    `\`tests/bench/import-bench.ts\`: ${IMPORT_ROWS.toLocaleString('en-US')} new trees posted as one CSV file to \`POST /api/sugarbushes/:id/imports/trees\` (read and checked in a worker, matched by tag, written in batches in one transaction, the new trees advised by the worker pool before the answer; its progress polled every 500 ms as the import page does), beside a bare prepared insert of the same rows in one transaction on a copy of the same file; autocannon runs on the trivial route until the import answers.\n`,
  );
  r.table(
    [
      'stand',
      'import',
      'bare insert',
      'import ÷ insert',
      'trivial p50',
      'trivial p99',
      'requests',
      'others used',
    ],
    run.stands.map((s) => {
      const f = s.imports;
      if (!f) return [s.label, 'failed', '', '', '', '', '', ''];
      return [
        s.label,
        ms(f.importMs),
        ms(f.floorMs),
        ratio(f.importMs, f.floorMs),
        ms(f.trivial.p50),
        ms(f.trivial.p99),
        `${fmt(f.trivial.requests, 0)}${load(f.trivial)}`,
        others(f.busy),
      ];
    }),
  );

  const mapped = run.stands.filter((s) => s.map);
  if (mapped.length) {
    r.heading('Woods map in headless Chromium');
    r.para(
      `\`tests/bench/map-draw.ts\`: ${m.chromium}, 1280×800, signed in as the owner; first full draw is navigation → every marker in the layer and two frames painted (the fastest of ${run.mapRuns} page loads; the others in the last column). The floor beside it is the map data request as the page saw it. Panning drags 480 px across and 200 px down in 60 steps over 2 s.\n`,
    );
    r.table(
      [
        'stand',
        'first full draw',
        'map data request',
        'draw ÷ data',
        'data in hand → painted',
        'longest task',
        'drag frames median / p95 / max',
        'long frames',
        'redraw after release',
        'map data',
        'JS heap',
        'other loads',
        'others used',
      ],
      mapped.map((s) => {
        const f = s.map!.best;
        return [
          s.label,
          ms(f.firstDrawMs),
          ms(f.fetch.ms),
          ratio(f.firstDrawMs, f.fetch.ms),
          ms(f.firstDrawMs - Math.max(f.fetch.endAt, f.code?.endAt ?? 0)),
          ms(f.longestTaskMs),
          `${fmt(f.drag.median, 1)} / ${fmt(f.drag.p95, 1)} / ${fmt(f.drag.max, 1)} ms`,
          fmt(f.drag.long, 0),
          ms(f.afterRelease.max),
          `${fmt(f.fetch.bytes / 2 ** 20, 1)} MiB (${fmt(f.fetch.wireBytes / 2 ** 20, 1)} MiB sent)`,
          f.heapBytes === null ? 'n/a' : `${fmt(f.heapBytes / 2 ** 20, 0)} MiB`,
          s.map!.others.map((o) => ms(o.firstDrawMs)).join(', ') || '–',
          others(s.map!.busy),
        ];
      }),
    );
  }

  const errors = run.stands.flatMap((s) => s.errors.map((e) => `- ${s.label}: ${e}`));
  if (errors.length) {
    r.heading('Sections that failed');
    r.para(errors.join('\n'));
  }

  r.heading('Client bundle');
  const b = run.bundle;
  r.para(
    `Read from \`dist/\` after \`vite build\`${run.build.built ? ` (built in this run, ${fmt(run.build.seconds, 0)} s)` : ''}, each file gzipped with zlib (level 9); 1 kB = 1,000 bytes. Initial JavaScript is the entry script and its modulepreloads in dist/index.html (${b.initial.map((c) => `\`${c.file}\``).join(', ')}): **${kb(b.initialGzip)} gzip** (${kb(b.initial.reduce((n, c) => n + c.bytes, 0))} raw); initial CSS ${kb(b.initialCss.reduce((n, c) => n + c.gzip, 0))} gzip. Each lazy chunk, and what it loads beyond the initial set with its static imports:\n`,
  );
  r.table(
    ['chunk', 'raw', 'gzip', 'gzip with its imports'],
    b.lazy.map((c) => [
      `\`${c.file.replace(/^assets\//, '')}\``,
      kb(c.bytes),
      kb(c.gzip),
      kb(c.withImportsGzip),
    ]),
  );

  const date = new Date().toISOString().replace('T', ' ').slice(0, 16);
  const preface = [
    `Written by \`npm run bench\` on ${date} UTC at commit \`${m.commit}\`${m.dirty ? ' (with uncommitted changes)' : ''}.`,
    `Machine: ${m.cores} cores (${m.cpu}), ${m.memoryGiB} GiB, Node ${m.node}. Load average ${m.load.join(' / ')} at the start and ${run.endLoad.map((n) => fmt(n, 2)).join(' / ')} at the end; other processes used ${pct(run.busy.others)} of the cores during the run (the benchmark, its server and its browser ${pct(run.busy.ours)}). The whole run took ${fmt(run.seconds / 60, 1)} min.`,
    '',
    'Every figure stands beside a floor measured in the same run: pages beside a trivial route of the same app, recomputes beside a single-thread `planStand` of the whole stand, the map beside its own data request. The machine is shared, so read the ratios rather than the milliseconds, and the "others used" column for how busy it was. Nothing here is asserted by `npm test`.',
  ].join('\n');
  return r.markdown('Benchmarks', preface);
}

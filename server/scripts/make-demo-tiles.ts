/**
 * `npm run tiles:demo`: render the demo stand's background map as static XYZ tiles under
 * public/tiles/owl-ledge/{z}/{x}/{y}.png, plus tiles.json. The terrain is invented (seeded noise
 * over a hill, a hollow and a brook) and the output is the same on every run.
 */
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { PNG } from 'pngjs';
import { toLatLng, toXY, type XY } from '../../seeds/demo/geo';
import { OWL_LEDGE } from '../../seeds/demo/owl-ledge';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const OUT = path.join(root, 'public', 'tiles', 'owl-ledge');
const MIN_ZOOM = 14;
const MAX_ZOOM = 18;
const SIZE = 256;
const MARGIN_M = 150;
const SEED = 2027;

type RGB = readonly [number, number, number];
const hex = (h: string): RGB =>
  [1, 3, 5].map((i) => parseInt(h.slice(i, i + 2), 16)) as unknown as RGB;
const PAPER = hex('#FBF8F1');
const BARK = hex('#5B4636');
const MOSS = hex('#3F6B4A');
const WATER = hex('#6F93AB');
const mix = (a: RGB, b: RGB, t: number): RGB =>
  [0, 1, 2].map((i) => Math.round(a[i] + (b[i] - a[i]) * t)) as unknown as RGB;

// --- invented terrain, in metres east/north of the stand's origin ---------------------------

const [LEDGE, SEEP] = OWL_LEDGE.gaps.map((g) => g.centre);
/** The brook: rises at the seep, runs down the south-west hollow and out of the stand. */
const BROOK: XY[] = [
  SEEP,
  [-262, -150],
  [-286, -178],
  [-318, -204],
  [-360, -231],
  [-425, -262],
  [-520, -300],
  [-610, -352],
  [-720, -380],
];

/** A lattice value in [-1, 1] from integer coordinates (integer hash, seeded). */
function lattice(ix: number, iy: number, octave: number): number {
  let h =
    Math.imul(ix, 374761393) ^ Math.imul(iy, 668265263) ^ Math.imul(SEED + octave, 1274126177);
  h = Math.imul(h ^ (h >>> 13), 1103515245);
  h ^= h >>> 16;
  return ((h >>> 0) / 4294967295) * 2 - 1;
}
const fade = (t: number) => t * t * t * (t * (t * 6 - 15) + 10);

/** Smooth value noise at one wavelength (metres). */
function noise(x: number, y: number, wavelength: number, octave: number): number {
  const gx = x / wavelength;
  const gy = y / wavelength;
  const ix = Math.floor(gx);
  const iy = Math.floor(gy);
  const u = fade(gx - ix);
  const v = fade(gy - iy);
  const a = lattice(ix, iy, octave) + (lattice(ix + 1, iy, octave) - lattice(ix, iy, octave)) * u;
  const b =
    lattice(ix, iy + 1, octave) +
    (lattice(ix + 1, iy + 1, octave) - lattice(ix, iy + 1, octave)) * u;
  return a + (b - a) * v;
}

function distanceToLine(p: XY, line: readonly XY[], closed = false) {
  let best = Infinity;
  let along = 0;
  let bestAlong = 0;
  const n = closed ? line.length : line.length - 1;
  for (let i = 0; i < n; i++) {
    const a = line[i];
    const b = line[(i + 1) % line.length];
    const dx = b[0] - a[0];
    const dy = b[1] - a[1];
    const len = Math.hypot(dx, dy);
    const t = Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / (len * len)));
    const d = Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy);
    if (d < best) {
      best = d;
      bestAlong = along + t * len;
    }
    along += len;
  }
  return { d: best, along: bestAlong };
}

const bump = (p: XY, c: XY, sd: number) =>
  Math.exp(-((p[0] - c[0]) ** 2 + (p[1] - c[1]) ** 2) / (2 * sd * sd));

/** Ground height in metres: a hill around the ledge falling to the south-west hollow. */
function elevation(p: XY): number {
  const slope = 0.03 * (0.55 * p[0] + 0.85 * p[1]);
  // The hill runs north-east to south-west, a little longer than it is wide.
  const along = ((p[0] - LEDGE[0]) * 0.8 + (p[1] - LEDGE[1]) * 0.6) / 1.35;
  const across = (p[1] - LEDGE[1]) * 0.8 - (p[0] - LEDGE[0]) * 0.6;
  const hill = 34 * bump([along, across], [0, 0], 210) + 7 * bump(p, LEDGE, 48);
  const hollow = -12 * bump(p, [-235, -150], 110);
  const valley = -5 * Math.exp(-(distanceToLine(p, BROOK).d ** 2) / (2 * 22 ** 2));
  const rough =
    6 * noise(p[0], p[1], 300, 0) +
    2.2 * noise(p[0], p[1], 140, 1) +
    0.6 * noise(p[0], p[1], 70, 2);
  return 410 + slope + hill + hollow + valley + rough;
}

// --- tiles -----------------------------------------------------------------------------------

const worldPx = (z: number) => SIZE * 2 ** z;
const lngOf = (gx: number, z: number) => (gx / worldPx(z)) * 360 - 180;
const latOf = (gy: number, z: number) =>
  (Math.atan(Math.sinh(Math.PI * (1 - (2 * gy) / worldPx(z)))) * 180) / Math.PI;
const tileX = (lng: number, z: number) => Math.floor(((lng + 180) / 360) * 2 ** z);
const tileY = (lat: number, z: number) => {
  const r = (lat * Math.PI) / 180;
  return Math.floor(((1 - Math.log(Math.tan(r) + 1 / Math.cos(r)) / Math.PI) / 2) * 2 ** z);
};

function renderTile(z: number, tx: number, ty: number): Buffer {
  const { origin, ring } = OWL_LEDGE;
  const n = SIZE + 1;
  const heights = new Float64Array(n * n);
  const places: XY[] = new Array(n * n);
  for (let j = 0; j < n; j++)
    for (let i = 0; i < n; i++) {
      const p = toXY(origin, latOf(ty * SIZE + j + 0.5, z), lngOf(tx * SIZE + i + 0.5, z));
      places[j * n + i] = p;
      heights[j * n + i] = elevation(p);
    }
  const mPerPx = Math.hypot(places[1][0] - places[0][0], places[1][1] - places[0][1]);
  const interval = z >= 17 ? 2 : z >= 16 ? 5 : 10;
  const indexEvery = z >= 17 ? 10 : 25;
  const png = new PNG({ width: SIZE, height: SIZE, colorType: 2 });
  for (let j = 0; j < SIZE; j++)
    for (let i = 0; i < SIZE; i++) {
      const k = j * n + i;
      const p = places[k];
      const h = heights[k];
      // Hill shading from the north-west, in a few steps so the tiles stay small.
      const dzdx = (heights[k + 1] - h) / mPerPx;
      const dzdy = (h - heights[k + n]) / mPerPx; // rows run south
      const shade = Math.round(Math.max(-1, Math.min(1, (dzdx - dzdy) * 4)) * 4) / 4;
      const band = Math.floor(h / 10);
      let c = mix(PAPER, MOSS, 0.045 + 0.012 * (band % 3));
      c = shade < 0 ? mix(c, BARK, -shade * 0.13) : mix(c, PAPER, shade * 0.7);
      const crossed = (other: number) => Math.floor(other / interval) !== Math.floor(h / interval);
      if (crossed(heights[k + 1]) || crossed(heights[k + n])) {
        const level = Math.round(h / interval) * interval;
        c = mix(c, BARK, level % indexEvery === 0 ? 0.5 : 0.25);
      }
      const brook = distanceToLine(p, BROOK).d / mPerPx;
      if (brook < Math.max(1.2, 1.8 / mPerPx)) c = WATER;
      else if (brook < Math.max(2.2, 6 / mPerPx)) c = mix(c, WATER, 0.18);
      const edge = distanceToLine(p, ring, true);
      const dash = Math.floor(edge.along / mPerPx / 7) % 2 === 0;
      if (edge.d / mPerPx < (z >= 16 ? 1.3 : 0.9) && dash) c = mix(c, BARK, 0.75);
      png.data.set([c[0], c[1], c[2], 255], (j * SIZE + i) * 4);
    }
  return PNG.sync.write(png, { colorType: 2, deflateLevel: 9 });
}

function main() {
  const xs = OWL_LEDGE.ring.map((p) => p[0]);
  const ys = OWL_LEDGE.ring.map((p) => p[1]);
  const sw = toLatLng(OWL_LEDGE.origin, [Math.min(...xs) - MARGIN_M, Math.min(...ys) - MARGIN_M]);
  const ne = toLatLng(OWL_LEDGE.origin, [Math.max(...xs) + MARGIN_M, Math.max(...ys) + MARGIN_M]);
  const round = (v: number) => Number(v.toFixed(6));
  const bounds = [round(sw.lng), round(sw.lat), round(ne.lng), round(ne.lat)];

  fs.rmSync(OUT, { recursive: true, force: true });
  let count = 0;
  let bytes = 0;
  for (let z = MIN_ZOOM; z <= MAX_ZOOM; z++) {
    for (let x = tileX(sw.lng, z); x <= tileX(ne.lng, z); x++) {
      fs.mkdirSync(path.join(OUT, String(z), String(x)), { recursive: true });
      for (let y = tileY(ne.lat, z); y <= tileY(sw.lat, z); y++) {
        const png = renderTile(z, x, y);
        fs.writeFileSync(path.join(OUT, String(z), String(x), `${y}.png`), png);
        count++;
        bytes += png.length;
      }
    }
  }
  const description = {
    name: 'Owl Ledge (invented terrain)',
    minZoom: MIN_ZOOM,
    maxZoom: MAX_ZOOM,
    bounds,
    attribution: 'Invented terrain for the Clearwood demo',
  };
  // Laid out as Prettier would, so formatting the repository leaves the file alone.
  const json = JSON.stringify(description, null, 2).replace(
    /\[\s+([^\]]*?)\s+\]/,
    (_, inner: string) => `[${inner.split(/,\s+/).join(', ')}]`,
  );
  fs.writeFileSync(path.join(OUT, 'tiles.json'), `${json}\n`);
  console.log(
    `Wrote ${count} tiles (${(bytes / 2 ** 20).toFixed(2)} MB) for zooms ${MIN_ZOOM}–${MAX_ZOOM} to ${path.relative(root, OUT)}`,
  );
}

main();

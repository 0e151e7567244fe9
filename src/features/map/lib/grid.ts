/** The spacings the plain background draws its lines at, in metres. */
export const GRID_STEPS_M = [10, 50, 100, 500] as const;

/** Lines closer than this on screen would be a grey wash, not a grid. */
export const MIN_LINE_GAP_PX = 40;

const EARTH_CIRCUMFERENCE_M = 40_075_016.686;

/** Ground metres one screen pixel covers in Web Mercator at this zoom and latitude. */
export function metresPerPixel(zoom: number, latDeg: number): number {
  return (EARTH_CIRCUMFERENCE_M * Math.cos((latDeg * Math.PI) / 180)) / (256 * 2 ** zoom);
}

/**
 * The finest step whose lines stay at least MIN_LINE_GAP_PX apart, or null when even the
 * widest step would crowd the screen (the map is zoomed far out).
 */
export function gridStepM(zoom: number, latDeg: number): number | null {
  const mpp = metresPerPixel(zoom, latDeg);
  for (const step of GRID_STEPS_M) if (step / mpp >= MIN_LINE_GAP_PX) return step;
  return null;
}

const M_PER_DEG_LAT = 111_132;
const mPerDegLng = (latDeg: number) => 111_320 * Math.cos((latDeg * Math.PI) / 180);

export interface GridLines {
  step: number;
  /** Longitudes of north–south lines, and whether each is a major (5 × step) line. */
  meridians: { lng: number; major: boolean }[];
  parallels: { lat: number; major: boolean }[];
}

/**
 * Grid lines inside a view, in whole metres from a fixed reference latitude so they stay put
 * while the map pans. Over a few kilometres the flat-earth error is well below a line's width.
 */
export function gridLines(
  view: { west: number; south: number; east: number; north: number },
  step: number,
  refLatDeg: number,
): GridLines {
  const kx = mPerDegLng(refLatDeg);
  const meridians: GridLines['meridians'] = [];
  const parallels: GridLines['parallels'] = [];
  const major = (m: number) => Math.round(m / step) % 5 === 0;
  for (let x = Math.floor((view.west * kx) / step) * step; x <= view.east * kx; x += step) {
    meridians.push({ lng: x / kx, major: major(x) });
  }
  for (
    let y = Math.floor((view.south * M_PER_DEG_LAT) / step) * step;
    y <= view.north * M_PER_DEG_LAT;
    y += step
  ) {
    parallels.push({ lat: y / M_PER_DEG_LAT, major: major(y) });
  }
  return { step, meridians, parallels };
}

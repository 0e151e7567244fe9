import type { MarkerShape } from './verdict-style';

/**
 * The outline of a verdict's marker as an SVG path, centred on (x, y) with radius r. The
 * canvas draws it through Path2D and the legend through <path>, so both show the same shape.
 */
export function shapePath(shape: MarkerShape, x: number, y: number, r: number): string {
  const f = (n: number) => Math.round(n * 100) / 100;
  switch (shape) {
    case 'circle':
    case 'ring':
      return `M${f(x - r)},${f(y)}a${f(r)},${f(r)} 0 1,0 ${f(2 * r)},0a${f(r)},${f(r)} 0 1,0 ${f(-2 * r)},0Z`;
    case 'diamond': {
      const d = r * 1.3;
      return `M${f(x)},${f(y - d)}L${f(x + d)},${f(y)}L${f(x)},${f(y + d)}L${f(x - d)},${f(y)}Z`;
    }
    case 'triangle': {
      const t = r * 1.35;
      return `M${f(x)},${f(y - t)}L${f(x + t * 0.866)},${f(y + t * 0.5)}L${f(x - t * 0.866)},${f(y + t * 0.5)}Z`;
    }
    case 'square':
    case 'open-square': {
      const s = r * 0.9;
      return `M${f(x - s)},${f(y - s)}h${f(2 * s)}v${f(2 * s)}h${f(-2 * s)}Z`;
    }
  }
}

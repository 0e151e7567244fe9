import { AppError } from '../../errors';
import { MAX_TILE_ZOOM } from '../../../shared/schemas/map';

export interface TileCoords {
  z: number;
  x: number;
  /** XYZ row, counted from the north. */
  y: number;
}

const whole = /^\d{1,9}$/;

/**
 * `:z/:x/:y` of a tile URL in XYZ numbering; `y` may carry an image extension (`12.png`).
 * Anything not a whole number within the zoom level is a 400 naming the part.
 */
export function parseTileCoords(params: Record<string, string | undefined>): TileCoords {
  const fields: Record<string, string> = {};
  const zRaw = params.z ?? '';
  const xRaw = params.x ?? '';
  const yRaw = (params.y ?? '').replace(/\.(png|jpe?g|webp)$/i, '');
  const z = whole.test(zRaw) ? Number(zRaw) : NaN;
  if (!(z >= 0 && z <= MAX_TILE_ZOOM)) fields.z = `Zoom must be a whole number 0–${MAX_TILE_ZOOM}`;
  const last = Number.isNaN(z) || fields.z ? null : 2 ** z - 1;
  const within = (raw: string, key: 'x' | 'y', what: string) => {
    const v = whole.test(raw) ? Number(raw) : NaN;
    if (Number.isNaN(v) || (last !== null && v > last))
      fields[key] = `${what} must be a whole number 0–${last ?? '2^z − 1'}`;
    return v;
  };
  const x = within(xRaw, 'x', 'The column');
  const y = within(yRaw, 'y', 'The row');
  if (Object.keys(fields).length)
    throw new AppError(400, 'invalid-input', 'The tile address is not valid', fields);
  return { z, x, y };
}

/** MBTiles stores rows TMS-style, counted from the south: `tile_row = 2^z − 1 − y`. */
export const tmsRow = ({ z, y }: TileCoords) => 2 ** z - 1 - y;

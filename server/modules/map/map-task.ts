import { gzipSync } from 'node:zlib';
import type { Knex } from 'knex';
import { Piscina } from 'piscina';
import { mapColumns } from './map-columns';
import { mapRepository } from './map.repository';

/** The map's answer as it goes out: the JSON's bytes, and the same gzipped when asked for. */
export interface MapBytes {
  json: Uint8Array;
  gzip: Uint8Array | null;
}

/** `complete` is false where a tree has no current row: a write went around the services. */
export type MapBuilt = MapBytes & { complete: boolean };

/**
 * The map's answer for a guideline version, built and serialised where it runs (a worker):
 * the stand query, the boundary test, the columns, `JSON.stringify` and gzip at level 1.
 * Where it is not `complete` the caller has the stand checked again and asks once more.
 */
export async function buildMapBytes(
  db: Knex,
  t: { sugarbushId: number; season: number; standVersion: number; gzip: boolean },
): Promise<MapBuilt> {
  const repo = mapRepository(db);
  const [rows, boundary] = await Promise.all([
    repo.standRows(t.sugarbushId, t.season, t.standVersion),
    repo.boundary(t.sugarbushId),
  ]);
  const json = Buffer.from(JSON.stringify(mapColumns(t.season, rows, boundary)));
  return {
    complete: rows.every((r) => r.verdict !== null),
    json: owned(json),
    gzip: t.gzip ? owned(gzipSync(json, { level: 1 })) : null,
  };
}

/** A view over the whole of its own memory, so it can be handed over, never a slice of a pool. */
const owned = (b: Uint8Array) =>
  b.byteOffset === 0 && b.byteLength === b.buffer.byteLength ? b : new Uint8Array(b);

/**
 * The answer wrapped so the worker hands its bytes to the request thread instead of copying
 * them; piscina unwraps it, so the request thread receives the `MapBytes` themselves.
 */
export function movedMapBytes(answer: MapBuilt): MapBuilt {
  const buffers = [answer.json.buffer, ...(answer.gzip ? [answer.gzip.buffer] : [])];
  const movable = {
    get [Piscina.transferableSymbol]() {
      return buffers;
    },
    get [Piscina.valueSymbol]() {
      return answer;
    },
  };
  // piscina's types name its symbols only as `symbol`; the object is its own kind of transferable.
  return Piscina.move(movable as unknown as ArrayBuffer) as unknown as MapBuilt;
}

import type { MapBytes } from './map-task';

/**
 * The last few map answers, as bytes, by their tag (which names the stand, the season, the
 * guideline version and the stand's change counter), kept a short while: people opening the map
 * at the same version get the same bytes without a rebuild, and requests that arrive while one
 * is being built wait for that build instead of starting their own.
 */
export function mapAnswers(opts: { size: number; keepMs: number; now?: () => number }) {
  const now = opts.now ?? Date.now;
  const kept = new Map<string, { bytes: MapBytes; at: number }>();
  const building = new Map<string, { gzip: boolean; promise: Promise<MapBytes> }>();

  function keep(tag: string, bytes: MapBytes) {
    kept.delete(tag);
    kept.set(tag, { bytes, at: now() });
    // A Map iterates in insertion order: the first key is the one used longest ago.
    for (const oldest of kept.keys()) {
      if (kept.size <= opts.size) break;
      kept.delete(oldest);
    }
  }

  return {
    /** The answer for `tag`, gzipped too when `gzip`; `build` is called only when none will do. */
    get(tag: string, gzip: boolean, build: (gzip: boolean) => Promise<MapBytes>) {
      const hit = kept.get(tag);
      if (hit && now() - hit.at > opts.keepMs) kept.delete(tag);
      else if (hit && (!gzip || hit.bytes.gzip)) {
        // Used again: now the newest, though its time still runs from when it was built.
        kept.delete(tag);
        kept.set(tag, hit);
        return Promise.resolve(hit.bytes);
      }
      const pending = building.get(tag);
      if (pending && (!gzip || pending.gzip)) return pending.promise;
      const promise: Promise<MapBytes> = build(gzip)
        .then((bytes) => {
          keep(tag, bytes);
          return bytes;
        })
        .finally(() => {
          if (building.get(tag)?.promise === promise) building.delete(tag);
        });
      building.set(tag, { gzip, promise });
      return promise;
    },
  };
}

/**
 * Zips as boundary files come in them: a zipped Shapefile, a KMZ. Read with `but-unzip` (what
 * shpjs unzips with), loaded only when such a file comes.
 */

/**
 * Whether the bytes end with a zip's end-of-central-directory record (in its last 64 KiB), as
 * every zip does. The unzipper shpjs uses never returns on bytes without one.
 */
export function hasZipDirectory(bytes: Uint8Array): boolean {
  const lowest = Math.max(0, bytes.length - 22 - 0xffff);
  for (let i = bytes.length - 22; i >= lowest; i--)
    if (
      bytes[i] === 0x50 &&
      bytes[i + 1] === 0x4b &&
      bytes[i + 2] === 0x05 &&
      bytes[i + 3] === 0x06
    )
      return true;
  return false;
}

export type ZipEntries = { filename: string; read: () => Promise<Uint8Array> | Uint8Array }[];

/** The zip's entries (its directory; nothing is inflated yet), or null when it cannot be read. */
export async function zipEntries(bytes: Uint8Array): Promise<ZipEntries | null> {
  const { iter } = await import('but-unzip');
  try {
    return [...iter(bytes)];
  } catch {
    return null;
  }
}

export const isKml = (filename: string) =>
  /\.kml$/i.test(filename) && !filename.startsWith('__MACOSX/') && !/(^|\/)\._/.test(filename);

/**
 * The main KML of a KMZ: `doc.kml` at the zip's root (Google's convention), else the first
 * `.kml` in it, as text. Images and other KML beside it are left out. `entries` when the
 * caller has listed the zip already.
 */
export async function kmlOfKmz(
  bytes: Uint8Array,
  /** A KML inflated larger than this is refused, as any boundary file that large. */
  maxBytes: number,
  entries?: ZipEntries,
): Promise<{ text: string } | { error: string }> {
  const damaged = {
    error: 'The .kmz is damaged or not a zip file. Save it again as KMZ, or as KML.',
  };
  if (!hasZipDirectory(bytes)) return damaged;
  const all = entries ?? (await zipEntries(bytes));
  if (!all) return damaged;
  const kmls = all.filter((e) => isKml(e.filename));
  const main = kmls.find((e) => e.filename.toLowerCase() === 'doc.kml') ?? kmls[0];
  if (!main) return { error: 'The .kmz holds no .kml file. Save the outline as KML or KMZ again.' };
  let inner: Uint8Array;
  try {
    inner = await main.read();
  } catch {
    return damaged;
  }
  if (inner.byteLength > maxBytes)
    return {
      error: `The KML inside the .kmz is ${(inner.byteLength / 1024 / 1024).toFixed(0)} MB; a stand's outline is far smaller. Export only the stand.`,
    };
  return { text: new TextDecoder('utf-8').decode(inner).replace(/^\uFEFF/, '') };
}

import { readFileSync } from 'node:fs';
import { area, distance } from '@turf/turf';
import { DOMParser } from '@xmldom/xmldom';
import { describe, expect, it } from 'vitest';
import { readBoundaryFile, type BoundaryFileRead } from './boundary-file';
import { mergeOutlines } from './boundary-shapes';
import type { Boundary, LngLat } from './boundary';

const fixtures = new URL('../../tests/fixtures/boundaries/', import.meta.url);
const bytes = (file: string) => readFileSync(new URL(file, fixtures));
const parseXml = (text: string) =>
  new DOMParser({ onError: () => undefined }).parseFromString(
    text,
    'text/xml',
  ) as unknown as Document;
const read = (file: string) => readBoundaryFile(file, bytes(file), { parseXml });
const text = (name: string, value: string) =>
  readBoundaryFile(name, new TextEncoder().encode(value), { parseXml });

function candidatesOf(result: BoundaryFileRead) {
  if ('error' in result) throw new Error(`expected outlines, got: ${result.error}`);
  return result.candidates;
}
const errorOf = (result: BoundaryFileRead) => ('error' in result ? result.error : null);
const outerRing = (boundary: Boundary): LngLat[] =>
  boundary.type === 'Polygon' ? boundary.coordinates[0] : boundary.coordinates[0][0];

/** The corners of a ring without its closing repeat, so rings in either direction compare. */
const corners = (ring: LngLat[]) => ring.slice(0, -1);
/** For each corner of `a`, how far (m) the nearest corner of `b` lies. */
const cornerGaps = (a: LngLat[], b: LngLat[]) =>
  corners(a).map((p) => Math.min(...corners(b).map((q) => distance(p, q, { units: 'meters' }))));

describe('reading a boundary file', () => {
  it('when ogr2ogr wrote a WGS 84 GeoJSON, then its crs member, its layer name and the feature name are read', async () => {
    const result = await read('lantern-hollow.geojson');
    expect(result).toMatchObject({ crs: 'CRS84', layerName: 'lantern-hollow', skipped: [] });
    const [outline] = candidatesOf(result);
    expect(candidatesOf(result)).toHaveLength(1);
    expect(outline.name).toBe('Lantern Hollow');
    expect(outline.geometry.type).toBe('Polygon');
    expect(corners(outerRing(outline.geometry))).toHaveLength(8);
    expect(outline.areaM2).toBeCloseTo(area(outline.geometry), 3);
    expect(outline.areaM2 / 10_000).toBeGreaterThan(30);
    expect(outline.areaM2 / 10_000).toBeLessThan(36);
  });

  it('when the same outline is in UTM zone 18N, then every vertex comes back within 0.5 m of the WGS 84 file', async () => {
    const utm = await read('lantern-hollow-utm18n.geojson');
    expect(utm).toMatchObject({ crs: 'EPSG:32618', layerName: 'lantern-hollow-utm18n' });
    const wgs84 = outerRing(candidatesOf(await read('lantern-hollow.geojson'))[0].geometry);
    const projected = outerRing(candidatesOf(utm)[0].geometry);
    expect(projected).toHaveLength(wgs84.length);
    projected.forEach((p, i) => {
      expect(distance(p, wgs84[i], { units: 'meters' })).toBeLessThan(0.5);
    });
  });

  it('when the KML, the KMZ, the GPX track and the Shapefiles hold the outline, then each gives the same outline and name', async () => {
    const wgs84 = outerRing(candidatesOf(await read('lantern-hollow.geojson'))[0].geometry);
    for (const file of [
      'lantern-hollow.kml',
      'lantern-hollow.kmz',
      'lantern-hollow.gpx',
      'lantern-hollow-shp.zip',
      'lantern-hollow-utm18n-shp.zip',
    ]) {
      const found = candidatesOf(await read(file));
      expect(found, file).toHaveLength(1);
      expect(found[0].name, file).toBe('Lantern Hollow');
      const ring = outerRing(found[0].geometry);
      expect(ring.length, file).toBe(wgs84.length);
      for (const gap of [...cornerGaps(ring, wgs84), ...cornerGaps(wgs84, ring)])
        expect(gap, file).toBeLessThan(0.5);
    }
  });

  it('when a KMZ is renamed .zip, or names its KML otherwise than doc.kml, then the KML inside is still read', async () => {
    const kmz = bytes('lantern-hollow.kmz');
    const renamed = candidatesOf(await readBoundaryFile('outline.zip', kmz, { parseXml }));
    expect(renamed[0].name).toBe('Lantern Hollow');
    const unnamed = candidatesOf(await readBoundaryFile('outline', kmz, { parseXml }));
    expect(unnamed[0].name).toBe('Lantern Hollow');
    // The entry's name in the zip's directories, same length: "doc.kml" → "lot.kml".
    const otherName = Buffer.from(
      kmz.toString('latin1').replaceAll('doc.kml', 'lot.kml'),
      'latin1',
    );
    expect(candidatesOf(await readBoundaryFile('b.kmz', otherName, { parseXml }))).toHaveLength(1);
  });

  it('when a .kmz is not a zip, or holds no KML, then the message says so', async () => {
    expect(errorOf(await text('a.kmz', '<kml></kml>'))).toBe(
      'The .kmz is damaged or not a zip file. Save it again as KMZ, or as KML.',
    );
    expect(errorOf(await text('a.kmz', 'PK not a zip'))).toMatch(/damaged or not a zip file/);
    const noKml = Buffer.from(
      bytes('lantern-hollow.kmz').toString('latin1').replaceAll('doc.kml', 'doc.txt'),
      'latin1',
    );
    expect(errorOf(await readBoundaryFile('a.kmz', noKml, { parseXml }))).toBe(
      'The .kmz holds no .kml file. Save the outline as KML or KMZ again.',
    );
  });

  it('when the crs member names a system Clearwood does not know, then the file is refused naming it', async () => {
    expect(errorOf(await read('lantern-hollow-epsg2949.geojson'))).toBe(
      'The file is in EPSG:2949, which Clearwood cannot read yet; export it in WGS 84 (EPSG:4326).',
    );
    const crs = { type: 'name', properties: { name: 'EPSG:31370' } };
    const square = {
      type: 'Polygon',
      coordinates: [
        [
          [0, 0],
          [1, 0],
          [1, 1],
          [0, 0],
        ],
      ],
    };
    expect(errorOf(await text('x.geojson', JSON.stringify({ ...square, crs })))).toMatch(
      /^The file is in EPSG:31370, which Clearwood cannot read yet/,
    );
  });

  it('when a file holds two polygons, then both are candidates, and merging gives their union', async () => {
    const found = candidatesOf(await read('two-lots.geojson'));
    expect(found.map((c) => c.name)).toEqual(['Upper Lot', 'Lower Lot']);
    const merged = mergeOutlines(found.map((c) => c.geometry));
    if (!merged.ok) throw new Error(merged.message);
    // The two lots share an edge: their union is one polygon with both areas and no more.
    expect(merged.boundary.type).toBe('Polygon');
    expect(area(merged.boundary)).toBeCloseTo(found[0].areaM2 + found[1].areaM2, -1);
    const ring = outerRing(merged.boundary);
    expect(corners(ring)).toHaveLength(6); // the shared edge's two ends stay, the edge goes
  });

  it('when outlines are apart, then merging keeps them as parts of one MultiPolygon', () => {
    const square = (lng: number): Boundary => ({
      type: 'Polygon',
      coordinates: [
        [
          [lng, 44.31],
          [lng + 0.001, 44.31],
          [lng + 0.001, 44.311],
          [lng, 44.311],
          [lng, 44.31],
        ],
      ],
    });
    const merged = mergeOutlines([square(-72.64), square(-72.63)]);
    expect(merged.ok && merged.boundary.type).toBe('MultiPolygon');
    expect(merged.ok && merged.boundary.coordinates).toHaveLength(2);
  });
});

describe('files that are not what they seem', () => {
  const ring = [
    [-72.6331, 44.3121],
    [-72.6302, 44.3109],
    [-72.6269, 44.3114],
    [-72.6331, 44.3121],
  ];

  it('when a GPX track does not come back to its start, then it is refused saying how far apart its ends are', async () => {
    const open = readFileSync(new URL('lantern-hollow.gpx', fixtures), 'utf8').replace(
      /<trkpt lat="44.3121" lon="-72.6331">\s*<\/trkpt>\s*<\/trkseg>/,
      '</trkseg>',
    );
    const error = errorOf(await text('walk.gpx', open));
    expect(error).toMatch(/"Lantern Hollow" is a line or track that does not end where it starts/);
    const gap = distance([-72.6338, 44.3141], [-72.6331, 44.3121], { units: 'meters' });
    expect(error).toContain(`(its ends are ${Math.round(gap)} m apart)`);
  });

  it('when coordinates are metres but no crs says so, then the file is refused asking for WGS 84', async () => {
    const utm = JSON.parse(
      readFileSync(new URL('lantern-hollow-utm18n.geojson', fixtures), 'utf8'),
    );
    delete utm.crs;
    expect(errorOf(await text('x.geojson', JSON.stringify(utm)))).toMatch(
      /^The coordinates are not longitude and latitude degrees \(one is 688767.9, 4909262.6\)/,
    );
  });

  it('when a polygon breaks the boundary rules, then it is skipped with the rule, and with nothing left the file is refused', async () => {
    const bowtie = {
      type: 'Polygon',
      coordinates: [
        [
          [0, 0],
          [1, 1],
          [1, 0],
          [0, 1],
          [0, 0],
        ],
      ],
    };
    const good = { type: 'Polygon', coordinates: [ring] };
    const both = await text(
      'two.json',
      JSON.stringify({
        type: 'FeatureCollection',
        features: [
          { type: 'Feature', properties: { Name: 'Crossed' }, geometry: bowtie },
          { type: 'Feature', properties: {}, geometry: good },
        ],
      }),
    );
    expect(candidatesOf(both).map((c) => c.name)).toEqual(['Polygon 2']);
    expect('skipped' in both && both.skipped[0]).toMatchObject({ name: 'Crossed' });
    expect('skipped' in both && both.skipped[0].reason).toMatch(/crosses itself/);
    expect(errorOf(await text('one.json', JSON.stringify(bowtie)))).toMatch(
      /^The file holds no outline Clearwood can use: "Polygon 1" cannot be used: The boundary crosses itself/,
    );
  });

  it('when the file is broken, empty, the wrong kind or loose Shapefile parts, then the message says so', async () => {
    expect(errorOf(await text('a.geojson', '{ nope'))).toMatch(/isn't valid JSON/);
    expect(errorOf(await text('a.kml', '<kml><Document>'))).toMatch(/not well-formed XML/);
    expect(errorOf(await text('a.kml', '<gpx></gpx>'))).toBe(
      'The file is named .kml but holds <gpx>, not KML.',
    );
    expect(errorOf(await text('a.zip', 'PK not a zip'))).toMatch(/damaged or not a zip file/);
    const notShapefile = readFileSync(new URL('lantern-hollow-shp.zip', fixtures))
      .toString('latin1')
      .replace(/lantern-hollow\.shp/g, 'lantern-hollow.txt');
    expect(errorOf(await text('b.zip', ''))).toBe('The file is empty.');
    expect(errorOf(await readBoundaryFile('b.zip', Buffer.from(notShapefile, 'latin1')))).toMatch(
      /^The .zip holds no .shp file/,
    );
    expect(errorOf(await text('a.shp', 'x'))).toMatch(/zip the .shp together with/);
    expect(errorOf(await text('a.dwg', 'x'))).toMatch(/cannot read a .dwg file/);
    expect(errorOf(await readBoundaryFile('a.geojson', new Uint8Array()))).toBe(
      'The file is empty.',
    );
    expect(
      errorOf(await text('a.json', JSON.stringify({ type: 'Point', coordinates: [-72.6, 44.3] }))),
    ).toMatch(/"Polygon 1" is a point, not an outline/);
  });

  it('when the outline is a bare geometry, a Feature or a FeatureCollection, then each gives the same candidate', async () => {
    const geometry = { type: 'Polygon', coordinates: [ring] };
    const feature = { type: 'Feature', properties: { name: 'Sap Run' }, geometry };
    const reads = await Promise.all(
      [geometry, feature, { type: 'FeatureCollection', features: [feature] }].map((value) =>
        text('x.geojson', JSON.stringify(value)),
      ),
    );
    const found = reads.map((r) => candidatesOf(r)[0]);
    expect(found.map((c) => c.name)).toEqual(['Polygon 1', 'Sap Run', 'Sap Run']);
    for (const c of found) expect(c.geometry).toEqual(geometry);
  });

  it('when a feature is a MultiPolygon or a collection of polygons, then it stays one candidate of several parts', async () => {
    const east = ring.map(([lng, lat]) => [lng + 0.01, lat]);
    const parts = await text(
      'x.geojson',
      JSON.stringify({
        type: 'Feature',
        properties: { NAME: 'Two parts' },
        geometry: {
          type: 'GeometryCollection',
          geometries: [
            { type: 'Polygon', coordinates: [ring] },
            { type: 'Polygon', coordinates: [east] },
          ],
        },
      }),
    );
    const [only] = candidatesOf(parts);
    expect(candidatesOf(parts)).toHaveLength(1);
    expect(only).toMatchObject({ name: 'Two parts', geometry: { type: 'MultiPolygon' } });
    expect(only.geometry.coordinates).toHaveLength(2);
  });

  it('when a file has no extension, then its content says what it is', async () => {
    const kml = readFileSync(new URL('lantern-hollow.kml', fixtures), 'utf8');
    expect(candidatesOf(await text('outline', kml))[0].name).toBe('Lantern Hollow');
  });
});

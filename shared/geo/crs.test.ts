import { describe, expect, it } from 'vitest';
import { readCrsMember, readCrsName, toWgs84 } from './crs';

/** Spherical Web Mercator written out (EPSG:3857), to check the proj4 string against. */
const R = 6378137;
const mercator = (lng: number, lat: number) => [
  (R * lng * Math.PI) / 180,
  R * Math.log(Math.tan(Math.PI / 4 + (lat * Math.PI) / 360)),
];

describe('the coordinate system of a file', () => {
  it('when the name is spelled as GDAL, the 2008 GeoJSON specification or an OGC URL spell it, then the same code is read', () => {
    for (const name of [
      'urn:ogc:def:crs:EPSG::32618',
      'urn:ogc:def:crs:EPSG:6.6:32618',
      'EPSG:32618',
      'http://www.opengis.net/def/crs/EPSG/0/32618',
    ])
      expect(readCrsName(name), name).toMatchObject({
        ok: true,
        code: 'EPSG:32618',
        degrees: false,
      });
    expect(readCrsMember({ type: 'EPSG', properties: { code: 32618 } })).toMatchObject({
      code: 'EPSG:32618',
    });
    expect(
      readCrsMember({ type: 'name', properties: { name: 'urn:ogc:def:crs:OGC:1.3:CRS84' } }),
    ).toMatchObject({
      ok: true,
      degrees: true,
    });
    expect(readCrsMember(undefined)).toMatchObject({ ok: true, code: 'CRS84' });
  });

  it('when it is a UTM zone north, south or on NAD83, or Web Mercator, then it is known; other codes are refused by name', () => {
    for (const code of [32601, 32660, 32701, 32760, 26901, 26923, 3857])
      expect(readCrsName(`EPSG:${code}`).ok, String(code)).toBe(true);
    for (const code of [32661, 32700, 26924, 2949, 27700]) {
      const read = readCrsName(`EPSG:${code}`);
      expect(read.ok ? 'read' : read.message).toBe(
        `The file is in EPSG:${code}, which Clearwood cannot read yet; export it in WGS 84 (EPSG:4326).`,
      );
    }
    const link = readCrsMember({ type: 'link', properties: { href: 'http://example.com/crs' } });
    expect(link.ok ? '' : link.message).toMatch(/linked at http:\/\/example.com\/crs/);
  });

  it('when a geometry is in Web Mercator or a southern UTM zone, then it comes back in degrees where it was', () => {
    const web = readCrsName('EPSG:3857');
    if (!web.ok || !web.definition) throw new Error('Web Mercator unread');
    const point = toWgs84(
      { type: 'Point', coordinates: mercator(-72.6331, 44.3121) },
      web.definition,
    );
    expect(point.coordinates[0]).toBeCloseTo(-72.6331, 6);
    expect(point.coordinates[1]).toBeCloseTo(44.3121, 6);
    // The false northing of a southern zone: 10,000 km at the equator, on the central meridian.
    const south = readCrsName('EPSG:32719');
    if (!south.ok || !south.definition) throw new Error('UTM 19S unread');
    const equator = toWgs84({ type: 'Point', coordinates: [500000, 10000000] }, south.definition);
    expect(equator.coordinates[0]).toBeCloseTo(-69, 6);
    expect(equator.coordinates[1]).toBeCloseTo(0, 6);
  });
});

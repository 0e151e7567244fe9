declare module 'shpjs' {
  interface ShapefileCollection {
    type: 'FeatureCollection';
    features: { type: 'Feature'; geometry: unknown; properties: Record<string, unknown> | null }[];
    fileName?: string;
  }
  /** Reads a zipped Shapefile (bytes), reprojected to WGS 84 by its .prj; one collection per .shp. */
  export default function shp(
    input: ArrayBuffer | Uint8Array,
  ): Promise<ShapefileCollection | ShapefileCollection[]>;
}

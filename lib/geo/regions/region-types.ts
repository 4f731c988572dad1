import type { MultiPolygon, Polygon } from 'geojson';

/** Properties every region carries: a stable id (used in tables and URLs) and a display name. */
export interface RegionProperties {
  /** Stable identifier, unique in its collection, e.g. 'north-atlantic' or 'box-lat-45s_40s-lon-170w_165w'. */
  id: string;
  /** Display name for tables and maps. */
  name: string;
  /**
   * Present when the region is exactly a lon/lat rectangle [west, south, east, north] in degrees; points then
   * belong by west ≤ lon < east, south ≤ lat < north (north = 90 inclusive) instead of by the polygon.
   */
  box?: [number, number, number, number];
}

/** One region: a GeoJSON Feature whose rings follow d3-geo's winding (exterior clockwise on a north-up map). */
export interface RegionFeature {
  /** Always 'Feature'. */
  type: 'Feature';
  /** Same as properties.id. */
  id: string;
  /** Id and name. */
  properties: RegionProperties;
  /** Polygon or MultiPolygon in degrees lon/lat, edges read as great-circle arcs (d3-geo). */
  geometry: Polygon | MultiPolygon;
}

/** A region scheme: a FeatureCollection of regions in a stable order. */
export interface RegionCollection {
  /** Always 'FeatureCollection'. */
  type: 'FeatureCollection';
  /** Regions; assignRegion gives a point to the first one containing it. */
  features: RegionFeature[];
}

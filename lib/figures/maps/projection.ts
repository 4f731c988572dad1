// Map projections (d3-geo): Equal Earth for the globe, polar azimuthal equal-area for either pole, fitted to a box.
import { geoAzimuthalEqualArea, geoCircle, geoEqualEarth, type GeoProjection, type GeoPermissibleObjects } from 'd3-geo';

/** Projection names a map can use. */
export type MapProjectionKind = 'equal-earth' | 'south-polar' | 'north-polar';

/** How to fit a projection. */
export interface ProjectionOptions {
  /** Box [[x0, y0], [x1, y1]] in SVG px the map fills. */
  extent: [[number, number], [number, number]];
  /** Polar maps: the latitude (degrees, absolute) at which the disc is clipped (default 40). */
  boundaryLat?: number;
  /** Central meridian in degrees east (default 0; e.g. 150 for a Pacific-centred globe). */
  centralLon?: number;
}

/** A fitted projection with the outline of its visible region (for the sphere frame and raster masking). */
export interface MapProjection {
  /** The d3-geo projection, scale and translate fitted to the extent. */
  projection: GeoProjection;
  /** Visible region: the whole sphere, or the polar cap inside the boundary latitude. */
  outline: GeoPermissibleObjects;
  /** Is (lon, lat) inside the visible region? Used to mask raster pixels. */
  visible(lon: number, lat: number): boolean;
  /** Projection kind. */
  kind: MapProjectionKind;
}

/** The d3-geo projection for `kind`, fitted to `options.extent`: Equal Earth (Šavrič et al. 2019) or azimuthal equal-area at a pole. */
export function makeProjection(kind: MapProjectionKind, options: ProjectionOptions): MapProjection {
  const centralLon = options.centralLon ?? 0;
  if (kind === 'equal-earth') {
    const outline: GeoPermissibleObjects = { type: 'Sphere' };
    const projection = geoEqualEarth().rotate([-centralLon, 0]).fitExtent(options.extent, outline);
    return { projection, outline, visible: () => true, kind };
  }
  const boundary = Math.abs(options.boundaryLat ?? 40);
  const south = kind === 'south-polar';
  const poleLat = south ? -90 : 90;
  const radius = 90 - boundary;
  // A circle polygon (d3 geoCircle) is the cap boundary; its precision sets how round the frame is.
  const outline = geoCircle().center([0, poleLat]).radius(radius).precision(1)();
  const projection = geoAzimuthalEqualArea()
    .rotate([-centralLon, south ? 90 : -90])
    .clipAngle(radius)
    .fitExtent(options.extent, outline);
  const visible = south ? (_lon: number, lat: number) => lat <= -boundary : (_lon: number, lat: number) => lat >= boundary;
  return { projection, outline, visible, kind };
}

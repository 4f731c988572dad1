// World land polygons (Natural Earth 1:110m via world-atlas) and the graticule, as GeoJSON for d3-geo paths.
import { feature } from 'topojson-client';
import { geoGraticule } from 'd3-geo';
import type { Topology, GeometryCollection } from 'topojson-specification';
import type { Feature, FeatureCollection, MultiLineString } from 'geojson';
import land110 from 'world-atlas/land-110m.json' with { type: 'json' };

let cached: FeatureCollection | Feature | undefined;

/** Natural Earth 1:110m land (world-atlas 2.0.2): small (55 kB) and fixed, so map bytes do not change with data. */
export function landFeature(): FeatureCollection | Feature {
  // Decoded once: the topology is a constant module asset, so caching cannot change results.
  cached ??= feature(land110 as unknown as Topology, (land110 as unknown as Topology).objects.land as GeometryCollection);
  return cached;
}

/** Graticule lines every `stepDeg` degrees (d3 geoGraticule), meridians stopping short of the poles as d3 does. */
export function graticuleLines(stepDeg = 30): MultiLineString {
  return geoGraticule().step([stepDeg, stepDeg]).precision(1)();
}

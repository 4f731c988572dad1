// A gridded field drawn as one PNG image: every output pixel inverse-projected, sampled and coloured.
import { encode } from 'fast-png';
import type { MapProjection } from './projection.js';
import type { ColourScale } from './colour-scale.js';
import { sampleBilinear, sampleNearest, type LatticeField } from '../raster-sample.js';
import { base64 } from './base64.js';

/** Raster options: the box it covers in SVG px and how many image pixels per SVG px. */
export interface RasterOptions {
  /** Box [[x0, y0], [x1, y1]] in SVG px (the map's extent). */
  extent: [[number, number], [number, number]];
  /** Image pixels per SVG px (default 2, enough for 600 dpi at single-column width). */
  pixelRatio?: number;
  /** Nearest node (default; shows the grid's own cells) or bilinear. */
  sampling?: 'nearest' | 'bilinear';
}

/** The raster as PNG bytes and as a data: URI, with its placement in SVG px. */
export interface RasterImage {
  /** PNG bytes (RGBA, missing and off-globe pixels transparent). */
  png: Uint8Array;
  /** `data:image/png;base64,…` for an SVG <image>. */
  href: string;
  /** Placement in SVG px. */
  x: number;
  y: number;
  width: number;
  height: number;
  /** Image size in pixels. */
  pixelWidth: number;
  pixelHeight: number;
}

/** Rasterise `field` through `map`'s projection with `scale` colours; pixels whose inverse does not project back onto themselves are off the globe. */
export function rasterImage(field: LatticeField, map: MapProjection, scale: ColourScale, options: RasterOptions): RasterImage {
  const [[x0, y0], [x1, y1]] = options.extent;
  const ratio = options.pixelRatio ?? 2;
  const pw = Math.max(1, Math.round((x1 - x0) * ratio));
  const ph = Math.max(1, Math.round((y1 - y0) * ratio));
  const sx = (x1 - x0) / pw;
  const sy = (y1 - y0) / ph;
  const sample = options.sampling === 'bilinear' ? sampleBilinear : sampleNearest;
  const { projection } = map;
  const data = new Uint8Array(pw * ph * 4);
  const lut = scale.lut;
  const point: [number, number] = [0, 0];
  for (let j = 0; j < ph; j++) {
    for (let i = 0; i < pw; i++) {
      point[0] = x0 + (i + 0.5) * sx;
      point[1] = y0 + (j + 0.5) * sy;
      const ll = projection.invert?.(point);
      if (!ll || !Number.isFinite(ll[0]) || !Number.isFinite(ll[1])) continue;
      const lon = ll[0];
      const lat = ll[1];
      if (lat < -90 || lat > 90 || lon < -540 || lon > 540 || !map.visible(lon, lat)) continue;
      const back = projection(ll);
      // Off-globe pixels invert to some lon/lat that projects elsewhere: reject them.
      if (!back || Math.abs(back[0] - point[0]) > sx || Math.abs(back[1] - point[1]) > sy) continue;
      const k = scale.index(sample(field, ((((lon + 180) % 360) + 360) % 360) - 180, lat));
      if (k < 0) continue;
      const o = (j * pw + i) * 4;
      data[o] = lut[k * 3];
      data[o + 1] = lut[k * 3 + 1];
      data[o + 2] = lut[k * 3 + 2];
      data[o + 3] = 255;
    }
  }
  const png = encode({ width: pw, height: ph, data, channels: 4, depth: 8 });
  return { png, href: `data:image/png;base64,${base64(png)}`, x: x0, y: y0, width: x1 - x0, height: y1 - y0, pixelWidth: pw, pixelHeight: ph };
}

import { describe, expect, it } from 'vitest';
import { decode } from 'fast-png';
import { makeProjection } from '../../../lib/figures/maps/projection.js';
import { colourScale } from '../../../lib/figures/maps/colour-scale.js';
import { rasterImage } from '../../../lib/figures/maps/raster.js';
import type { LatticeField } from '../../../lib/figures/raster-sample.js';

// A 10° lattice, all 1 except one hot node at (35°E, −45°N).
const lon = Float64Array.from({ length: 36 }, (_, i) => -175 + 10 * i);
const lat = Float64Array.from({ length: 18 }, (_, j) => -85 + 10 * j);
const values = new Float32Array(36 * 18).fill(1);
const hotX = 21; // lon[21] = 35
const hotY = 4; // lat[4] = -45
values[hotY * 36 + hotX] = 100;
const field: LatticeField = { lon, lat, values, periodicLon: true };
const scale = colourScale({ domain: [1, 100], scheme: 'viridis' });

function pixelAt(png: ReturnType<typeof decode>, x: number, y: number): number[] {
  const o = (Math.floor(y) * png.width + Math.floor(x)) * png.channels;
  return Array.from(png.data.slice(o, o + png.channels));
}

describe('rasterImage', () => {
  for (const kind of ['equal-earth', 'south-polar'] as const) {
    it(`rasterImage(field, '${kind}') lights the pixels at the hot cell's projected position only`, () => {
      const extent: [[number, number], [number, number]] = [[0, 0], [300, kind === 'equal-earth' ? 150 : 300]];
      const map = makeProjection(kind, { extent });
      const img = rasterImage(field, map, scale, { extent, pixelRatio: 1 });
      const png = decode(img.png);
      expect(png.width).toBe(300);
      const [hx, hy] = map.projection([35, -45])!;
      const [cx, cy] = map.projection([-105, -65])!;
      // viridis top end (#fde725) at the hot cell, bottom end (#440154) elsewhere.
      expect(pixelAt(png, hx, hy)).toEqual([253, 231, 37, 255]);
      expect(pixelAt(png, cx, cy)).toEqual([68, 1, 84, 255]);
    });
  }

  it('rasterImage leaves pixels off the globe transparent', () => {
    const extent: [[number, number], [number, number]] = [[0, 0], [300, 150]];
    const map = makeProjection('equal-earth', { extent });
    const png = decode(rasterImage(field, map, scale, { extent, pixelRatio: 1 }).png);
    expect(pixelAt(png, 1, 1)[3]).toBe(0);
    expect(pixelAt(png, 150, 75)[3]).toBe(255);
  });

  it('rasterImage(..., {pixelRatio: 2}) doubles the image size', () => {
    const extent: [[number, number], [number, number]] = [[0, 0], [100, 50]];
    const img = rasterImage(field, makeProjection('equal-earth', { extent }), scale, { extent, pixelRatio: 2 });
    expect([img.pixelWidth, img.pixelHeight]).toEqual([200, 100]);
    expect(img.href.startsWith('data:image/png;base64,iVBORw0KGgo')).toBe(true);
  });
});

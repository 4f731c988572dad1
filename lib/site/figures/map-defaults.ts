// Shared settings of the report's maps: width, raster resolution and the text measure.
import { DOUBLE_COLUMN_MM, mmToCssPx, roundSvgNumbers, type MapOptions } from '../../figures/index.js';
import type { FigureContext } from './site-figure.js';

/** Raster pixels per SVG px: 0.5 keeps each page's inline SVG small (a 5° lattice cell is still several pixels wide). */
export const MAP_PIXEL_RATIO = 0.5;

/** Decimals kept in map geometry: 0.1 px is below what a screen or a 300 dpi print shows, and land outlines shrink by a fifth. */
export const MAP_DIGITS = 1;

/** A map's SVG with its coordinates rounded to MAP_DIGITS. */
export function compactMap(svg: string): string {
  return roundSvgNumbers(svg, MAP_DIGITS);
}

/** Common map options: double-column width, the renderer's font and measure, a page-unique id prefix. */
export function mapOptions(ctx: FigureContext, id: string, extra: Partial<MapOptions> = {}): MapOptions {
  return {
    projection: 'equal-earth',
    widthPx: mmToCssPx(DOUBLE_COLUMN_MM),
    fontFamily: ctx.fontFamily,
    measure: (text, size) => ctx.renderer.measure.width(text, size),
    idPrefix: id,
    pixelRatio: MAP_PIXEL_RATIO,
    ...extra,
  };
}

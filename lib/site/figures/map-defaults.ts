// Shared settings of the report's maps: width, raster resolution and the text measure.
import { DOUBLE_COLUMN_MM, mmToCssPx, type MapOptions } from '../../figures/index.js';
import type { FigureContext } from './site-figure.js';

/** Raster pixels per SVG px: 1 keeps each page's inline SVG small (the lattices are coarser than a pixel anyway). */
export const MAP_PIXEL_RATIO = 1;

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

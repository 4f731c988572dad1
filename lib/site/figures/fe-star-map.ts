// Fields page: Fe* = dFe − R·PO₄ (excess iron relative to phosphate) at the first configured depth.
import { buildMap, feStarGrid, figureCsv } from '../../figures/index.js';
import { sig } from './format.js';
import { gridOf } from './field-maps.js';
import { fieldRange, latticeLevel, latticeRows } from './lattice-level.js';
import { compactMap, mapOptions } from './map-defaults.js';
import { DEFAULT_FE_STAR_RATIO } from './messages.js';
import type { FigureContext, SiteFigure } from './site-figure.js';
import { stationPoints } from './station-points.js';

/** The Fe* map, or null without both a dFe and a phosphate grid on one lattice. R from figures.fe_star_ratio, else Parekh et al. (2005). */
export function feStarMap(ctx: FigureContext): SiteFigure | null {
  const dfe = gridOf(ctx, 'dissolved_fe');
  const po4 = gridOf(ctx, 'phosphate');
  if (!dfe || !po4) return null;
  const configured = ctx.config.figures.fe_star_ratio;
  const ratio = configured ?? DEFAULT_FE_STAR_RATIO;
  let star;
  try {
    star = feStarGrid(dfe, po4, ratio.value);
  } catch {
    return null; // different lattices: no Fe* map rather than a regridding guess
  }
  const { field, depth } = latticeLevel(star, ctx.config.figures.depths_m[0] ?? 0);
  const stations = stationPoints(ctx.result.samples);
  const map = buildMap(
    { raster: { field, title: `Fe* at ${depth} m (nmol kg⁻¹)`, centreZero: true }, stations, graticule: false },
    mapOptions(ctx, 'fe-star-map', { projection: ctx.config.figures.projection, title: `Fe* at ${depth} m, annual mean` }),
  );
  const range = fieldRange(field);
  const source = configured ? `the configured ratio (${ratio.citation})` : `a default ratio since the config gives none (${ratio.citation}); the pooled Fe:C fit is not an Fe:P ratio`;
  return {
    id: 'fe-star-map',
    page: 'fields',
    title: `Fe* at ${depth} m`,
    caption:
      `Fe* = dFe − R·PO₄ at the ${depth} m level with R = ${sig(ratio.value)} mmol mol⁻¹ from ${source}` +
      `${range ? `; values range from ${sig(range[0])} to ${sig(range[1])} nmol kg⁻¹` : ''}. Negative Fe* marks water with less iron than its phosphate would supply at that ratio.`,
    alt: `Map of Fe* at ${depth} m on a diverging colour scale centred on zero, with ${stations.length} stations as dots.`,
    svg: compactMap(map.svg),
    csv: figureCsv(latticeRows(field), ['lon', 'lat', { key: 'value', header: 'fe_star_nmol_kg' }]),
    caution: null,
  };
}

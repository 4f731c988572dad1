// Fields page: dFe and nitrate maps from the grids at each configured depth, stations overlaid, HNLC outlined on nitrate.
import { buildMap, figureCsv, thresholdOutline, type OutlineLayer } from '../../figures/index.js';
import type { Grid } from '../../types.js';
import { sig } from './format.js';
import { fieldRange, latticeLevel, latticeRows } from './lattice-level.js';
import { compactMap, mapOptions } from './map-defaults.js';
import type { FigureContext, SiteFigure } from './site-figure.js';
import { stationPoints } from './station-points.js';

/** The grid of a quantity, or undefined. */
export function gridOf(ctx: FigureContext, quantity: string): Grid | undefined {
  return ctx.result.grids.find((g) => g.quantity === quantity)?.grid;
}

/** The HNLC outline: surface (shallowest level, annual mean) nitrate ≥ figures.hnlc_nitrate, or null without a nitrate grid. */
export function hnlcOutline(ctx: FigureContext): OutlineLayer | null {
  const nitrate = gridOf(ctx, 'nitrate');
  if (!nitrate) return null;
  const threshold = ctx.config.figures.hnlc_nitrate;
  const surface = latticeLevel(nitrate, 0).field;
  return { geometry: thresholdOutline(surface, threshold).lines, label: `HNLC: surface nitrate ≥ ${sig(threshold)} µmol kg⁻¹` };
}

const VARIABLES = [
  { quantity: 'dissolved_fe', key: 'dfe', name: 'dFe', unit: 'nmol kg⁻¹', log: true },
  { quantity: 'nitrate', key: 'nitrate', name: 'Nitrate', unit: 'µmol kg⁻¹', log: false },
] as const;

/** One map per configured depth for dFe and for nitrate (when their grids exist). */
export function fieldMaps(ctx: FigureContext): SiteFigure[] {
  const stations = stationPoints(ctx.result.samples);
  const hnlc = hnlcOutline(ctx);
  const out: SiteFigure[] = [];
  for (const v of VARIABLES) {
    const source = ctx.result.grids.find((g) => g.quantity === v.quantity);
    if (!source) continue;
    for (const depthM of ctx.config.figures.depths_m) {
      const { field, depth } = latticeLevel(source.grid, depthM);
      const id = `${v.key}-map-${depth}m`;
      if (out.some((f) => f.id === id)) continue;
      const outlines = v.key === 'nitrate' && hnlc ? [hnlc] : [];
      const title = `${v.name} at ${depth} m, annual mean`;
      const map = buildMap(
        { raster: { field, title: `${v.name} at ${depth} m (${v.unit})`, log: v.log }, stations, outlines, graticule: false },
        mapOptions(ctx, id, { projection: ctx.config.figures.projection, title }),
      );
      const range = fieldRange(field);
      const hnlcText = outlines.length ? ` The dashed line encloses HNLC waters where surface nitrate is at least ${sig(ctx.config.figures.hnlc_nitrate)} µmol kg⁻¹.` : '';
      out.push({
        id,
        page: 'fields',
        title,
        caption:
          `${v.name} from ${source.grid.source} (variable ${source.grid.variable}) at the ${depth} m level, averaged over ${Math.max(1, source.grid.time.length)} time steps` +
          `${range ? `, ranging from ${sig(range[0])} to ${sig(range[1])} ${v.unit}` : ''}; ${stations.length} bottle stations overlaid.${hnlcText}`,
        alt: `Map of ${v.name.toLowerCase()} at ${depth} m${v.log ? ' on a logarithmic colour scale' : ''} with ${stations.length} stations as dots${outlines.length ? ' and a dashed HNLC outline' : ''}.`,
        svg: compactMap(map.svg),
        csv: figureCsv(latticeRows(field), ['lon', 'lat', { key: 'value', header: `${v.key}_${v.unit === 'nmol kg⁻¹' ? 'nmol_kg' : 'umol_kg'}` }]),
        caution: null,
      });
    }
  }
  return out;
}

// Fields page: one extra dFe map per figures.polar entry (south-polar or north-polar), stations overlaid.
import { buildMap, figureCsv } from '../../figures/index.js';
import { rowsCsv } from './rows-csv.js';
import { sig } from './format.js';
import { gridOf } from './field-maps.js';
import { fieldRange, latticeLevel, latticeRows } from './lattice-level.js';
import { compactMap, mapOptions } from './map-defaults.js';
import type { FigureContext, SiteFigure } from './site-figure.js';
import { stationPoints } from './station-points.js';

/** Polar dFe maps at the first configured depth (stations only when there is no dFe grid). */
export function polarMaps(ctx: FigureContext): SiteFigure[] {
  const dfe = gridOf(ctx, 'dissolved_fe');
  const stations = stationPoints(ctx.result.samples);
  return ctx.config.figures.polar.map((projection) => {
    const south = projection === 'south-polar';
    const level = dfe ? latticeLevel(dfe, ctx.config.figures.depths_m[0] ?? 0) : null;
    const id = `${projection}-dfe-map`;
    const visible = stations.filter((s) => (south ? s.lat <= -40 : s.lat >= 40));
    const title = `${south ? 'Southern' : 'Northern'} high latitudes${level ? `: dFe at ${level.depth} m` : ''}`;
    const map = buildMap(
      { raster: level ? { field: level.field, title: `dFe at ${level.depth} m (nmol kg⁻¹)`, log: true } : undefined, stations },
      mapOptions(ctx, id, { projection, title, widthPx: 340 }),
    );
    const range = level ? fieldRange(level.field) : null;
    return {
      id,
      page: 'fields',
      title,
      caption:
        `${south ? 'South' : 'North'}-polar view poleward of ${south ? '40° S' : '40° N'}` +
        `${level ? ` of annual-mean dFe at ${level.depth} m${range ? ` (${sig(range[0])}–${sig(range[1])} nmol kg⁻¹ over the whole grid)` : ''}` : ''}, with the ${visible.length} stations that fall inside it.`,
      alt: `${south ? 'South' : 'North'}-polar map${level ? ' of dissolved iron' : ''} with ${visible.length} stations as dots.`,
      svg: compactMap(map.svg),
      csv: level ? figureCsv(latticeRows(level.field).filter((r) => (south ? r.lat <= -40 : r.lat >= 40)), ['lon', 'lat', { key: 'value', header: 'dfe_nmol_kg' }]) : rowsCsv(visible, ['cruise', 'station', 'lat', 'lon']),
      caution: null,
    };
  });
}

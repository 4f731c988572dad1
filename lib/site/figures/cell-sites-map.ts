// Quotas page: cell sampling sites coloured by their median Fe:C (log scale).
import { buildMap, figureCsv } from '../../figures/index.js';
import { cellRows, median } from './cell-rows.js';
import { sig } from './format.js';
import { compactMap, mapOptions } from './map-defaults.js';
import type { FigureContext, SiteFigure } from './site-figure.js';

/** The quota map: one dot per cell station, coloured by the median Fe:C of its cells. */
export function cellSitesMap(ctx: FigureContext): SiteFigure {
  const by = new Map<string, { cruise: string; station: string; lat: number; lon: number; values: number[] }>();
  for (const r of cellRows(ctx.result.cells)) {
    if (!(r.feC > 0) || !Number.isFinite(r.lat) || !Number.isFinite(r.lon)) continue;
    const key = `${r.cruise}\u0000${r.station}`;
    const s = by.get(key) ?? { cruise: r.cruise, station: r.station, lat: r.lat, lon: r.lon, values: [] };
    s.values.push(r.feC);
    by.set(key, s);
  }
  const sites = [...by.values()]
    .map((s) => ({ cruise: s.cruise, station: s.station, lat: s.lat, lon: s.lon, n: s.values.length, value: median(s.values) }))
    .sort((a, b) => (a.cruise < b.cruise ? -1 : a.cruise > b.cruise ? 1 : a.station < b.station ? -1 : a.station > b.station ? 1 : 0));
  const map = buildMap({ cells: { points: sites, title: 'median Fe:C (µmol mol⁻¹)' }, graticule: false }, mapOptions(ctx, 'cell-sites-map', { projection: ctx.config.figures.projection, title: 'Median Fe:C by station' }));
  const vals = sites.map((s) => s.value).sort((a, b) => a - b);
  return {
    id: 'cell-sites-map',
    page: 'quotas',
    title: 'Median Fe:C by station',
    caption: `Median Fe:C of all classes at each of ${sites.length} stations with analysed cells${vals.length ? `, from ${sig(vals[0])} to ${sig(vals[vals.length - 1])} µmol mol⁻¹` : ''}, on a logarithmic colour scale.`,
    alt: `Map of ${sites.length} cell sampling stations coloured by median Fe:C.`,
    svg: compactMap(map.svg),
    csv: figureCsv(sites, ['cruise', 'station', 'lat', 'lon', { key: 'n', header: 'cells' }, { key: 'value', header: 'median_fe_c_umol_mol' }]),
    caution: null,
  };
}

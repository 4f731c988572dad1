// Fields page: every bottle station on the configured projection, coloured by cruise.
import { buildMap } from '../../figures/index.js';
import { rowsCsv } from './rows-csv.js';
import { compactMap, mapOptions } from './map-defaults.js';
import type { FigureContext, SiteFigure } from './site-figure.js';
import { stationPoints } from './station-points.js';

/** The station map: one dot per station, colours by cruise. */
export function stationMap(ctx: FigureContext): SiteFigure {
  const stations = stationPoints(ctx.result.samples);
  const cruises = [...new Set(stations.map((s) => s.cruise))].sort();
  const projection = ctx.config.figures.projection;
  const map = buildMap({ stations, graticule: false }, mapOptions(ctx, 'station-map', { projection, title: 'Stations by cruise' }));
  const perCruise = cruises.map((c) => `${c} (${stations.filter((s) => s.cruise === c).length})`).join(', ');
  return {
    id: 'station-map',
    page: 'fields',
    title: 'Stations by cruise',
    caption: `Bottle stations of ${cruises.length} cruises, ${stations.length} stations in all, on the ${projection} projection${perCruise ? `: ${perCruise}` : ''}.`,
    alt: `Map of ${stations.length} sampling stations coloured by cruise (${cruises.join(', ')}).`,
    svg: compactMap(map.svg),
    csv: rowsCsv(stations, ['cruise', 'station', 'lat', 'lon', 'samples']),
    caution: null,
  };
}

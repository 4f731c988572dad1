// Anomalies page: regions filled by the mean residual of their cells, flagged regions outlined and labelled.
import { buildMap, figureCsv, type RegionShape } from '../../figures/index.js';
import type { AnomalyGroup } from '../../anomalies/index.js';
import { cellRows } from './cell-rows.js';
import { sig } from './format.js';
import { compactMap, mapOptions } from './map-defaults.js';
import type { FigureContext, SiteFigure } from './site-figure.js';

/** Flagged groups (BH-controlled direction), sorted by region then class. */
export function flaggedGroups(groups: readonly AnomalyGroup[]): AnomalyGroup[] {
  return groups.filter((g) => g.flag === 'lower-than-fit' || g.flag === 'higher-than-fit');
}

/** E.g. 'South Atlantic diatom 0.50× (0.41–0.61, 10 stations, 93 cells)'. */
export function flaggedText(g: AnomalyGroup, name: (id: string) => string): string {
  return `${name(g.region)} ${g.phytoClass} ${sig(g.fold, 2)}× (${sig(g.foldLow, 2)}–${sig(g.foldHigh, 2)}, ${g.nStations} stations, ${g.nCells} cells)`;
}

/** The residual choropleth. */
export function residualMap(ctx: FigureContext, name: (id: string) => string): SiteFigure {
  const rows = cellRows(ctx.result.cells).filter((r) => Number.isFinite(r.residual) && r.region !== '');
  const groups = ctx.result.anomalies?.groups ?? [];
  const flagged = flaggedGroups(groups);
  const stats = (ctx.result.regions?.features ?? []).map((f) => {
    const res = rows.filter((r) => r.region === f.id).map((r) => r.residual);
    const mean = res.length ? res.reduce((s, v) => s + v, 0) / res.length : Number.NaN;
    const flags = flagged.filter((g) => g.region === f.id);
    return { id: f.id, name: f.properties.name, geometry: f.geometry, n: res.length, mean, flags };
  });
  const shapes: RegionShape[] = stats.map((s) => ({
    id: s.id,
    geometry: s.geometry,
    residual: s.n ? s.mean : undefined,
    flagged: s.flags.length > 0,
    label: s.flags.length ? `${s.name} ${s.flags.every((g) => g.flag === 'lower-than-fit') ? '↓' : s.flags.every((g) => g.flag === 'higher-than-fit') ? '↑' : '↕'} ${s.flags.length} class${s.flags.length === 1 ? '' : 'es'}` : undefined,
  }));
  const map = buildMap({ regions: { shapes, title: 'mean residual (log10 Fe:C)' }, graticule: false }, mapOptions(ctx, 'residual-map', { projection: ctx.config.figures.projection, title: 'Residual from the fit by region' }));
  const flaggedSentence = flagged.length ? `Flagged (fold from the fit, ${Math.round((ctx.result.anomalies?.settings.level ?? 0.95) * 100)} % CI): ${flagged.map((g) => flaggedText(g, name)).join('; ')}.` : 'No region × class group is flagged.';
  const withCells = stats.filter((s) => s.n > 0);
  return {
    id: 'residual-map',
    page: 'anomalies',
    title: 'Residual from the fit by region',
    caption: `Mean residual of log10 Fe:C from each class's primary fit over ${rows.length} cells in ${withCells.length} regions; heavy outlines mark regions with a flagged class at a false discovery rate of ${sig(ctx.result.anomalies?.settings.fdrQ ?? Number.NaN, 2)}. ${flaggedSentence}`,
    alt: `Map of ocean regions filled by mean residual on a diverging scale; ${flagged.length ? `${new Set(flagged.map((g) => g.region)).size} flagged regions are outlined and labelled` : 'no region is flagged'}.`,
    svg: compactMap(map.svg),
    csv: figureCsv(
      stats.map((s) => ({ region: s.id, name: s.name, cells: s.n, mean_residual_log10: s.n ? s.mean : null, flagged_classes: s.flags.map((g) => g.phytoClass).join(' ') })),
      ['region', 'name', 'cells', 'mean_residual_log10', 'flagged_classes'],
    ),
    caution: null,
  };
}

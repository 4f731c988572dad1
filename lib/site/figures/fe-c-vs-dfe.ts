// Quotas page: Fe:C against dFe, log–log panels per class, with the primary fit and its 95 % confidence band.
import { feCVsDfeSpec, figureCsv, type FeCFitPoint, type FeCPoint } from '../../figures/index.js';
import { cellRows, stationCount } from './cell-rows.js';
import { fitSentence } from './fit-text.js';
import { regionNames } from './region-names.js';
import { renderSpec } from './render-spec.js';
import type { FigureContext, SiteFigure } from './site-figure.js';

/** The Fe:C–dFe small multiples; points coloured by region, binned above figures.max_points. */
export async function feCVsDfe(ctx: FigureContext): Promise<SiteFigure> {
  const name = regionNames(ctx.result.regions);
  const rows = cellRows(ctx.result.cells).filter((r) => r.dfe > 0 && r.feC > 0);
  const points: FeCPoint[] = rows.map((r) => ({ phytoClass: r.phytoClass, dfe: r.dfe, feC: r.feC, region: name(r.region), matchSource: r.dfeSource }));
  const fits = ctx.result.fits;
  const fit: FeCFitPoint[] = [];
  for (const c of fits?.classes ?? []) {
    if (!c.fitted) continue;
    const b = c.bands;
    b.dFe.forEach((d, i) => fit.push({ phytoClass: c.class, dfe: d, fit: b.fit[i], lower: b.confidenceLower[i], upper: b.confidenceUpper[i] }));
  }
  const spec = feCVsDfeSpec(points, fit, { denseThreshold: ctx.config.figures.max_points, predictionBand: false });
  const level = fits?.options.level ?? 0.95;
  const sentences = (fits?.classes ?? []).map((c) => fitSentence(c, level));
  const nClasses = new Set(points.map((p) => p.phytoClass)).size;
  return {
    id: 'fe-c-vs-dfe',
    page: 'quotas',
    title: 'Fe:C against dissolved Fe by class',
    caption:
      `Cellular Fe:C against ambient dFe on log–log axes for ${points.length} cells at ${stationCount(rows)} stations in ${nClasses} classes, coloured by region; ` +
      `lines are each class's primary fit with its ${Math.round(level * 100)} % confidence band. ${sentences.join('; ')}.`,
    alt: `Log–log scatter of Fe:C against dissolved iron in ${nClasses} panels, one per class, each with a fitted line and shaded confidence band.`,
    ...(await renderSpec(ctx.renderer, spec)),
    csv: figureCsv(
      [...points.map((p) => ({ layer: 'cell', ...p })), ...fit.map((f) => ({ layer: 'fit', phytoClass: f.phytoClass, dfe: f.dfe, fit: f.fit, lower: f.lower, upper: f.upper }))],
      ['layer', { key: 'phytoClass', header: 'class' }, 'region', { key: 'matchSource', header: 'dfe_source' }, { key: 'dfe', header: 'dfe_nmol_kg' }, { key: 'feC', header: 'fe_c_umol_mol' }, 'fit', 'lower', 'upper'],
    ),
    caution: null,
  };
}

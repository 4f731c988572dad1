// Anomalies page: residuals against fitted values, the normal quantile plot and residuals by region.
import { normalQuantilePoints, normalQuantileSpec, residualByRegionSpec, residualsVsFittedSpec, type ResidualPoint } from '../../figures/index.js';
import { rowsCsv } from './rows-csv.js';
import { cellRows } from './cell-rows.js';
import { sig } from './format.js';
import { renderSpec } from './render-spec.js';
import type { FigureContext, SiteFigure } from './site-figure.js';

/** Residual points of the primary fits: fitted = log10 Fe:C − residual. */
export function residualPoints(ctx: FigureContext, name: (id: string) => string): ResidualPoint[] {
  return cellRows(ctx.result.cells)
    .filter((r) => r.feC > 0 && Number.isFinite(r.residual))
    .map((r) => ({ fitted: Math.log10(r.feC) - r.residual, residual: r.residual, phytoClass: r.phytoClass, region: name(r.region) }));
}

const sd = (v: readonly number[]) => {
  const m = v.reduce((s, x) => s + x, 0) / v.length;
  return Math.sqrt(v.reduce((s, x) => s + (x - m) ** 2, 0) / Math.max(1, v.length - 1));
};

const COLUMNS = [{ key: 'phytoClass', header: 'class' }, 'region', { key: 'fitted', header: 'fitted_log10_fe_c' }, { key: 'residual', header: 'residual_log10' }];

/** The three diagnostic plots, in page order. */
export async function diagnosticFigures(ctx: FigureContext, name: (id: string) => string): Promise<SiteFigure[]> {
  const points = residualPoints(ctx, name);
  const residuals = points.map((p) => p.residual);
  const spread = residuals.length > 1 ? sd(residuals) : Number.NaN;
  const regions = new Set(points.map((p) => p.region)).size;
  const q = normalQuantilePoints(residuals);
  return [
    {
      id: 'residuals-vs-fitted',
      page: 'anomalies',
      title: 'Residuals against fitted values',
      caption: `Residuals of log10 Fe:C from each class's primary fit against the fitted value for ${points.length} cells; their standard deviation is ${sig(spread, 2)} (a factor of ${sig(10 ** spread, 2)}).`,
      alt: 'Scatter of residuals against fitted log10 Fe:C, coloured by class, with a dashed zero line.',
      ...(await renderSpec(ctx.renderer, residualsVsFittedSpec(points))),
      csv: rowsCsv(points, COLUMNS),
      caution: null,
    },
    {
      id: 'normal-quantiles',
      page: 'anomalies',
      title: 'Normal quantile plot of residuals',
      caption: `Sorted residuals of ${q.length} cells against standard normal quantiles (Hazen plotting positions); the dashed line passes through the quartiles, and points off it at the ends mark heavier tails than a normal distribution.`,
      alt: 'Normal quantile plot of residuals with a dashed reference line.',
      ...(await renderSpec(ctx.renderer, normalQuantileSpec(residuals))),
      csv: rowsCsv(q, [{ key: 'theoretical', header: 'normal_quantile' }, { key: 'sample', header: 'residual_log10' }]),
      caution: null,
    },
    {
      id: 'residual-by-region',
      page: 'anomalies',
      title: 'Residuals by region',
      caption: `Residuals of ${points.length} cells in ${regions} regions as ticks coloured by class, with each region's median as a heavy tick and the fit at zero.`,
      alt: 'Strip plot of residuals per region with median ticks and a dashed zero line.',
      ...(await renderSpec(ctx.renderer, residualByRegionSpec(points))),
      csv: rowsCsv(points, COLUMNS),
      caution: null,
    },
  ];
}

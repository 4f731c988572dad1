// Fit diagnostics: residuals against fitted values, normal quantile plot, residuals by region.
import type { TopLevelSpec } from 'vega-lite';
import { normalQuantile } from '../../stats/distributions.js';
import { mmToCssPx, SINGLE_COLUMN_MM } from '../sizes.js';

/** One residual of the chosen fit (log10 units) with its fitted value, class and region. */
export interface ResidualPoint {
  /** Fitted log10 Fe:C. */
  fitted: number;
  /** Observed − fitted, log10 units. */
  residual: number;
  /** Phytoplankton class. */
  phytoClass: string;
  /** Region name. */
  region: string;
}

const base = (widthMm?: number) => ({ $schema: 'https://vega.github.io/schema/vega-lite/v6.json', width: Math.max(120, mmToCssPx(widthMm ?? SINGLE_COLUMN_MM) - 110), height: 180 });
const zeroRule = { mark: { type: 'rule' as const, color: '#555555', strokeDash: [3, 2] }, encoding: { y: { datum: 0 } } };

/** Vega-Lite spec: residual vs fitted value, coloured by class, with the zero line. */
export function residualsVsFittedSpec(points: readonly ResidualPoint[], options: { widthMm?: number } = {}): TopLevelSpec {
  return {
    ...base(options.widthMm),
    data: { values: points.map((p) => ({ ...p })) },
    layer: [
      zeroRule,
      { mark: { type: 'point', filled: true, size: 10 }, encoding: { x: { field: 'fitted', type: 'quantitative', title: 'fitted log10 Fe:C', scale: { zero: false } }, y: { field: 'residual', type: 'quantitative', title: 'residual (log10)' }, color: { field: 'phytoClass', type: 'nominal', title: 'class' } } },
    ],
  } as TopLevelSpec;
}

/** Theoretical normal quantiles Φ⁻¹((i − 0.5)/n) against sorted residuals (Hazen plotting positions). */
export function normalQuantilePoints(residuals: readonly number[]): { theoretical: number; sample: number }[] {
  const sorted = residuals.filter(Number.isFinite).slice().sort((a, b) => a - b);
  const n = sorted.length;
  return sorted.map((sample, i) => ({ theoretical: normalQuantile((i + 1 - 0.5) / n), sample }));
}

/** Vega-Lite spec: normal quantile plot of residuals with the reference line through the quartiles. */
export function normalQuantileSpec(residuals: readonly number[], options: { widthMm?: number } = {}): TopLevelSpec {
  const pts = normalQuantilePoints(residuals);
  const q = (p: number) => pts[Math.min(pts.length - 1, Math.max(0, Math.round(p * (pts.length - 1))))];
  const line = pts.length >= 4 ? (() => {
    const a = q(0.25), b = q(0.75);
    const slope = (b.sample - a.sample) / (b.theoretical - a.theoretical || 1);
    const t0 = pts[0].theoretical, t1 = pts[pts.length - 1].theoretical;
    return [{ theoretical: t0, sample: a.sample + slope * (t0 - a.theoretical) }, { theoretical: t1, sample: a.sample + slope * (t1 - a.theoretical) }];
  })() : [];
  return {
    ...base(options.widthMm),
    layer: [
      { data: { values: line }, mark: { type: 'line', color: '#555555', strokeDash: [3, 2] }, encoding: { x: { field: 'theoretical', type: 'quantitative' }, y: { field: 'sample', type: 'quantitative' } } },
      { data: { values: pts }, mark: { type: 'point', filled: true, size: 10 }, encoding: { x: { field: 'theoretical', type: 'quantitative', title: 'normal quantile' }, y: { field: 'sample', type: 'quantitative', title: 'residual (log10)' } } },
    ],
  } as TopLevelSpec;
}

/** Vega-Lite spec: residuals per region as a strip with each region's median tick. */
export function residualByRegionSpec(points: readonly ResidualPoint[], options: { widthMm?: number } = {}): TopLevelSpec {
  const regions = [...new Set(points.map((p) => p.region))].sort();
  const y = { field: 'region', type: 'nominal' as const, sort: regions, title: null };
  return {
    ...base(options.widthMm),
    height: { step: 16 },
    data: { values: points.map((p) => ({ ...p })) },
    layer: [
      { mark: { type: 'rule', color: '#555555', strokeDash: [3, 2] }, encoding: { x: { datum: 0 } } },
      { mark: { type: 'tick', opacity: 0.5, thickness: 1 }, encoding: { x: { field: 'residual', type: 'quantitative', title: 'residual (log10)' }, y, color: { field: 'phytoClass', type: 'nominal', title: 'class' } } },
      { mark: { type: 'tick', color: '#000000', thickness: 2.5 }, encoding: { x: { aggregate: 'median', field: 'residual', type: 'quantitative' }, y } },
    ],
  } as TopLevelSpec;
}

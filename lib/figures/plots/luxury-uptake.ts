// Luxury-uptake index (Fe:C over the class's minimum quota) and implied C:Fe by class and region, with intervals.
import type { TopLevelSpec } from 'vega-lite';
import { mmToCssPx, SINGLE_COLUMN_MM } from '../sizes.js';

/** A class × region estimate with its 95 % interval. */
export interface ClassRegionEstimate {
  /** Phytoplankton class. */
  phytoClass: string;
  /** Region name. */
  region: string;
  /** Estimate (dimensionless index, or C:Fe in mol mol⁻¹). */
  value: number;
  lower: number;
  upper: number;
}

/** Options: which quantity the estimates are and the figure width. */
export interface LuxuryUptakeOptions {
  /** 'index' = Fe:C / minimum Fe:C (reference line at 1); 'c-to-fe' = implied C:Fe, mol mol⁻¹ (log axis). */
  quantity: 'index' | 'c-to-fe';
  /** Figure width in mm (default 85). */
  widthMm?: number;
}

/** Vega-Lite spec: points with interval rules per region, coloured by class, on a log axis. */
export function luxuryUptakeSpec(estimates: readonly ClassRegionEstimate[], options: LuxuryUptakeOptions): TopLevelSpec {
  const regions = [...new Set(estimates.map((e) => e.region))].sort();
  const title = options.quantity === 'index' ? 'luxury-uptake index (Fe:C ÷ minimum Fe:C)' : 'implied C:Fe (mol mol⁻¹)';
  const x = { field: 'value', type: 'quantitative' as const, scale: { type: 'log' as const }, title };
  const y = { field: 'region', type: 'nominal' as const, sort: regions, title: null };
  const yOffset = { field: 'phytoClass', type: 'nominal' as const };
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    width: Math.max(120, mmToCssPx(options.widthMm ?? SINGLE_COLUMN_MM) - 150),
    height: { step: 22 },
    data: { values: estimates.filter((e) => e.value > 0 && e.lower > 0).map((e) => ({ ...e })) },
    layer: [
      ...(options.quantity === 'index' ? [{ mark: { type: 'rule' as const, color: '#555555', strokeDash: [3, 2] }, encoding: { x: { datum: 1 } } }] : []),
      { mark: { type: 'rule', strokeWidth: 1.25 }, encoding: { x: { ...x, field: 'lower' }, x2: { field: 'upper' }, y, yOffset, color: { field: 'phytoClass', type: 'nominal', title: 'class' } } },
      { mark: { type: 'point', filled: true, size: 24, opacity: 1 }, encoding: { x, y, yOffset, color: { field: 'phytoClass', type: 'nominal', title: 'class' } } },
    ],
  } as TopLevelSpec;
}

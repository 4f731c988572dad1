// Fe:C by phytoplankton class: jittered strip and box per class, with the class mean and its interval.
import type { TopLevelSpec } from 'vega-lite';
import { FE_C_TITLE } from './axis-titles.js';
import { mmToCssPx, SINGLE_COLUMN_MM } from '../sizes.js';

/** One cell's Fe:C with its class and a deterministic jitter offset in [−0.5, 0.5] (pass a seeded value). */
export interface ClassValue {
  /** Phytoplankton class. */
  phytoClass: string;
  /** Fe:C, µmol mol⁻¹. */
  feC: number;
  /** Horizontal jitter in [−0.5, 0.5]; seeded by the caller so output is reproducible. */
  jitter: number;
}

/** Per-class mean (geometric, on log data) and its 95 % interval, µmol mol⁻¹. */
export interface ClassSummary {
  phytoClass: string;
  mean: number;
  lower: number;
  upper: number;
}

/** Vega-Lite spec: log Fe:C per class as strip + box, the mean as a diamond with its interval as a rule. */
export function classComparisonSpec(values: readonly ClassValue[], summaries: readonly ClassSummary[], options: { widthMm?: number } = {}): TopLevelSpec {
  const widthPx = mmToCssPx(options.widthMm ?? SINGLE_COLUMN_MM);
  const classes = [...new Set(values.map((v) => v.phytoClass))].sort();
  const rows = [...values.filter((v) => v.feC > 0).map((v) => ({ layer: 'cell', ...v })), ...summaries.map((s) => ({ layer: 'summary', ...s }))];
  const x = { field: 'phytoClass', type: 'nominal' as const, title: null, sort: classes, axis: { labelAngle: 0 } };
  const y = { field: 'feC', type: 'quantitative' as const, scale: { type: 'log' as const }, title: FE_C_TITLE };
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    width: Math.max(120, widthPx - 70),
    height: 200,
    data: { values: rows },
    layer: [
      { transform: [{ filter: "datum.layer === 'cell'" }], mark: { type: 'boxplot', extent: 1.5, outliers: false, opacity: 0.35, color: '#9a9a9a' }, encoding: { x, y } },
      { transform: [{ filter: "datum.layer === 'cell'" }], mark: { type: 'point', filled: true, size: 8, opacity: 0.5 }, encoding: { x, xOffset: { field: 'jitter', type: 'quantitative', scale: { domain: [-0.6, 0.6] } }, y, color: { field: 'phytoClass', type: 'nominal', legend: null } } },
      { transform: [{ filter: "datum.layer === 'summary'" }], mark: { type: 'rule', color: '#000000', strokeWidth: 1.5 }, encoding: { x, y: { ...y, field: 'lower' }, y2: { field: 'upper' } } },
      { transform: [{ filter: "datum.layer === 'summary'" }], mark: { type: 'point', shape: 'diamond', filled: true, size: 40, color: '#000000', opacity: 1 }, encoding: { x, y: { ...y, field: 'mean' } } },
    ],
  } as TopLevelSpec;
}

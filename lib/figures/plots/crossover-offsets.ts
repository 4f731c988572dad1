// Crossover comparison: the mean dFe (or nitrate) offset between cruise pairs at shared stations, with error bars.
import type { TopLevelSpec } from 'vega-lite';
import { mmToCssPx, SINGLE_COLUMN_MM } from '../sizes.js';

/** The offset of cruise B relative to cruise A at their crossover, with its 95 % interval. */
export interface CrossoverOffset {
  /** Pair label, e.g. 'AB01 − CD02'. */
  pair: string;
  /** Variable compared, e.g. 'dFe'. */
  variable: string;
  /** Mean offset in the variable's canonical unit. */
  offset: number;
  /** 95 % interval of the offset. */
  lower: number;
  upper: number;
  /** Number of depth-matched pairs. */
  n: number;
}

/** Vega-Lite spec: offsets per cruise pair as points with error bars and the zero line, one column per variable. */
export function crossoverOffsetsSpec(offsets: readonly CrossoverOffset[], options: { widthMm?: number; unit?: string } = {}): TopLevelSpec {
  const pairs = [...new Set(offsets.map((o) => o.pair))].sort();
  const y = { field: 'pair', type: 'nominal' as const, sort: pairs, title: null };
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    data: { values: offsets.map((o) => ({ ...o })) },
    facet: { column: { field: 'variable', type: 'nominal', title: null } },
    spec: {
      width: Math.max(100, (mmToCssPx(options.widthMm ?? SINGLE_COLUMN_MM) - 110) / Math.max(1, new Set(offsets.map((o) => o.variable)).size)),
      height: { step: 18 },
      layer: [
        { mark: { type: 'rule', color: '#555555', strokeDash: [3, 2] }, encoding: { x: { datum: 0 } } },
        { mark: { type: 'rule', strokeWidth: 1.25 }, encoding: { x: { field: 'lower', type: 'quantitative', title: `offset${options.unit ? ` (${options.unit})` : ''}` }, x2: { field: 'upper' }, y } },
        { mark: { type: 'point', filled: true, size: 30, opacity: 1 }, encoding: { x: { field: 'offset', type: 'quantitative' }, y, tooltip: [{ field: 'n', type: 'quantitative' }] } },
      ],
    },
    resolve: { scale: { x: 'independent' } },
  } as TopLevelSpec;
}

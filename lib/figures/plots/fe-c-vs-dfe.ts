// Fe:C against dissolved Fe, log–log small multiples by class, with the primary fit and its bands.
import type { TopLevelSpec } from 'vega-lite';
import { DFE_TITLE, FE_C_TITLE } from './axis-titles.js';
import { logBin2d } from './log-bin.js';
import { DOUBLE_COLUMN_MM, mmToCssPx } from '../sizes.js';

/** One cell: its class, ambient dFe and Fe:C. */
export interface FeCPoint {
  /** Phytoplankton class. */
  phytoClass: string;
  /** Ambient dissolved Fe, nmol kg⁻¹. */
  dfe: number;
  /** Cellular Fe:C, µmol mol⁻¹. */
  feC: number;
  /** Region name (colour when colourBy = 'region'). */
  region?: string;
  /** Where dFe came from: 'bottle' or 'grid' (colour when colourBy = 'matchSource'). */
  matchSource?: string;
}

/** One point of the primary fit curve with its 95 % bands, per class. */
export interface FeCFitPoint {
  /** Phytoplankton class. */
  phytoClass: string;
  /** dFe, nmol kg⁻¹. */
  dfe: number;
  /** Fitted Fe:C, µmol mol⁻¹. */
  fit: number;
  /** 95 % confidence band of the mean, µmol mol⁻¹. */
  lower: number;
  upper: number;
  /** 95 % prediction band (optional), µmol mol⁻¹. */
  predLower?: number;
  predUpper?: number;
}

/** Options of the Fe:C–dFe figure. */
export interface FeCVsDfeOptions {
  /** Colour points by region (default) or by match source. */
  colourBy?: 'region' | 'matchSource';
  /** Figure width in mm (default 180, double column). */
  widthMm?: number;
  /** Panels per row (default 3). */
  columns?: number;
  /** Above this many points, draw a binned heatmap instead (default 5000). */
  denseThreshold?: number;
  /** Draw the prediction band when present (default true). */
  predictionBand?: boolean;
}

/** Vega-Lite spec: per-class log–log panels of Fe:C vs dFe with fit line, 95 % confidence band and optional prediction band. */
export function feCVsDfeSpec(points: readonly FeCPoint[], fit: readonly FeCFitPoint[], options: FeCVsDfeOptions = {}): TopLevelSpec {
  const columns = options.columns ?? 3;
  const widthPx = mmToCssPx(options.widthMm ?? DOUBLE_COLUMN_MM);
  const panel = Math.max(80, Math.floor((widthPx - 70 - (columns - 1) * 12 - 110) / columns));
  const colourField = options.colourBy === 'matchSource' ? 'matchSource' : 'region';
  const dense = points.length > (options.denseThreshold ?? 5000);
  const x = { field: 'dfe', type: 'quantitative' as const, scale: { type: 'log' as const }, title: DFE_TITLE };
  const y = { field: 'feC', type: 'quantitative' as const, scale: { type: 'log' as const }, title: FE_C_TITLE };
  const rows = [
    ...(dense
      ? logBin2d(points.map((p) => ({ group: p.phytoClass, x: p.dfe, y: p.feC }))).map((b) => ({ layer: 'bin', phytoClass: b.group, dfe: b.x0, dfe2: b.x1, feC: b.y0, feC2: b.y1, count: b.count }))
      : points.filter((p) => p.dfe > 0 && p.feC > 0).map((p) => ({ layer: 'cell', phytoClass: p.phytoClass, dfe: p.dfe, feC: p.feC, [colourField]: (colourField === 'region' ? p.region : p.matchSource) ?? 'unknown' }))),
    ...fit.map((f) => ({ layer: 'fit', ...f })),
  ];
  const pointsLayer = dense
    ? {
        transform: [{ filter: "datum.layer === 'bin'" }],
        mark: { type: 'rect' as const },
        encoding: { x, x2: { field: 'dfe2' }, y, y2: { field: 'feC2' }, color: { field: 'count', type: 'quantitative' as const, scale: { type: 'log' as const, scheme: 'viridis' }, title: 'cells per bin' } },
      }
    : {
        transform: [{ filter: "datum.layer === 'cell'" }],
        mark: { type: 'point' as const, filled: true, size: 10, opacity: 0.6 },
        encoding: { x, y, color: { field: colourField, type: 'nominal' as const, title: colourField === 'region' ? 'region' : 'dFe from' } },
      };
  const withPred = (options.predictionBand ?? true) && fit.some((f) => f.predLower !== undefined);
  const layers = [
    ...(withPred
      ? [{ transform: [{ filter: "datum.layer === 'fit'" }], mark: { type: 'area' as const, color: '#000000', opacity: 0.08 }, encoding: { x, y: { ...y, field: 'predLower' }, y2: { field: 'predUpper' } } }]
      : []),
    pointsLayer,
    { transform: [{ filter: "datum.layer === 'fit'" }], mark: { type: 'area' as const, color: '#000000', opacity: 0.2 }, encoding: { x, y: { ...y, field: 'lower' }, y2: { field: 'upper' } } },
    { transform: [{ filter: "datum.layer === 'fit'" }], mark: { type: 'line' as const, color: '#000000', strokeWidth: 1.25 }, encoding: { x, y: { ...y, field: 'fit' } } },
  ];
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    data: { values: rows },
    facet: { field: 'phytoClass', type: 'nominal', title: null, header: { labelFontWeight: 'bold' } },
    columns,
    spec: { width: panel, height: panel, layer: layers },
    resolve: { scale: { x: 'shared', y: 'shared' } },
  } as TopLevelSpec;
}

// Depth profiles of dFe and nitrate: depth downward, one panel per cruise and variable, one line per station.
import type { TopLevelSpec } from 'vega-lite';
import { DEPTH_TITLE, DFE_TITLE, NITRATE_TITLE } from './axis-titles.js';

/** One bottle value on a profile. */
export interface ProfilePoint {
  /** Cruise identifier (panel row). */
  cruise: string;
  /** Station identifier (line). */
  station: string;
  /** Depth, m, positive down. */
  depth: number;
  /** dFe, nmol kg⁻¹ (undefined when not measured). */
  dfe?: number;
  /** Nitrate, µmol kg⁻¹. */
  nitrate?: number;
}

/** Vega-Lite spec: dFe and nitrate against depth (reversed axis, surface at the top), rows per cruise. */
export function profilesSpec(points: readonly ProfilePoint[], options: { panelWidth?: number; panelHeight?: number } = {}): TopLevelSpec {
  const rows: Record<string, string | number>[] = [];
  const variables = [{ key: 'dfe', title: DFE_TITLE }, { key: 'nitrate', title: NITRATE_TITLE }] as const;
  const sorted = [...points].sort((a, b) => (a.cruise < b.cruise ? -1 : a.cruise > b.cruise ? 1 : a.station < b.station ? -1 : a.station > b.station ? 1 : a.depth - b.depth));
  for (const p of sorted) for (const v of variables) {
    const value = p[v.key];
    if (value !== undefined && Number.isFinite(value)) rows.push({ cruise: p.cruise, station: p.station, depth: p.depth, variable: v.title, value });
  }
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    data: { values: rows },
    facet: { row: { field: 'cruise', type: 'nominal', title: null }, column: { field: 'variable', type: 'nominal', title: null, sort: variables.map((v) => v.title) } },
    spec: {
      width: options.panelWidth ?? 150,
      height: options.panelHeight ?? 160,
      layer: [
        { mark: { type: 'line', strokeWidth: 1, opacity: 0.8 }, encoding: { x: { field: 'value', type: 'quantitative', title: null }, y: { field: 'depth', type: 'quantitative', scale: { reverse: true }, title: DEPTH_TITLE }, detail: { field: 'station' }, color: { field: 'station', type: 'nominal', legend: null }, order: { field: 'depth' } } },
        { mark: { type: 'point', filled: true, size: 8 }, encoding: { x: { field: 'value', type: 'quantitative' }, y: { field: 'depth', type: 'quantitative', scale: { reverse: true } }, color: { field: 'station', type: 'nominal', legend: null } } },
      ],
    },
    resolve: { scale: { x: 'independent' } },
  } as TopLevelSpec;
}

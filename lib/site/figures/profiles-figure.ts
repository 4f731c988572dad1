// Fields page: bottle dFe and nitrate against depth, one row per cruise, one line per station.
import { profilesSpec, type ProfilePoint } from '../../figures/index.js';
import { rowsCsv } from './rows-csv.js';
import type { TopLevelSpec } from 'vega-lite';
import { columnValues } from './cell-rows.js';
import { renderSpec } from './render-spec.js';
import type { FigureContext, SiteFigure } from './site-figure.js';

/** Most bottle values drawn as points on the profiles; above it only the lines are drawn. */
export const PROFILE_POINT_LIMIT = 600;

const finite = (v: unknown): number | undefined => (typeof v === 'number' && Number.isFinite(v) ? v : undefined);

/** The profiles figure from the harmonised bottle table. */
export async function profilesFigure(ctx: FigureContext): Promise<SiteFigure> {
  const t = ctx.result.samples;
  const [cruise, station, depth, dfe, nitrate] = ['cruise', 'station', 'depth', 'dissolved_fe', 'nitrate'].map((c) => columnValues(t, c));
  const points: ProfilePoint[] = [];
  for (let i = 0; i < cruise.length; i++) {
    const d = finite(depth[i]);
    if (d === undefined) continue;
    const p: ProfilePoint = { cruise: String(cruise[i]), station: String(station[i]), depth: d, dfe: finite(dfe[i]), nitrate: finite(nitrate[i]) };
    if (p.dfe !== undefined || p.nitrate !== undefined) points.push(p);
  }
  const cruises = [...new Set(points.map((p) => p.cruise))].sort();
  const stations = new Set(points.map((p) => `${p.cruise}\u0000${p.station}`)).size;
  const nDfe = points.filter((p) => p.dfe !== undefined).length;
  const nNitrate = points.filter((p) => p.nitrate !== undefined).length;
  const spec = profilesSpec(points) as unknown as { spec: { layer: unknown[] } };
  // Above PROFILE_POINT_LIMIT values the point layer is dropped (lines only) to keep the page light; the CSV keeps every value.
  const pointsDrawn = nDfe + nNitrate <= PROFILE_POINT_LIMIT;
  if (!pointsDrawn) spec.spec.layer = spec.spec.layer.slice(0, 1);
  const rendered = await renderSpec(ctx.renderer, spec as unknown as TopLevelSpec);
  return {
    id: 'profiles',
    page: 'fields',
    title: 'dFe and nitrate profiles by cruise',
    caption: `Bottle profiles of ${cruises.length} cruises (${stations} stations): ${nDfe} dFe and ${nNitrate} nitrate values against depth, surface at the top, one line per station${pointsDrawn ? ', bottles as dots' : ''}.`,
    alt: `Depth profiles of dissolved iron and nitrate, one row of panels per cruise (${cruises.join(', ')}).`,
    ...rendered,
    csv: rowsCsv(points, ['cruise', 'station', 'depth', { key: 'dfe', header: 'dfe_nmol_kg' }, { key: 'nitrate', header: 'nitrate_umol_kg' }]),
    caution: null,
  };
}

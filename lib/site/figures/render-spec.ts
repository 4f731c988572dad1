// Render a Vega-Lite spec into a SiteFigure's svg and JSON spec fields.
import type { TopLevelSpec } from 'vega-lite';
import type { Renderer } from '../../figures/index.js';

/** The SVG of `spec` and the spec as plain JSON (a deep copy, so later edits cannot change what was rendered). */
export async function renderSpec(renderer: Renderer, spec: TopLevelSpec): Promise<{ svg: string; spec: Record<string, unknown> }> {
  const json = JSON.parse(JSON.stringify(spec)) as Record<string, unknown>;
  return { svg: await renderer.toSvg(spec), spec: json };
}

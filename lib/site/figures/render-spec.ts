// Render a Vega-Lite spec into a SiteFigure's svg and JSON spec fields, keeping the inline SVG light.
import type { TopLevelSpec } from 'vega-lite';
import type { Renderer } from '../../figures/index.js';

type Json = Record<string, unknown>;

const isObject = (v: unknown): v is Json => typeof v === 'object' && v !== null && !Array.isArray(v);

/** True for a layer whose every encoding channel is a constant `datum` (a reference rule): it needs one row, not the plot's data. */
function isDatumOnly(layer: Json): boolean {
  const enc = layer.encoding;
  if (!isObject(enc) || 'data' in layer) return false;
  const channels = Object.values(enc);
  return channels.length > 0 && channels.every((c) => isObject(c) && 'datum' in c);
}

/**
 * A copy of the spec in which reference rules (layers encoding only `datum`s) read a single row: otherwise they inherit the
 * plot's data and draw one identical line per data row. Per-mark ARIA labels are switched off (config.aria = false): the
 * figure's alt text and caption describe it, and a label per point would triple the SVG's size.
 */
export function lightenSpec(spec: TopLevelSpec): Json {
  const copy = JSON.parse(JSON.stringify(spec)) as Json;
  const visit = (node: unknown): void => {
    if (Array.isArray(node)) node.forEach(visit);
    else if (isObject(node)) {
      if (Array.isArray(node.layer)) {
        for (const layer of node.layer) if (isObject(layer) && isDatumOnly(layer)) layer.data = { values: [{}] };
      }
      for (const [key, value] of Object.entries(node)) if (key !== 'data') visit(value);
    }
  };
  visit(copy);
  copy.config = { ...(isObject(copy.config) ? copy.config : {}), aria: false };
  return copy;
}

/** The SVG of `spec` (lightened, see lightenSpec) and the spec as rendered, as plain JSON. */
export async function renderSpec(renderer: Renderer, spec: TopLevelSpec): Promise<{ svg: string; spec: Json }> {
  const light = lightenSpec(spec);
  return { svg: await renderer.toSvg(light as unknown as TopLevelSpec), spec: light };
}

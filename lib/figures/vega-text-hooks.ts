// Finds every installed copy of vega-scenegraph's textMetrics, so a custom text width reaches all of them.
import { createRequire } from 'node:module';
import { pathToFileURL } from 'node:url';
import * as vega from 'vega';

/** vega-scenegraph's text measurement hook: a user-defined `width(item, text)` replaces the estimate. */
export interface VegaTextMetrics {
  width: (item: object, text: unknown) => number;
}

// Packages whose own bounds, layout, labelling or SVG output measure text. npm may install a nested
// vega-scenegraph under several of them (different versions), each with its own textMetrics object.
const MEASURING_PACKAGES = ['vega', 'vega-view', 'vega-view-transforms', 'vega-functions', 'vega-label', 'vega-parser'];

let found: Promise<VegaTextMetrics[]> | undefined;

async function locate(): Promise<VegaTextMetrics[]> {
  const hooks = new Set<VegaTextMetrics>([(vega as unknown as { textMetrics: VegaTextMetrics }).textMetrics]);
  const here = createRequire(import.meta.url);
  for (const pkg of MEASURING_PACKAGES) {
    let path: string;
    try {
      path = createRequire(here.resolve(pkg)).resolve('vega-scenegraph');
    } catch {
      continue; // this package is absent or resolves vega-scenegraph to the shared copy already in the set
    }
    const mod = (await import(pathToFileURL(path).href)) as { textMetrics?: VegaTextMetrics };
    if (mod.textMetrics) hooks.add(mod.textMetrics);
  }
  return [...hooks];
}

/** All distinct textMetrics objects reachable from the installed vega packages (resolved once). */
export function vegaTextMetrics(): Promise<VegaTextMetrics[]> {
  found ??= locate();
  return found;
}

// Renders Vega-Lite or Vega specs to SVG with text measured from the shipped font, and SVG to PNG with resvg.
import * as vega from 'vega';
import { compile } from 'vega-lite';
import type { TopLevelSpec } from 'vega-lite';
import { Resvg } from '@resvg/resvg-js';
import { createTextMeasure, type TextMeasure } from './text-measure.js';
import { roundSvgNumbers } from './svg-precision.js';
import { themeConfig } from './theme.js';
import { vegaTextMetrics } from './vega-text-hooks.js';

/** What the renderer needs: the font's bytes for measuring, its family name, and its file paths for resvg. */
export interface RendererOptions {
  /** Regular-weight TrueType bytes (read by lib/cli/fonts.ts). */
  fontBytes: Uint8Array;
  /** Bold TrueType bytes; titles are measured with it when given. */
  boldFontBytes?: Uint8Array;
  /** Family name written into every text element, e.g. 'DejaVu Sans'. */
  fontFamily: string;
  /** Font file paths handed to resvg (resvg-js 2.6 loads fonts from files only, not from buffers). */
  fontFiles: string[];
  /** Receives vega / vega-lite warnings instead of the console. */
  onWarning?: (message: string) => void;
  /** Decimals kept in SVG geometry attributes (default 2). */
  digits?: number;
}

/** A renderer bound to one font. */
export interface Renderer {
  /** SVG text of a Vega-Lite or Vega spec, themed and measured with the shipped font. */
  toSvg(spec: TopLevelSpec | vega.Spec): Promise<string>;
  /** PNG bytes of an SVG scaled to `widthPx` wide, text drawn with the shipped font only. */
  toPng(svg: string, options: { widthPx: number }): Uint8Array;
  /** The measure used for layout (exposed so tests and map legends use the same numbers). */
  measure: TextMeasure;
}

interface TextItem {
  font?: string;
  fontSize?: number | string;
  fontWeight?: string | number;
  limit?: number;
  ellipsis?: string;
}

function isBold(weight: unknown): boolean {
  return weight === 'bold' || weight === 'bolder' || (typeof weight === 'number' && weight >= 600) || (typeof weight === 'string' && Number(weight) >= 600);
}

function isVegaSpec(spec: object): spec is vega.Spec {
  const schema = (spec as { $schema?: unknown }).$schema;
  if (typeof schema === 'string') return /\/vega\/v\d/.test(schema);
  const keys = ['mark', 'layer', 'facet', 'hconcat', 'vconcat', 'concat', 'repeat', 'spec'];
  return !keys.some((k) => k in spec);
}

function silentLogger(onWarning: ((m: string) => void) | undefined) {
  let lvl = 2;
  const emit = (...args: unknown[]) => onWarning?.(args.map(String).join(' '));
  const logger = {
    level(l?: number) {
      if (l === undefined) return lvl;
      lvl = l;
      return logger;
    },
    error(...args: unknown[]) { emit(...args); return logger; },
    warn(...args: unknown[]) { emit(...args); return logger; },
    info() { return logger; },
    debug() { return logger; },
  };
  return logger;
}

/** Width of one line as vega would draw it: trimmed, truncated with an ellipsis to `limit` px. */
function lineWidth(measure: TextMeasure, item: TextItem, raw: unknown): number {
  const size = item.fontSize != null ? +item.fontSize || 0 : 11;
  const bold = isBold(item.fontWeight);
  let text = raw == null ? '' : String(raw).trim();
  if (size <= 0 || !text) return 0;
  const limit = item.limit ?? 0;
  if (limit > 0 && measure.width(text, size, bold) >= limit) {
    const ellipsis = item.ellipsis || '\u2026';
    const room = limit - measure.width(ellipsis, size, bold);
    let lo = 0;
    let hi = text.length;
    while (lo < hi) {
      const mid = 1 + ((lo + hi) >>> 1);
      if (measure.width(text.slice(0, mid), size, bold) < room) lo = mid;
      else hi = mid - 1;
    }
    text = text.slice(0, lo) + ellipsis;
  }
  return measure.width(text, size, bold);
}

/** A renderer for one font; vega's text width hook is pointed at this font's measure. */
export function createRenderer(options: RendererOptions): Renderer {
  const measure = createTextMeasure(options.fontBytes, options.boldFontBytes);
  const config = themeConfig(options.fontFamily);
  const digits = options.digits ?? 2;
  const width = (item: object, text: unknown) => lineWidth(measure, item as TextItem, text);

  async function toSvg(spec: TopLevelSpec | vega.Spec): Promise<string> {
    const logger = silentLogger(options.onWarning);
    const vgSpec: vega.Spec = isVegaSpec(spec)
      ? spec
      : (compile(spec as TopLevelSpec, { config, logger } as Parameters<typeof compile>[1]).spec as vega.Spec);
    // vega's supported override point (used by headless converters): a user-defined textMetrics.width.
    // It is module state shared by all renderers; the last renderer to run sets it.
    for (const hook of await vegaTextMetrics()) hook.width = width;
    const runtime = vega.parse(vgSpec, isVegaSpec(spec) ? (config as vega.Config) : undefined);
    const view = new vega.View(runtime, { renderer: 'none', logger: logger as unknown as vega.LoggerInterface });
    try {
      const svg = await view.toSVG();
      return roundSvgNumbers(svg, digits);
    } finally {
      view.finalize();
    }
  }

  function toPng(svg: string, { widthPx }: { widthPx: number }): Uint8Array {
    const resvg = new Resvg(svg, {
      font: { loadSystemFonts: false, fontFiles: options.fontFiles, defaultFontFamily: options.fontFamily, sansSerifFamily: options.fontFamily },
      fitTo: { mode: 'width', value: widthPx },
      background: 'white',
      shapeRendering: 2,
      textRendering: 1,
      logLevel: 'off',
    });
    return new Uint8Array(resvg.render().asPng());
  }

  return { toSvg, toPng, measure };
}

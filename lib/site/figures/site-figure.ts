// The record each figure builder returns: page, text, rendered SVG, data and optional spec.
import type { FigurePage } from '../figure-entry.js';
import type { Renderer } from '../../figures/index.js';
import type { Config } from '../../config/index.js';
import type { PipelineResult } from '../../pipeline/index.js';

/** One built figure before its supplement files are written. */
export interface SiteFigure {
  /** Stable id and file stem, e.g. 'fe-c-vs-dfe'. */
  id: string;
  /** Page it appears on. */
  page: FigurePage;
  /** Short title. */
  title: string;
  /** Caption sentences written from the results. */
  caption: string;
  /** Alternative text. */
  alt: string;
  /** Rendered SVG. */
  svg: string;
  /** Data behind the figure as CSV. */
  csv: string;
  /** Vega-Lite spec when the figure has one (maps are hand-made SVG and have none). */
  spec?: Record<string, unknown>;
  /** Caution shown beside the figure, or null. */
  caution: string | null;
}

/** What every builder gets: the pipeline result, the config and the renderer. */
export interface FigureContext {
  /** Pipeline output. */
  result: PipelineResult;
  /** Validated config. */
  config: Config;
  /** Renderer bound to the report font. */
  renderer: Renderer;
  /** Font family of hand-made map text (default 'DejaVu Sans', the renderer's font). */
  fontFamily: string;
}

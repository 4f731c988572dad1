// Every report figure from the pipeline results: page entries plus their supplement files (SVG, CSV, spec, PNGs).
import type { Config } from '../../config/index.js';
import { pngWidthPx, type Renderer } from '../../figures/index.js';
import type { PipelineResult } from '../../pipeline/index.js';
import type { ExtraFile } from '../extra-file.js';
import type { FigureEntry } from '../figure-entry.js';
import { carbonPerIron } from './carbon-per-iron.js';
import { cellSitesMap } from './cell-sites-map.js';
import { classComparison } from './class-comparison.js';
import { crossoverFigure } from './crossover-figure.js';
import { diagnosticFigures } from './diagnostic-figures.js';
import { feCVsDfe } from './fe-c-vs-dfe.js';
import { feStarMap } from './fe-star-map.js';
import { fieldMaps } from './field-maps.js';
import { luxuryUptake } from './luxury-uptake.js';
import { polarMaps } from './polar-maps.js';
import { profilesFigure } from './profiles-figure.js';
import { regionNames } from './region-names.js';
import { residualMap } from './residual-map.js';
import type { FigureContext, SiteFigure } from './site-figure.js';
import { stationMap } from './station-map.js';

/** Options of buildFigures; defaults come from the config's `figures` block. */
export interface BuildFiguresOptions {
  /** PNG widths in mm; default figures.widths_mm. Pass [] for no PNGs. */
  pngWidthsMm?: readonly number[];
  /** PNG resolutions; default figures.dpi. Pass [] for no PNGs. */
  dpi?: readonly number[];
  /** Font family of hand-made map text; default 'DejaVu Sans' (the shipped font). */
  fontFamily?: string;
}

/** Folder of the figure files inside the site. */
export const FIGURE_DIR = 'supplement/figures';

/** The figures of every page in page order, not yet split into files. */
export async function siteFigures(ctx: FigureContext): Promise<SiteFigure[]> {
  const name = regionNames(ctx.result.regions);
  const feStar = feStarMap(ctx);
  const hasCells = ctx.result.cells.numRows() > 0;
  const out: (SiteFigure | null)[] = [stationMap(ctx), ...fieldMaps(ctx), feStar, ...polarMaps(ctx), await profilesFigure(ctx)];
  if (hasCells) {
    out.push(await feCVsDfe(ctx), await classComparison(ctx), cellSitesMap(ctx), await luxuryUptake(ctx), await carbonPerIron(ctx));
  }
  out.push(await crossoverFigure(ctx));
  if (hasCells && ctx.result.fits) out.push(residualMap(ctx, name), ...(await diagnosticFigures(ctx, name)));
  return out.filter((f): f is SiteFigure => f !== null);
}

/** Build every figure: entries for the pages and the files for supplement/figures/ (pure apart from the renderer). */
export async function buildFigures(result: PipelineResult, config: Config, renderer: Renderer, options: BuildFiguresOptions = {}): Promise<{ entries: FigureEntry[]; files: ExtraFile[] }> {
  const ctx: FigureContext = { result, config, renderer, fontFamily: options.fontFamily ?? 'DejaVu Sans' };
  const widths = options.pngWidthsMm ?? config.figures.widths_mm;
  const dpis = options.dpi ?? config.figures.dpi;
  const entries: FigureEntry[] = [];
  const files: ExtraFile[] = [];
  for (const f of await siteFigures(ctx)) {
    const links: FigureEntry['files'] = [];
    const add = (name: string, label: string, data: string | Uint8Array) => {
      const path = `${FIGURE_DIR}/${name}`;
      files.push({ path, data });
      links.push({ label, href: path });
    };
    add(`${f.id}.svg`, 'SVG', f.svg);
    for (const mm of widths) for (const dpi of dpis) add(`${f.id}-${mm}mm-${dpi}dpi.png`, `PNG ${mm} mm, ${dpi} dpi`, renderer.toPng(f.svg, { widthPx: pngWidthPx(mm, dpi) }));
    add(`${f.id}.csv`, 'data (CSV)', f.csv);
    if (f.spec) add(`${f.id}.spec.json`, 'Vega-Lite spec', JSON.stringify(f.spec, null, 2) + '\n');
    entries.push({ id: f.id, page: f.page, title: f.title, caption: f.caption, alt: f.alt, svg: f.svg, files: links, caution: f.caution });
  }
  return { entries, files };
}

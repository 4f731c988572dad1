// The supplementary pack: merged cell table, results, ledger, figure files and one zip of all.
import type { PipelineResult } from '../../pipeline/index.js';
import { toCsv } from '../csv.js';
import type { ExtraFile } from '../extra-file.js';
import type { SupplementFigure, SupplementFigureInfo, SupplementFile, SupplementSection } from './supplement-model.js';
import { fileBytes, zipFiles } from './zip-files.js';

/** Site paths of the pack's own files. */
export const SUPPLEMENT_PATHS = {
  cells: 'supplement/merged-cells.csv',
  results: 'supplement/results.json',
  ledger: 'supplement/ledger.csv',
  zip: 'supplement/basinquota-supplement.zip',
  figures: 'supplement/figures/',
} as const;

/** Inputs of supplementPack. */
export interface SupplementInput {
  /** Figure files under supplement/figures/ (SVG, PNG, CSV, spec JSON). */
  figures: readonly ExtraFile[];
  /** Id, title and caption per figure; files are grouped by the id their name starts with. Default none (grouped by stem). */
  figureInfo?: readonly SupplementFigureInfo[];
  /** The pipeline result; its merged cell table becomes merged-cells.csv. */
  result: PipelineResult;
  /** results.json as written by the build. */
  resultsJson: string;
  /** ledger.csv as written by the build. */
  ledgerCsv: string;
  /** Further data files to include in the zip and the list (e.g. references.bib/json). Default none. */
  extra?: readonly ExtraFile[];
  /** Timestamp of every zip entry, ISO date (the build date); default 1980-01-01. */
  date?: string;
}

/** The merged cell table as CSV: every column in table order, text neutralised against formula injection. */
export function mergedCellsCsv(result: PipelineResult): string {
  const columns = result.cells.columnNames();
  return toCsv(result.cells.objects() as Record<string, unknown>[], columns);
}

const LABELS: Record<string, string> = { svg: 'SVG', png: 'PNG', csv: 'Data (CSV)', json: 'Vega-Lite spec (JSON)' };

/** Label of a figure file from its name: "PNG 85 mm 300 dpi" style text where the name says so. */
function figureLabel(name: string): string {
  const ext = name.slice(name.lastIndexOf('.') + 1).toLowerCase();
  const size = /-(\d+)mm(?:-(\d+)dpi)?\./.exec(name);
  const base = LABELS[ext] ?? ext.toUpperCase();
  return size ? `${base} ${size[1]} mm${size[2] ? ` ${size[2]} dpi` : ''}` : base;
}

const byPath = (a: { path: string }, b: { path: string }): number => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0);

/** Group figure files by figure id (longest matching id prefix, else the name up to its first dot). */
function groupFigures(files: readonly ExtraFile[], info: readonly SupplementFigureInfo[]): SupplementFigure[] {
  const ids = [...info].sort((a, b) => b.id.length - a.id.length);
  const groups = new Map<string, SupplementFigure>();
  for (const f of [...files].sort(byPath)) {
    const name = f.path.slice(f.path.lastIndexOf('/') + 1);
    const known = ids.find((i) => name === i.id || name.startsWith(`${i.id}.`) || name.startsWith(`${i.id}-`));
    const id = known?.id ?? name.split('.')[0];
    let g = groups.get(id);
    if (!g) groups.set(id, (g = { id, title: known?.title ?? id, caption: known?.caption ?? '', files: [] }));
    const label = known?.files?.find((x) => x.href === f.path)?.label ?? figureLabel(name);
    g.files.push({ path: f.path, label, bytes: fileBytes(f.data).length });
  }
  return [...groups.values()].sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}

/**
 * Build the supplement: writes merged-cells.csv, results.json, ledger.csv and a zip of those plus every figure
 * (and `extra`) file, entries sorted and time-stamped `date`; same inputs give the same bytes.
 */
export function supplementPack(input: SupplementInput): { files: ExtraFile[]; section: SupplementSection } {
  const data: ExtraFile[] = [
    { path: SUPPLEMENT_PATHS.cells, data: mergedCellsCsv(input.result) },
    { path: SUPPLEMENT_PATHS.results, data: input.resultsJson },
    { path: SUPPLEMENT_PATHS.ledger, data: input.ledgerCsv },
    ...(input.extra ?? []),
  ].sort(byPath);
  const zip = zipFiles([...data, ...input.figures], 'supplement/', input.date);
  const labels: Record<string, string> = {
    [SUPPLEMENT_PATHS.cells]: 'Merged cell table (CSV)',
    [SUPPLEMENT_PATHS.results]: 'Results (JSON)',
    [SUPPLEMENT_PATHS.ledger]: 'Ledger of excluded, converted and flagged rows (CSV)',
  };
  const listed: SupplementFile[] = data.map((f) => ({ path: f.path, label: labels[f.path] ?? f.path.slice(f.path.lastIndexOf('/') + 1), bytes: fileBytes(f.data).length }));
  return {
    files: [...data, { path: SUPPLEMENT_PATHS.zip, data: zip }],
    section: {
      figures: groupFigures(input.figures, input.figureInfo ?? []),
      data: listed,
      zip: { path: SUPPLEMENT_PATHS.zip, label: 'All supplement files (zip)', bytes: zip.length },
    },
  };
}

// Plain-data model of the Supplement page: every file of the pack with its size.
import type { FigureEntry } from '../figure-entry.js';

/** One file of the supplement. */
export interface SupplementFile {
  /** Site path, e.g. "supplement/merged-cells.csv". */
  path: string;
  /** What the file is. */
  label: string;
  /** Size in bytes. */
  bytes: number;
}

/** One figure of the supplement with its files. */
export interface SupplementFigure {
  /** Figure id (file stem). */
  id: string;
  /** Title. */
  title: string;
  /** Caption. */
  caption: string;
  /** Its files (SVG, PNG per width and dpi, CSV, spec), sorted by path. */
  files: SupplementFile[];
}

/** The Supplement section: `report.sections.supplement`. */
export interface SupplementSection {
  /** Figures sorted by id. */
  figures: SupplementFigure[];
  /** Data files (merged cells, results, ledger, references when given). */
  data: SupplementFile[];
  /** The zip of all files. */
  zip: SupplementFile;
}

/** Figure metadata the pack attaches to figure files (id, title, caption; file labels by href when given), e.g. a FigureEntry. */
export type SupplementFigureInfo = Pick<FigureEntry, 'id' | 'title' | 'caption'> & Partial<Pick<FigureEntry, 'files'>>;

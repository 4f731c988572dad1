// Plain-data model of the Methods page: stages with parameters, formulas and the references they cite.
import type { Reference } from './reference.js';

/** One parameter of a stage as the page prints it. */
export interface MethodParameter {
  /** What the parameter is, in words. */
  name: string;
  /** Its value with units, as text. */
  value: string;
}

/** A small table inside a stage (conversions per file, carbon per class, matches by source). */
export interface MethodTable {
  /** Caption. */
  caption: string;
  /** Column headers. */
  columns: string[];
  /** Rows of cell text. */
  rows: string[][];
}

/** One formula: its TeX source and the MathML rendered from it at build time. */
export interface MethodFormula {
  /** Stable id (e.g. "eos80-conversion"). */
  id: string;
  /** What the formula is, in words. */
  label: string;
  /** TeX source. */
  tex: string;
  /** MathML markup (display mode, no script). */
  mathml: string;
}

/** One stage of the pipeline that ran. */
export interface MethodStage {
  /** Stable id, also the page anchor (e.g. "harmonise"). */
  id: string;
  /** Heading. */
  title: string;
  /** Paragraphs of plain text describing what was done. */
  text: string[];
  /** Parameters in a stable order. */
  parameters: MethodParameter[];
  /** Tables of counts. */
  tables: MethodTable[];
  /** Formulas used by the stage. */
  formulas: MethodFormula[];
  /** Ids of the references the stage cites. */
  references: string[];
}

/** The Methods section: `report.sections.methods`. */
export interface MethodsSection {
  /** Stages in pipeline order; stages that did not run are absent. */
  stages: MethodStage[];
  /** References of the methods used, each once, in order of first citation. */
  references: Reference[];
  /** Site paths of the reference files. */
  files: { bibtex: string; cslJson: string };
}

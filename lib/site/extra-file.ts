/** A file the build writes besides the pages (figures, CSV, zip), path relative to the site root. */
export interface ExtraFile {
  /** Path inside the site, with forward slashes, e.g. "supplement/figures/fec-vs-dfe.svg". */
  path: string;
  /** Content. */
  data: string | Uint8Array;
}

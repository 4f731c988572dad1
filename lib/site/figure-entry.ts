/** Report pages a figure can appear on. */
export type FigurePage = 'index' | 'inventory' | 'fields' | 'quotas' | 'anomalies';

/** One figure as the pages show it: inline SVG plus links to its supplement files. */
export interface FigureEntry {
  /** Stable id, also the file stem in the supplement (e.g. "fec-vs-dfe"). */
  id: string;
  /** Page the figure belongs to. */
  page: FigurePage;
  /** Short title. */
  title: string;
  /** Caption written from the results (what is shown, n, the fit with its interval). */
  caption: string;
  /** Alternative text for screen readers. */
  alt: string;
  /** Inline SVG markup produced by the renderer (trusted). */
  svg: string;
  /** Supplement files of this figure: label and site-relative href (SVG, PNGs, CSV, spec JSON). */
  files: { label: string; href: string }[];
  /** Caution shown beside the figure (e.g. on C:Fe efficiency), or null. */
  caution: string | null;
}

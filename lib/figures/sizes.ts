// Figure widths for journal columns and the pixel arithmetic between mm, CSS px and dpi.

/** Single-column figure width in mm (common journal practice). */
export const SINGLE_COLUMN_MM = 85;

/** Double-column figure width in mm (common journal practice). */
export const DOUBLE_COLUMN_MM = 180;

/** Print resolutions offered for the PNG figure pack, dots per inch. */
export const PNG_DPIS = [300, 600] as const;

/** Width in CSS px (96 per inch, the SVG user unit) of a figure `mm` millimetres wide. */
export function mmToCssPx(mm: number): number {
  return Math.round((mm / 25.4) * 96);
}

/** PNG pixel width for a figure `mm` wide printed at `dpi`: round(mm / 25.4 · dpi). */
export function pngWidthPx(mm: number, dpi: number): number {
  return Math.round((mm / 25.4) * dpi);
}

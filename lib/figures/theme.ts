// The house look of every basinquota figure as one Vega / Vega-Lite config object.
import { DIVERGING_SCHEME, NEUTRALS, OKABE_ITO, SEQUENTIAL_SCHEME } from './palettes.js';

/** Font sizes in CSS px (10 px ≈ 7.5 pt when a figure prints at its nominal mm width). */
export const THEME_SIZES = { label: 10, title: 10, header: 10, figureTitle: 12, mark: 9 } as const;

/** Stroke widths in CSS px. */
export const THEME_STROKES = { axis: 0.75, grid: 0.5, line: 1.25, outline: 0.6 } as const;

/** Config object shared by the Vega-Lite compile step and raw Vega specs; the font family is everywhere. */
export function themeConfig(fontFamily: string): Record<string, unknown> {
  const axisText = {
    labelFont: fontFamily,
    titleFont: fontFamily,
    labelFontSize: THEME_SIZES.label,
    titleFontSize: THEME_SIZES.title,
    titleFontWeight: 'normal',
    labelColor: NEUTRALS.text,
    titleColor: NEUTRALS.text,
  };
  return {
    background: 'white',
    font: fontFamily,
    padding: 4,
    view: { stroke: '#9a9a9a', strokeWidth: THEME_STROKES.axis },
    axis: {
      ...axisText,
      domainColor: '#555555',
      domainWidth: THEME_STROKES.axis,
      tickColor: '#555555',
      tickWidth: THEME_STROKES.axis,
      tickSize: 4,
      gridColor: '#e6e6e6',
      gridWidth: THEME_STROKES.grid,
      labelPadding: 2,
      titlePadding: 4,
    },
    legend: {
      ...axisText,
      labelFontSize: THEME_SIZES.label,
      titleFontSize: THEME_SIZES.title,
      symbolSize: 40,
      gradientThickness: 10,
      orient: 'right',
    },
    header: {
      labelFont: fontFamily,
      titleFont: fontFamily,
      labelFontSize: THEME_SIZES.header,
      titleFontSize: THEME_SIZES.header,
      labelColor: NEUTRALS.text,
      titleColor: NEUTRALS.text,
    },
    title: {
      font: fontFamily,
      subtitleFont: fontFamily,
      fontSize: THEME_SIZES.figureTitle,
      subtitleFontSize: THEME_SIZES.label,
      fontWeight: 'bold',
      anchor: 'start',
      color: NEUTRALS.text,
    },
    text: { font: fontFamily, fontSize: THEME_SIZES.mark, color: NEUTRALS.text },
    mark: { font: fontFamily },
    point: { filled: true, size: 14, opacity: 0.75 },
    circle: { size: 14, opacity: 0.75 },
    line: { strokeWidth: THEME_STROKES.line },
    rule: { strokeWidth: THEME_STROKES.axis },
    area: { opacity: 0.25 },
    range: { category: [...OKABE_ITO], ramp: { scheme: SEQUENTIAL_SCHEME }, diverging: { scheme: DIVERGING_SCHEME }, heatmap: { scheme: SEQUENTIAL_SCHEME } },
  };
}

// Map legends drawn as SVG: a colour bar with ticks and a titled unit, and a row of categorical swatches.
import type { ColourScale } from './colour-scale.js';
import { escapeXml, textWidth } from './svg-text.js';
import { formatNumber } from '../svg-precision.js';

/** Shared text settings for legend drawing. */
export interface LegendText {
  /** Font family written on every text element. */
  fontFamily: string;
  /** Font size in px. */
  fontSize: number;
  /** Text width measure (px) when available, e.g. the renderer's. */
  measure?: (text: string, fontSize: number) => number;
}

/** A tick label: up to three significant digits, no exponent for everyday magnitudes. */
export function tickLabel(v: number): string {
  if (v === 0) return '0';
  const a = Math.abs(v);
  if (a >= 1e-3 && a < 1e5) return String(Number(v.toPrecision(3)));
  return v.toExponential(1).replace('e+', 'e');
}

const f = (v: number) => formatNumber(v, 2);

/** SVG of a horizontal colour bar at (x, y): gradient, ticks with labels below, title (with units) above; height in px returned. */
export function colourBar(
  scale: ColourScale,
  box: { x: number; y: number; width: number; title: string; id: string },
  text: LegendText,
): { svg: string; height: number } {
  const barH = 8;
  const titleY = box.y + text.fontSize;
  const barY = titleY + 4;
  const stops: string[] = [];
  for (let k = 0; k <= 16; k++) {
    const i = Math.round((k / 16) * 255);
    const c = '#' + [0, 1, 2].map((n) => scale.lut[i * 3 + n].toString(16).padStart(2, '0')).join('');
    stops.push(`<stop offset="${f(k / 16)}" stop-color="${c}"/>`);
  }
  const parts = [
    `<g class="colour-bar">`,
    `<defs><linearGradient id="${box.id}" x1="0" y1="0" x2="1" y2="0">${stops.join('')}</linearGradient></defs>`,
    `<text x="${f(box.x)}" y="${f(titleY)}" font-family="${escapeXml(text.fontFamily)}" font-size="${text.fontSize}px" fill="#222222">${escapeXml(box.title)}</text>`,
    `<rect x="${f(box.x)}" y="${f(barY)}" width="${f(box.width)}" height="${barH}" fill="url(#${box.id})" stroke="#555555" stroke-width="0.5"/>`,
  ];
  let lastRight = -Infinity;
  for (const t of scale.ticks(4)) {
    const p = scale.position(t);
    if (Number.isNaN(p)) continue;
    const tx = box.x + p * box.width;
    const label = tickLabel(t);
    const w = textWidth(label, text.fontSize, text.measure);
    // Skip a label that would overlap its left neighbour.
    if (tx - w / 2 < lastRight + 3) continue;
    lastRight = tx + w / 2;
    parts.push(`<line x1="${f(tx)}" x2="${f(tx)}" y1="${f(barY + barH)}" y2="${f(barY + barH + 3)}" stroke="#555555" stroke-width="0.5"/>`);
    parts.push(`<text x="${f(tx)}" y="${f(barY + barH + 4 + text.fontSize)}" text-anchor="middle" font-family="${escapeXml(text.fontFamily)}" font-size="${text.fontSize}px" fill="#222222">${escapeXml(label)}</text>`);
  }
  parts.push('</g>');
  return { svg: parts.join(''), height: barY + barH + 6 + text.fontSize - box.y };
}

/** One categorical legend entry. */
export interface SwatchItem {
  /** Text beside the swatch. */
  label: string;
  /** Fill (points) or stroke (lines) colour. */
  colour: string;
  /** Swatch shape. */
  shape: 'circle' | 'line' | 'dashed-line';
}

/** SVG of swatches laid out left to right, wrapping within `width`; height in px returned. */
export function swatchRow(items: SwatchItem[], box: { x: number; y: number; width: number }, text: LegendText): { svg: string; height: number } {
  const rowH = text.fontSize + 5;
  let cx = box.x;
  let cy = box.y;
  const parts: string[] = ['<g class="swatches">'];
  for (const item of items) {
    const w = 16 + textWidth(item.label, text.fontSize, text.measure) + 10;
    if (cx > box.x && cx + w > box.x + box.width) {
      cx = box.x;
      cy += rowH;
    }
    const mid = cy + rowH / 2;
    if (item.shape === 'circle') parts.push(`<circle cx="${f(cx + 5)}" cy="${f(mid)}" r="3" fill="${item.colour}" stroke="#ffffff" stroke-width="0.5"/>`);
    else parts.push(`<line x1="${f(cx)}" x2="${f(cx + 12)}" y1="${f(mid)}" y2="${f(mid)}" stroke="${item.colour}" stroke-width="1.2"${item.shape === 'dashed-line' ? ' stroke-dasharray="3 2"' : ''}/>`);
    parts.push(`<text x="${f(cx + 16)}" y="${f(mid + text.fontSize * 0.35)}" font-family="${escapeXml(text.fontFamily)}" font-size="${text.fontSize}px" fill="#222222">${escapeXml(item.label)}</text>`);
    cx += w;
  }
  parts.push('</g>');
  return { svg: parts.join(''), height: items.length ? cy + rowH - box.y : 0 };
}

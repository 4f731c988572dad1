// Text widths from the shipped font's own advance widths and kerning, so vega's layout matches the PNG.
import opentype from 'opentype.js';
import type { Font, KerningLookups } from 'opentype.js';

/** Measures a string's advance width in px at a font size in px, for one weight. */
export interface TextMeasure {
  /** Width in px of `text` set at `fontSize` px, kerning applied. */
  width(text: string, fontSize: number, bold?: boolean): number;
}

interface LoadedFont {
  font: Font;
  kerning: KerningLookups | undefined;
}

function load(bytes: Uint8Array): LoadedFont {
  const buffer = bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer;
  const font = opentype.parse(buffer);
  // Latin kerning lookups: the DFLT script of DejaVu carries none, and HarfBuzz-style shapers use 'latn'.
  const kerning = font.position.getKerningTables('latn') ?? font.position.getKerningTables('DFLT');
  return { font, kerning };
}

function advance({ font, kerning }: LoadedFont, text: string, fontSize: number): number {
  // Glyph by glyph: opentype's own shaper throws on some of DejaVu's contextual substitution lookups.
  const glyphs = Array.from(text, (ch) => font.charToGlyph(ch));
  let units = 0;
  for (let i = 0; i < glyphs.length; i++) {
    units += glyphs[i].advanceWidth ?? 0;
    if (kerning && i + 1 < glyphs.length) units += font.position.getKerningValue(kerning, glyphs[i].index, glyphs[i + 1].index);
  }
  return (units / font.unitsPerEm) * fontSize;
}

/** Text measure from TrueType bytes (regular, and bold when given; bold falls back to regular). */
export function createTextMeasure(regular: Uint8Array, bold?: Uint8Array): TextMeasure {
  const reg = load(regular);
  const bld = bold ? load(bold) : reg;
  const cache = new Map<string, number>();
  return {
    width(text, fontSize, isBold = false) {
      const key = `${isBold ? 'b' : 'r'}|${fontSize}|${text}`;
      let w = cache.get(key);
      if (w === undefined) {
        w = advance(isBold ? bld : reg, text, fontSize);
        cache.set(key, w);
      }
      return w;
    },
  };
}

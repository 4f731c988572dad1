import { describe, expect, it } from 'vitest';
import { decode } from 'fast-png';
import opentype from 'opentype.js';
import { createRenderer } from '../../lib/figures/render.js';
import { pngWidthPx, SINGLE_COLUMN_MM } from '../../lib/figures/sizes.js';
import { testFont } from './font-fixture.js';

const renderer = createRenderer(testFont);

const scatter = {
  $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
  title: 'Fe:C',
  width: 200,
  height: 120,
  data: { values: [{ a: 0.1234567, b: 2 }, { a: 2, b: 3.3333333 }] },
  mark: 'point',
  encoding: { x: { field: 'a', type: 'quantitative' }, y: { field: 'b', type: 'quantitative' } },
} as const;

describe('createRenderer', () => {
  it('toSvg(spec) twice gives identical bytes', async () => {
    const a = await renderer.toSvg(scatter);
    const b = await renderer.toSvg(scatter);
    expect(a).toBe(b);
    expect(a.startsWith('<svg')).toBe(true);
  });

  it('toSvg(spec) writes the shipped font family on every text element', async () => {
    const svg = await renderer.toSvg(scatter);
    const texts = svg.match(/<text[^>]*>/g) ?? [];
    expect(texts.length).toBeGreaterThan(5);
    for (const t of texts) expect(t).toContain('font-family="DejaVu Sans"');
  });

  it('toSvg(spec) keeps geometry at two decimals', async () => {
    const svg = await renderer.toSvg(scatter);
    const attrs = svg.match(/ (?:d|transform)="[^"]*"/g) ?? [];
    for (const a of attrs) expect(a).not.toMatch(/\d\.\d{3}/);
  });

  it('measure.width("Fe:C") equals the opentype advance width of the font', () => {
    const buf = testFont.fontBytes.buffer.slice(testFont.fontBytes.byteOffset, testFont.fontBytes.byteOffset + testFont.fontBytes.byteLength) as ArrayBuffer;
    const font = opentype.parse(buf);
    // Advances of F, e, :, C plus the font's own latin GPOS kerning pairs, read through opentype.js.
    const glyphs = Array.from('Fe:C', (ch) => font.charToGlyph(ch));
    const kern = font.position.getKerningTables('latn');
    let units = 0;
    glyphs.forEach((g, i) => {
      units += g.advanceWidth ?? 0;
      if (kern && i + 1 < glyphs.length) units += font.position.getKerningValue(kern, g.index, glyphs[i + 1].index);
    });
    const expected = (units / font.unitsPerEm) * 10;
    expect(renderer.measure.width('Fe:C', 10)).toBeCloseTo(expected, 9);
    // The crude estimate vega falls back to without a canvas is 0.8·4·10 = 32 px: ours is not that.
    expect(Math.abs(expected - 32)).toBeGreaterThan(5);
  });

  it('measure.width applies latin kerning ("AV" narrower than "A" + "V")', () => {
    const sum = renderer.measure.width('A', 10) + renderer.measure.width('V', 10);
    expect(renderer.measure.width('AV', 10)).toBeLessThan(sum - 0.1);
  });

  it('toSvg(spec) lays out a long axis title with the measured width', async () => {
    // A title of wide glyphs and one of narrow glyphs, same length: the estimate would size them alike.
    const wide = await renderer.toSvg({ ...scatter, title: 'WWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWWW', width: 40 });
    const narrow = await renderer.toSvg({ ...scatter, title: 'iiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiiii', width: 40 });
    const w = (svg: string) => Number(/width="(\d+(?:\.\d+)?)"/.exec(svg)?.[1]);
    expect(w(wide)).toBeGreaterThan(w(narrow) + 100);
  });

  it('toPng(svg) draws text as wide as measure.width says (layout and PNG agree)', () => {
    const text = 'Fe:C WAVE tiny';
    const size = 20;
    const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="400" height="40" viewBox="0 0 400 40"><rect width="400" height="40" fill="white"/>` +
      `<text x="10" y="30" font-family="DejaVu Sans" font-size="${size}px" fill="black">${text}</text></svg>`;
    const png = decode(renderer.toPng(svg, { widthPx: 400 }));
    let minX = Infinity;
    let maxX = -Infinity;
    for (let y = 0; y < png.height; y++) {
      for (let x = 0; x < png.width; x++) {
        if (png.data[(y * png.width + x) * png.channels] < 128) {
          minX = Math.min(minX, x);
          maxX = Math.max(maxX, x);
        }
      }
    }
    // Ink spans the advance width less the side bearings of the first and last glyph (about 1-2 px at 20 px).
    const advance = renderer.measure.width(text, size);
    expect(minX).toBeGreaterThanOrEqual(10);
    expect(minX).toBeLessThanOrEqual(13);
    expect(maxX + 1).toBeLessThanOrEqual(10 + advance + 1);
    expect(maxX + 1).toBeGreaterThan(10 + advance - 4);
  });

  it('toPng(svg, {widthPx}) decodes to 1004 px for 85 mm at 300 dpi and 2008 px at 600 dpi', async () => {
    const svg = await renderer.toSvg(scatter);
    expect(pngWidthPx(SINGLE_COLUMN_MM, 300)).toBe(1004);
    expect(pngWidthPx(SINGLE_COLUMN_MM, 600)).toBe(2008);
    for (const dpi of [300, 600]) {
      const png = decode(renderer.toPng(svg, { widthPx: pngWidthPx(SINGLE_COLUMN_MM, dpi) }));
      expect(png.width).toBe(pngWidthPx(SINGLE_COLUMN_MM, dpi));
    }
  });

  it('toSvg(vegaSpec) renders a raw Vega spec too', async () => {
    const svg = await renderer.toSvg({
      $schema: 'https://vega.github.io/schema/vega/v6.json',
      width: 50,
      height: 20,
      marks: [{ type: 'text', encode: { enter: { text: { value: 'dFe' }, x: { value: 5 }, y: { value: 10 } } } }],
    });
    expect(svg).toContain('>dFe</text>');
    expect(svg).toContain('font-family="DejaVu Sans"');
  });
});

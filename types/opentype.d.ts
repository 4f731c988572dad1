// Minimal typings for the parts of opentype.js that basinquota uses (no @types package installed).
declare module 'opentype.js' {
  export interface Glyph {
    index: number;
    advanceWidth?: number;
  }
  export interface KerningLookups {
    readonly length: number;
  }
  export interface Position {
    getKerningTables(script: string, language?: string): KerningLookups | undefined;
    getKerningValue(lookups: KerningLookups, leftIndex: number, rightIndex: number): number;
  }
  export interface Font {
    unitsPerEm: number;
    ascender: number;
    descender: number;
    position: Position;
    names: { windows?: { fontFamily?: Record<string, string> }; macintosh?: { fontFamily?: Record<string, string> } };
    charToGlyph(char: string): Glyph;
    getAdvanceWidth(text: string, fontSize: number, options?: { kerning?: boolean; features?: Record<string, boolean> }): number;
  }
  const opentype: { parse(buffer: ArrayBuffer): Font };
  export default opentype;
}

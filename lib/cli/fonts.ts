// Reads the shipped DejaVu Sans font files from the installed dejavu-fonts-ttf package (the CLI is the shell).
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';

/** The figure font: its family name, bytes for text measurement and file paths for the PNG rasteriser. */
export interface FigureFont {
  /** Family name as the font's name table gives it. */
  fontFamily: string;
  /** DejaVuSans.ttf bytes. */
  fontBytes: Uint8Array;
  /** DejaVuSans-Bold.ttf bytes. */
  boldFontBytes: Uint8Array;
  /** Absolute paths of the regular and bold files (resvg loads from files). */
  fontFiles: string[];
}

/** Loads DejaVu Sans regular and bold from node_modules/dejavu-fonts-ttf/ttf. */
export function loadFigureFont(): FigureFont {
  const require = createRequire(import.meta.url);
  const dir = join(dirname(require.resolve('dejavu-fonts-ttf/package.json')), 'ttf');
  const regular = join(dir, 'DejaVuSans.ttf');
  const bold = join(dir, 'DejaVuSans-Bold.ttf');
  return {
    fontFamily: 'DejaVu Sans',
    fontBytes: new Uint8Array(readFileSync(regular)),
    boldFontBytes: new Uint8Array(readFileSync(bold)),
    fontFiles: [regular, bold],
  };
}

// Test helper: the shipped DejaVu Sans files read straight from node_modules.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const dir = fileURLToPath(new URL('../../node_modules/dejavu-fonts-ttf/ttf/', import.meta.url));

/** Regular and bold DejaVu Sans for the renderer under test. */
export const testFont = {
  fontFamily: 'DejaVu Sans',
  fontBytes: new Uint8Array(readFileSync(dir + 'DejaVuSans.ttf')),
  boldFontBytes: new Uint8Array(readFileSync(dir + 'DejaVuSans-Bold.ttf')),
  fontFiles: [dir + 'DejaVuSans.ttf', dir + 'DejaVuSans-Bold.ttf'],
};

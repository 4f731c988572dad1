import { describe, expect, it } from 'vitest';
import { figureCsv } from '../../lib/figures/figure.js';

describe('figureCsv', () => {
  it('figureCsv(rows, columns) neutralises text cells starting with = + - @ tab or CR', () => {
    const rows = [{ v: '=SUM(A1)' }, { v: '+1' }, { v: '-x' }, { v: '@me' }, { v: '\tx' }, { v: '\rx' }, { v: 'ok' }];
    expect(figureCsv(rows, ['v'])).toBe("v\n'=SUM(A1)\n'+1\n'-x\n'@me\n'\tx\n\"'\rx\"\nok\n");
  });

  it('figureCsv(rows, columns) leaves negative numbers as numbers', () => {
    expect(figureCsv([{ a: -0.3, b: 1e-9 }], ['a', 'b'])).toBe('a,b\n-0.3,1e-9\n');
  });

  it('figureCsv(rows, columns) quotes commas and quotes, blanks missing and NaN', () => {
    const csv = figureCsv([{ a: 'x, "y"', b: Number.NaN, c: null }], ['a', { key: 'b', header: 'B (nmol kg⁻¹)' }, 'c']);
    expect(csv).toBe('a,B (nmol kg⁻¹),c\n"x, ""y""",,\n');
  });
});

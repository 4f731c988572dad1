import * as aq from 'arquero';
import { describe, expect, it } from 'vitest';
import { decodeGrid, decodeTable, encodeGrid, encodeTable } from '../../lib/cli/cache/index.js';

const roundTrip = (table: aq.ColumnTable): aq.ColumnTable => {
  const { header, chunks } = encodeTable(table, 0);
  const blob = new Uint8Array(chunks.reduce((s, c) => s + c.length, 0));
  let at = 0;
  for (const c of chunks) {
    blob.set(c, at);
    at += c.length;
  }
  return decodeTable(header, blob);
};

describe('encodeTable / decodeTable', () => {
  it('decodeTable(encodeTable(table)) keeps NaN, -0, nulls, booleans, strings and the array kind of every column', () => {
    const table = aq.table({
      typed: Float64Array.from([1.5, NaN, -0, Infinity]),
      plain: [0.1, NaN, -0, -Infinity],
      text: ['a', null, '', 'ünï "q"'],
      flag: [true, false, true, false],
      mixed: [1, 'x', null, NaN],
    });
    const back = roundTrip(table);
    expect(back.columnNames()).toEqual(['typed', 'plain', 'text', 'flag', 'mixed']);
    expect(back.column('typed')).toBeInstanceOf(Float64Array);
    expect(Array.isArray(back.column('plain'))).toBe(true);
    for (const name of table.columnNames()) {
      const a = Array.from(table.array(name) as ArrayLike<unknown>);
      const b = Array.from(back.array(name) as ArrayLike<unknown>);
      expect(b.length).toBe(a.length);
      a.forEach((v, i) => expect(Object.is(b[i], v)).toBe(true));
    }
  });

  it('decodeTable(empty table) gives a table without rows or columns', () => {
    const back = roundTrip(aq.table({}));
    expect(back.numRows()).toBe(0);
    expect(back.numCols()).toBe(0);
  });

  it('encodeTable(column of objects) throws, so the file is not cached', () => {
    expect(() => encodeTable(aq.table({ when: [new Date(0)] }), 0)).toThrow(/cannot cache/);
  });

  it('decodeTable(header pointing outside the bytes) throws instead of reading garbage', () => {
    const { header } = encodeTable(aq.table({ x: [1, 2] }), 0);
    expect(() => decodeTable(header, new Uint8Array(4))).toThrow(/outside/);
  });
});

describe('encodeGrid / decodeGrid', () => {
  it('decodeGrid(encodeGrid(grid)) gives back every axis, value (NaN included) and field', () => {
    const grid = {
      quantity: 'dissolved_fe',
      units: 'nmol/kg',
      lon: Float64Array.from([-10, 0, 10]),
      lat: Float64Array.from([-5, 5]),
      depth: Float64Array.from([0]),
      timeKind: 'none' as const,
      time: Float64Array.from([0]),
      values: Float32Array.from([0.1, NaN, 0.3, 0.4, 0.5, 0.6]),
      periodicLon: false,
      source: 'dfe.nc',
      variable: 'dfe',
    };
    const { header, chunks } = encodeGrid(grid, 0);
    const blob = new Uint8Array(chunks.reduce((s, c) => s + c.length, 0));
    let at = 0;
    for (const c of chunks) {
      blob.set(c, at);
      at += c.length;
    }
    expect(decodeGrid(header, blob)).toEqual(grid);
    expect(() => decodeGrid(header, blob.subarray(0, 40))).toThrow(/outside/);
  });
});

import { describe, expect, it } from 'vitest';
import { readCsvGrid } from '../../lib/grids/index.js';

const csv = (text: string) => ({ name: 'grids/no3.csv', text });

describe('readCsvGrid', () => {
  it('readCsvGrid(rows in any order) builds the lattice, wraps 0–360 lon and keeps empty values as NaN', () => {
    const g = readCsvGrid(
      csv('lon,lat,depth,value\n350,10,0,4\n10,0,0,1\n350,0,0,\n10,10,0,3\n10,0,50,5\n350,0,50,6\n10,10,50,7\n350,10,50,NaN\n'),
      { quantity: 'nitrate', units: 'umol/kg' },
    );
    expect([...g.lon]).toEqual([-10, 10]);
    expect([...g.lat]).toEqual([0, 10]);
    expect([...g.depth]).toEqual([0, 50]);
    expect(g.timeKind).toBe('none');
    expect([...g.values]).toEqual([NaN, 1, 4, 3, 6, 5, NaN, 7]);
  });

  it('readCsvGrid(month column) reads a climatology', () => {
    const g = readCsvGrid(csv('lon,lat,depth,month,value\n0,0,0,2,20\n0,0,0,1,10\n'), { quantity: 'dissolved_fe', units: 'nmol/kg' });
    expect(g.timeKind).toBe('month');
    expect([...g.time]).toEqual([1, 2]);
    expect([...g.values]).toEqual([10, 20]);
  });

  it('readCsvGrid(duplicated node) names both lines', () => {
    expect(() => readCsvGrid(csv('lon,lat,depth,value\n0,0,0,1\n1,0,0,2\n360,0,0,3\n'), { quantity: 'nitrate', units: 'umol/kg' })).toThrow(
      'grids/no3.csv:4: node (lon 0, lat 0, depth 0) repeats line 2',
    );
  });

  it('readCsvGrid(absent node) names the node and the lattice', () => {
    expect(() => readCsvGrid(csv('lon,lat,depth,value\n0,0,0,1\n1,0,0,2\n0,1,0,3\n'), { quantity: 'nitrate', units: 'umol/kg' })).toThrow(
      'grids/no3.csv: node (lon 1, lat 1, depth 0) is absent; 3 rows do not fill the 2 × 2 × 1 lattice (write a row with an empty value for a missing node)',
    );
  });

  it('readCsvGrid(bad cells, bad header, no units) gives file:line and what was expected', () => {
    expect(() => readCsvGrid(csv('lon,lat,depth,value\n0,x,0,1\n'), { quantity: 'nitrate', units: 'umol/kg' })).toThrow('grids/no3.csv:2: column lat is "x"; expected a number');
    expect(() => readCsvGrid(csv('lon,lat,depth,month,value\n0,0,0,13,1\n'), { quantity: 'nitrate', units: 'umol/kg' })).toThrow(
      'grids/no3.csv:2: month is "13"; expected an integer 1..12',
    );
    expect(() => readCsvGrid(csv('x,y,value\n'), { quantity: 'nitrate', units: 'umol/kg' })).toThrow(
      'grids/no3.csv:1: grid header is "x,y,value"; expected lon,lat,depth,value or lon,lat,depth,month,value',
    );
    expect(() => readCsvGrid(csv('lon,lat,depth,value\n0,0,0,1\n'), { quantity: 'nitrate' })).toThrow('grids/no3.csv: variable value has no units attribute; give the units in the config');
    expect(() => readCsvGrid(csv('lon,lat,depth,value\n0,0,0,1,5\n'), { quantity: 'nitrate', units: 'umol/kg' })).toThrow(/^grids\/no3\.csv:2: /);
  });
});

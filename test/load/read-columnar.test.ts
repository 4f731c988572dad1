import { tableFromArrays, tableToIPC } from 'apache-arrow';
import { parquetWriteBuffer } from 'hyparquet-writer';
import { describe, expect, it } from 'vitest';
import { Ledger } from '../../lib/ledger/index.js';
import { decodeColumnar, readColumnar, readTable } from '../../lib/load/index.js';

const OPTIONS = { table: 'samples' as const, columns: { dissolved_fe: 'dFe' } };
const CSV = 'cruise,station,lat,lon,depth,time,dFe\nX1,1,10.5,-30,5,2021-03-01T00:00:00.000Z,0.21\nX1,2,11,-31,50,2021-03-02T06:30:00.000Z,bdl\nX1,3,12,-32,80,2021-03-03T00:00:00.000Z,abc\n';

const decode = async (name: string, bytes: Uint8Array) => {
  const decoded = await decodeColumnar({ name, bytes });
  if ('severity' in decoded) throw new Error(decoded.message);
  const ledger = new Ledger();
  return { result: readColumnar(decoded, OPTIONS, ledger), ledger };
};

describe('readColumnar', () => {
  it('readColumnar(Arrow IPC) gives the same typed table as the same data in CSV', async () => {
    const arrow = tableFromArrays({
      cruise: ['X1', 'X1', 'X1'],
      station: ['1', '2', '3'],
      lat: Float64Array.from([10.5, 11, 12]),
      lon: Float64Array.from([-30, -31, -32]),
      depth: Float64Array.from([5, 50, 80]),
      time: ['2021-03-01T00:00:00.000Z', '2021-03-02T06:30:00.000Z', '2021-03-03T00:00:00.000Z'],
      dFe: ['0.21', 'bdl', 'abc'],
    });
    const { result, ledger } = await decode('bottles.arrow', tableToIPC(arrow, 'file'));
    const csvLedger = new Ledger();
    const csv = readTable({ name: 'bottles.arrow', text: CSV }, OPTIONS, csvLedger);
    expect(result.table.objects()).toEqual(csv.table.objects());
    expect(ledger.entries).toEqual(csvLedger.entries);
    expect(result.rowsRead).toBe(3);
  });

  it('readColumnar(Parquet) reads numbers, text and timestamps with the config column map', async () => {
    const bytes = new Uint8Array(
      parquetWriteBuffer({
        columnData: [
          { name: 'cruise', data: ['X1', 'X1'] },
          { name: 'station', data: ['1', '2'] },
          { name: 'lat', data: [10.5, 11] },
          { name: 'lon', data: [-30, -31] },
          { name: 'depth', data: [5, 50] },
          { name: 'time', data: [new Date(Date.UTC(2021, 2, 1)), new Date(Date.UTC(2021, 2, 2, 6, 30))] },
          { name: 'dFe', data: [0.21, 0.3] },
        ],
      }),
    );
    const { result, ledger } = await decode('bottles.parquet', bytes);
    expect(ledger.entries).toEqual([]);
    expect(result.table.array('dissolved_fe')).toEqual([0.21, 0.3]);
    expect(result.table.array('time')).toEqual([Date.UTC(2021, 2, 1), Date.UTC(2021, 2, 2, 6, 30)]);
    expect(result.table.array('source_line')).toEqual([2, 3]);
  });

  it('decodeColumnar(corrupt bytes) is a problem naming the file, not a crash', async () => {
    const decoded = await decodeColumnar({ name: 'broken.parquet', bytes: new Uint8Array([1, 2, 3, 4, 5, 6, 7, 8, 9]) });
    expect(decoded).toMatchObject({ file: 'broken.parquet', severity: 'error' });
    expect((decoded as { message: string }).message).toMatch(/^not a readable Parquet file \(/);
  });
});

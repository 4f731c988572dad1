import * as aq from 'arquero';
import { strFromU8, unzipSync } from 'fflate';
import { describe, expect, it } from 'vitest';
import type { PipelineResult } from '../../../lib/pipeline/index.js';
import { mergedCellsCsv, supplementPack, SUPPLEMENT_PATHS, zipFiles, type SupplementInput } from '../../../lib/site/supplement/index.js';

/** The pack reads only `cells` of the pipeline result. */
function resultWithCells(cells: aq.ColumnTable): PipelineResult {
  return { cells } as unknown as PipelineResult;
}

const figures = [
  { path: 'supplement/figures/fec-vs-dfe.svg', data: '<svg xmlns="http://www.w3.org/2000/svg"/>' },
  { path: 'supplement/figures/fec-vs-dfe-85mm-300dpi.png', data: new Uint8Array([137, 80, 78, 71, 1, 2, 3]) },
  { path: 'supplement/figures/fec-vs-dfe.csv', data: 'dfe,fe_c\n0.1,2\n' },
  { path: 'supplement/figures/fec-vs-dfe.vl.json', data: '{}' },
  { path: 'supplement/figures/anomaly-map.svg', data: '<svg/>' },
];

function input(cells = aq.table({ cell_id: ['c1', 'c2'], fe: [1e-18, 2e-18], station: ['S1', '=SUM(A1:A2)'] })): SupplementInput {
  return {
    figures,
    figureInfo: [{ id: 'fec-vs-dfe', title: 'Fe:C against dFe', caption: 'Cells by class, n = 2.' }],
    result: resultWithCells(cells),
    resultsJson: '{"fits":[]}\n',
    ledgerCsv: 'table,file,line\n',
    date: '2026-03-04T05:06:07Z',
  };
}

describe('supplementPack(input)', () => {
  it('gives identical zip bytes for two calls', () => {
    const a = supplementPack(input()).files.find((f) => f.path === SUPPLEMENT_PATHS.zip)!.data;
    const b = supplementPack({ ...input(), figures: [...figures].reverse() }).files.find((f) => f.path === SUPPLEMENT_PATHS.zip)!.data;
    expect(b).toEqual(a);
  });

  it('unzips to the data files and figure files, sorted, with their content', () => {
    const pack = supplementPack(input());
    const zip = pack.files.find((f) => f.path === SUPPLEMENT_PATHS.zip)!.data as Uint8Array;
    const entries = unzipSync(zip);
    const listed = [...pack.section.data.map((f) => f.path), ...pack.section.figures.flatMap((g) => g.files.map((f) => f.path))].map((p) => p.replace(/^supplement\//, ''));
    expect(Object.keys(entries)).toEqual([...listed].sort());
    expect(strFromU8(entries['results.json'])).toBe('{"fits":[]}\n');
    expect([...entries['figures/fec-vs-dfe-85mm-300dpi.png']]).toEqual([137, 80, 78, 71, 1, 2, 3]);
  });

  it('lists each file with its size in bytes', () => {
    const { section, files } = supplementPack(input());
    for (const f of section.data) {
      const data = files.find((x) => x.path === f.path)!.data;
      expect(f.bytes).toBe(typeof data === 'string' ? new TextEncoder().encode(data).length : data.length);
    }
    expect(section.zip.bytes).toBe((files.find((f) => f.path === SUPPLEMENT_PATHS.zip)!.data as Uint8Array).length);
  });

  it('groups figure files by figure id with title, caption and labels', () => {
    const { section } = supplementPack(input());
    expect(section.figures.map((f) => f.id)).toEqual(['anomaly-map', 'fec-vs-dfe']);
    const fec = section.figures[1];
    expect(fec).toMatchObject({ title: 'Fe:C against dFe', caption: 'Cells by class, n = 2.' });
    expect(fec.files.map((f) => f.label)).toEqual(['PNG 85 mm 300 dpi', 'Data (CSV)', 'SVG', 'Vega-Lite spec (JSON)']);
  });

  it('takes file labels from the figure entry when it lists the file', () => {
    const info = [{ id: 'fec-vs-dfe', title: 'T', caption: 'C', files: [{ label: 'Vector (SVG)', href: 'supplement/figures/fec-vs-dfe.svg' }] }];
    const fec = supplementPack({ ...input(), figureInfo: info }).section.figures[1];
    expect(fec.files.map((f) => f.label)).toEqual(['PNG 85 mm 300 dpi', 'Data (CSV)', 'Vector (SVG)', 'Vega-Lite spec (JSON)']);
  });

  it('writes merged-cells.csv, results.json and ledger.csv', () => {
    const paths = supplementPack(input()).files.map((f) => f.path);
    expect(paths).toEqual([SUPPLEMENT_PATHS.ledger, SUPPLEMENT_PATHS.cells, SUPPLEMENT_PATHS.results, SUPPLEMENT_PATHS.zip]);
  });
});

describe('mergedCellsCsv(result)', () => {
  it('keeps every column in table order and neutralises a cell starting with =', () => {
    const csv = mergedCellsCsv(resultWithCells(aq.table({ cell_id: ['c1', 'c2'], fe: [1e-18, 2e-18], station: ['S1', '=SUM(A1:A2)'] })));
    // OWASP CSV injection guidance: a leading = is prefixed with a single quote.
    expect(csv).toBe("cell_id,fe,station\nc1,1e-18,S1\nc2,2e-18,'=SUM(A1:A2)\n");
  });
});

describe('zipFiles(files, prefix, stamp)', () => {
  it('stamps entries with the given date as DOS time, whatever the time zone', () => {
    const files = [{ path: 'supplement/a.txt', data: 'a' }];
    const saved = process.env.TZ;
    process.env.TZ = 'Pacific/Auckland';
    const far = zipFiles(files, 'supplement/', '2026-03-04T05:06:07Z');
    process.env.TZ = 'UTC';
    const utc = zipFiles(files, 'supplement/', '2026-03-04T05:06:07Z');
    process.env.TZ = saved;
    expect(far).toEqual(utc);
    // ZIP local file header (PKWARE APPNOTE 4.3.7): mod time at offset 10, mod date at 12, little-endian DOS format.
    const view = new DataView(utc.buffer, utc.byteOffset);
    expect(view.getUint16(10, true)).toBe((5 << 11) | (6 << 5) | (7 >> 1));
    expect(view.getUint16(12, true)).toBe(((2026 - 1980) << 9) | (3 << 5) | 4);
  });

  it('stamps a date before 1980 or an unreadable one as 1980', () => {
    const files = [{ path: 'a.txt', data: 'a' }];
    const view = (z: Uint8Array) => new DataView(z.buffer, z.byteOffset).getUint16(12, true);
    expect(view(zipFiles(files, '', '1970-01-01'))).toBe((0 << 9) | (1 << 5) | 1);
    expect(view(zipFiles(files, '', 'not a date'))).toBe((0 << 9) | (1 << 5) | 1);
  });
});

// A cell file given as Parquet or Arrow IPC instead of CSV, with the same column map, gives the same merged table.
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { tableFromArrays, tableToIPC } from 'apache-arrow';
import { parse } from 'csv-parse/sync';
import { parquetWriteBuffer } from 'hyparquet-writer';
import { afterAll, describe, expect, it } from 'vitest';
import { readProject } from '../../lib/cli/read-project.js';
import { decodeColumnarInputs, runPipeline } from '../../lib/pipeline/index.js';

const DEMO = join(import.meta.dirname, '..', '..', 'data', 'demo');
const CELLS = 'cells/SG2104_cells.csv';
const work: string[] = [];

afterAll(() => {
  for (const dir of work) rmSync(dir, { recursive: true, force: true });
});

/** A temp copy of the demo (version 1 config) whose SG2104 cell file is replaced by `name` holding the same columns as text. */
function projectWith(name: string, encode: (columns: Record<string, string[]>) => Uint8Array): string {
  const dir = mkdtempSync(join(tmpdir(), 'basinquota-columnar-'));
  work.push(dir);
  cpSync(DEMO, dir, { recursive: true, filter: (p) => !/[\\/](archive|_site)$/.test(p) });
  const rows = parse(readFileSync(join(DEMO, CELLS), 'utf8'), { columns: true }) as Record<string, string>[];
  const columns: Record<string, string[]> = {};
  for (const key of Object.keys(rows[0])) columns[key] = rows.map((r) => r[key]);
  writeFileSync(join(dir, 'cells', name), encode(columns));
  // The bootstrap is irrelevant here and slow: switch it off.
  const config = readFileSync(join(dir, 'basinquota.v1.yaml'), 'utf8').replace(CELLS, `cells/${name}`).replace('    n: 500\n', '    n: 0\n');
  writeFileSync(join(dir, 'basinquota.v1.yaml'), config);
  return dir;
}

function toCsvText(columns: Record<string, string[]>): string {
  const keys = Object.keys(columns);
  const lines = [keys.join(',')];
  for (let i = 0; i < columns[keys[0]].length; i++) lines.push(keys.map((k) => columns[k][i]).join(','));
  return `${lines.join('\n')}\n`;
}

async function mergedCells(dir: string) {
  const project = readProject(dir, 'basinquota.v1.yaml');
  expect(project.problems.filter((p) => p.severity === 'error')).toEqual([]);
  expect(await decodeColumnarInputs(project.inputs!)).toEqual([]);
  const result = runPipeline(project.inputs!);
  expect(result.problems.filter((p) => p.severity === 'error')).toEqual([]);
  return result;
}

describe('columnar cell inputs', () => {
  it('runPipeline(cells as Parquet) gives the same Fe:C per cell as the CSV', async () => {
    const csv = await mergedCells(projectWith('SG2104_cells.csv', (columns) => new TextEncoder().encode(toCsvText(columns))));
    const parquet = await mergedCells(
      projectWith('SG2104_cells.parquet', (columns) => new Uint8Array(parquetWriteBuffer({ columnData: Object.entries(columns).map(([name, data]) => ({ name, data })) }))),
    );
    expect(parquet.cells.numRows()).toBe(csv.cells.numRows());
    expect(Array.from(parquet.cells.array('fe_c') as ArrayLike<number>)).toEqual(Array.from(csv.cells.array('fe_c') as ArrayLike<number>));
    expect(parquet.ledger.entries.filter((e) => e.action === 'excluded').length).toBe(csv.ledger.entries.filter((e) => e.action === 'excluded').length);
  });

  it('runPipeline(cells as Arrow IPC) gives the same cell count as the CSV', async () => {
    const arrow = await mergedCells(projectWith('SG2104_cells.arrow', (columns) => tableToIPC(tableFromArrays(columns), 'file')));
    const original = readFileSync(join(DEMO, CELLS), 'utf8').trim().split('\n').length - 1;
    const kept = (Array.from(arrow.cells.array('source_file') as ArrayLike<string>) as string[]).filter((f) => f === 'cells/SG2104_cells.arrow').length;
    expect(kept + arrow.ledger.excluded('cells', 'cells/SG2104_cells.arrow').length).toBe(original);
    expect(kept).toBeGreaterThan(0);
  });
});

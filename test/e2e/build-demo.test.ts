// End-to-end: the real CLI builds and checks the demo project; the site agrees with the generator's truth.
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'yaml';
import { beforeAll, describe, expect, it } from 'vitest';
import { buildDemoOnce, buildSite, DEMO_PATH, withTempCopy } from '../helpers/build-demo.js';
import { countDataRows } from '../helpers/delimited.js';
import { runCli } from '../helpers/run-cli.js';
import { readTree, treeDifferences } from '../helpers/site-files.js';
import { excludedRows, stationsFullyExcluded, type TruthCruise } from './counts.js';

interface Truth {
  counts: { cruises: Record<string, TruthCruise> };
  faults: { file: string; line: number; kind: string; expected_action: string }[];
}
interface DemoConfig {
  inputs: { samples: { path: string; columns: { station: string } }[]; cells: { path: string }[] };
}

const truth = JSON.parse(readFileSync(join(DEMO_PATH, 'truth.json'), 'utf8')) as Truth;
const config = parse(readFileSync(join(DEMO_PATH, 'basinquota.yaml'), 'utf8')) as DemoConfig;
const cruises = Object.values(truth.counts.cruises);
const sum = (xs: number[]): number => xs.reduce((a, b) => a + b, 0);

/** The number inside `<tag attr="value">N</tag>`, or undefined. */
function numberAt(html: string, attr: string, value: string): number | undefined {
  const m = new RegExp(`${attr}="${value}"[^>]*>\\s*([\\d,]+)\\s*<`).exec(html);
  return m ? Number(m[1].replace(/,/g, '')) : undefined;
}

/** The Inventory page's "Input files" rows: table, file, rows read, used, excluded. */
function inputFileRows(html: string): { table: string; file: string; read: number; used: number; excluded: number }[] {
  const re = /<tr><td>(\w+)<\/td><td><code>([^<]+)<\/code><\/td><td class="num">(\d+)<\/td><td class="num">(\d+)<\/td><td class="num">(\d+)<\/td><\/tr>/g;
  return [...html.matchAll(re)].map((m) => ({ table: m[1], file: m[2], read: Number(m[3]), used: Number(m[4]), excluded: Number(m[5]) }));
}

/** Break a project copy's config: an unknown unit for the first samples file's dFe. */
function injectUnknownUnit(project: string): void {
  const path = join(project, 'basinquota.yaml');
  const text = readFileSync(path, 'utf8');
  const broken = text.replace('dissolved_fe: "nmol/kg"', 'dissolved_fe: "nmol/kgg"');
  expect(broken).not.toBe(text);
  writeFileSync(path, broken);
}

describe('basinquota build data/demo', () => {
  let site: string;
  let overview: string;
  let inventory: string;
  let excluded: Map<string, Set<string>>;

  beforeAll(async () => {
    site = await buildDemoOnce();
    overview = readFileSync(join(site, 'index.html'), 'utf8');
    inventory = readFileSync(join(site, 'inventory.html'), 'utf8');
    excluded = excludedRows(readFileSync(join(site, 'supplement', 'ledger.csv'), 'utf8'));
  }, 180_000);

  it('index.html shows the truth counts minus the rows the ledger excluded', () => {
    const samplesOut = excluded.get('samples')?.size ?? 0;
    const cellsOut = excluded.get('cells')?.size ?? 0;
    expect(samplesOut).toBeGreaterThan(0);
    expect(cellsOut).toBeGreaterThan(0);
    const goneStations = config.inputs.samples.flatMap((s) =>
      stationsFullyExcluded(DEMO_PATH, s.path, s.columns.station, excluded.get('samples') ?? new Set()),
    );
    expect(goneStations).toEqual(['SG2104-12']); // the station written on land (truth.json faults)
    expect(numberAt(overview, 'data-count', 'cruises')).toBe(cruises.length);
    expect(numberAt(overview, 'data-count', 'stations')).toBe(sum(cruises.map((c) => c.stations)) - goneStations.length);
    expect(numberAt(overview, 'data-count', 'samples')).toBe(sum(cruises.map((c) => c.sample_rows)) - samplesOut);
    expect(numberAt(overview, 'data-count', 'cells')).toBe(sum(cruises.map((c) => c.cell_rows)) - cellsOut);
  });

  it('index.html shows the usable cells per class from truth.json', () => {
    const classes = [...new Set(cruises.flatMap((c) => Object.keys(c.cells_by_class)))].sort();
    expect(classes.length).toBeGreaterThan(1);
    for (const cls of classes) {
      const expected = sum(cruises.map((c) => c.cells_by_class[cls] ?? 0));
      expect(numberAt(overview, 'data-class-count', cls), cls).toBe(expected);
    }
    // The generator's per-class counts already leave out the faulty cells the ledger excludes.
    const total = sum(classes.map((cls) => numberAt(overview, 'data-class-count', cls) ?? NaN));
    expect(total).toBe(sum(cruises.map((c) => c.cell_rows)) - (excluded.get('cells')?.size ?? 0));
  });

  it('every input file: data rows = used + excluded, and excluded = the ledger rows of that file', () => {
    const rows = inputFileRows(inventory);
    const inputs = [...config.inputs.samples.map((s) => s.path), ...config.inputs.cells.map((c) => c.path)];
    expect(rows.map((r) => r.file).sort()).toEqual([...inputs].sort());
    for (const r of rows) {
      const physical = countDataRows(readFileSync(join(DEMO_PATH, r.file), 'utf8'));
      const inLedger = [...(excluded.get(r.table) ?? [])].filter((key) => key.startsWith(`${r.file}:`)).length;
      expect({ file: r.file, read: r.read, sum: r.used + r.excluded, excluded: r.excluded }).toEqual({
        file: r.file,
        read: physical,
        sum: physical,
        excluded: inLedger,
      });
    }
  });

  it('every injected row-level fault of truth.json is in the ledger with its file and line', () => {
    const ledger = readFileSync(join(site, 'supplement', 'ledger.csv'), 'utf8');
    for (const fault of truth.faults) expect(ledger, fault.kind).toContain(`${fault.file},${fault.line},`);
  });

  it('building twice gives byte-identical sites', async () => {
    const again = await buildSite('data/demo', 'again');
    const first = readTree(site);
    expect(first.size).toBeGreaterThan(2);
    expect(treeDifferences(first, readTree(again))).toEqual([]);
    // The build date is the newest input time, not the clock.
    expect(overview).toMatch(/Built 2024-03-19/);
  }, 180_000);

  it('a failed build leaves the previous site in --out untouched', async () => {
    const project = withTempCopy(DEMO_PATH);
    const out = await buildSite(project, 'previous');
    const before = readTree(out);
    injectUnknownUnit(project);
    const run = await runCli(['build', project, '--out', out]);
    expect(run.code).toBe(1);
    expect(treeDifferences(before, readTree(out))).toEqual([]);
  }, 180_000);
});

describe('basinquota check', () => {
  it('check data/demo exits 0 and prints the demo faults as file:line warnings', async () => {
    const run = await runCli(['check', 'data/demo']);
    expect(run.code, run.stderr).toBe(0);
    const output = run.stdout + run.stderr;
    expect(output).toMatch(/^samples\/SG2301_bottles\.csv:41\b.*warning.*ragged-row/m);
    // check reports the rows it would exclude; values merely flagged or substituted are kept silently.
    for (const fault of truth.faults.filter((f) => f.expected_action === 'excluded')) {
      expect(output, fault.kind).toMatch(new RegExp(`^${fault.file.replace(/\./g, '\\.')}:${fault.line}\\b.*warning`, 'm'));
    }
  }, 120_000);

  it('check on a copy with an unknown unit in basinquota.yaml exits 1 and names basinquota.yaml:line', async () => {
    const project = withTempCopy(DEMO_PATH);
    injectUnknownUnit(project);
    const lines = readFileSync(join(project, 'basinquota.yaml'), 'utf8').split('\n');
    const line = lines.findIndex((l) => l.includes('nmol/kgg')) + 1;
    const run = await runCli(['check', project]);
    expect(run.code).toBe(1);
    expect(run.stdout + run.stderr).toMatch(new RegExp(`^basinquota\\.yaml:${line}(:\\d+)? .*nmol/kgg`, 'm'));
  }, 120_000);

  it('check on a copy whose samples file lacks the dFe header column exits 1 and names file:1', async () => {
    const project = withTempCopy(DEMO_PATH);
    const file = join(project, 'samples', 'SG2104_bottles.csv');
    const text = readFileSync(file, 'utf8');
    writeFileSync(file, text.replace('dFe_nmolkg,', 'dFe_removed,'));
    const run = await runCli(['check', project]);
    expect(run.code).toBe(1);
    expect(run.stdout + run.stderr).toMatch(/^samples\/SG2104_bottles\.csv:1(:\d+)? .*dFe_nmolkg/m);
  }, 120_000);
});

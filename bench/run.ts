// Benchmark: synthetic projects at 10^4 and 10^5 cells (10^6 with --full), each stage timed in-process with its peak RSS,
// and CSV ingest throughput against a raw read-and-split of the same bytes. Each size runs in its own child process so
// peak RSS belongs to that size. Usage: npm run bench [-- --full] [-- --no-grids]
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { readProject } from '../lib/cli/read-project.js';
import { Ledger } from '../lib/ledger/index.js';
import { loadTables, runPipeline, type Progress } from '../lib/pipeline/index.js';
import { generateGrids, generateProject } from './generate-project.js';

/** Timing of one stage. */
interface StageTime {
  stage: string;
  rowsIn: number;
  rowsOut: number;
  seconds: number;
  /** CPU time (user + system) of the stage, s: wall time is inflated when the machine is shared. */
  cpuSeconds: number;
  /** Peak resident set size of the process so far, MB. */
  peakRssMb: number;
}

/** What one size measured. */
interface SizeResult {
  cells: number;
  samples: number;
  csvMb: number;
  gridMb: number;
  generateSeconds: number;
  readSeconds: number;
  stages: StageTime[];
  csvIngestSeconds: number;
  rawSplitSeconds: number;
  problems: string[];
}

const peakRssMb = (): number => process.resourceUsage().maxRSS / 1024;

/** A progress sink that times each stage and notes peak RSS at its end. */
function timingSink(out: StageTime[]): Progress {
  const started = new Map<string, { wall: number; cpu: NodeJS.CpuUsage }>();
  return {
    start: (stage) => void started.set(stage, { wall: performance.now(), cpu: process.cpuUsage() }),
    end: (stage, rowsIn, rowsOut) => {
      const s = started.get(stage) ?? { wall: performance.now(), cpu: process.cpuUsage() };
      const cpu = process.cpuUsage(s.cpu);
      out.push({ stage, rowsIn, rowsOut, seconds: (performance.now() - s.wall) / 1000, cpuSeconds: (cpu.user + cpu.system) / 1e6, peakRssMb: peakRssMb() });
    },
  };
}

/** The speed reference: decode the bytes, split lines and fields by hand, count fields. */
function rawSplit(bytes: Uint8Array[]): number {
  let fields = 0;
  for (const b of bytes) {
    const text = new TextDecoder().decode(b);
    for (const line of text.split('\n')) if (line !== '') fields += line.split(',').length;
  }
  return fields;
}

function time<T>(f: () => T): [T, number] {
  const t = performance.now();
  const v = f();
  return [v, (performance.now() - t) / 1000];
}

/** Generate and measure one size (in this process). */
function measure(nCells: number, gridDir: string | null): SizeResult {
  const dir = mkdtempSync(join(tmpdir(), `bq-bench-${nCells}-`));
  try {
    const [gen, generateSeconds] = time(() => generateProject(dir, nCells, gridDir));
    const [project, readSeconds] = time(() => readProject(dir));
    if (!project.inputs) throw new Error(`benchmark project invalid: ${project.problems.map((p) => p.message).join('; ')}`);
    const inputs = project.inputs;
    const csv = ['samples.csv', 'cells.csv'].map((p) => inputs.files.get(p)?.bytes ?? new Uint8Array());
    // CSV ingest alone (decode, parse, type, ledger) on the same bytes as the raw split; best of three each.
    const ingest = Math.min(...[0, 1, 2].map(() => time(() => loadTables(inputs.config, inputs.files, new Ledger()))[1]));
    const raw = Math.min(...[0, 1, 2].map(() => time(() => rawSplit(csv))[1]));
    const stages: StageTime[] = [];
    const result = runPipeline(inputs, timingSink(stages));
    return {
      cells: gen.cells,
      samples: gen.samples,
      csvMb: gen.csvBytes / 1e6,
      gridMb: gen.gridBytes / 1e6,
      generateSeconds,
      readSeconds,
      stages,
      csvIngestSeconds: ingest,
      rawSplitSeconds: raw,
      problems: result.problems.map((p) => `${p.severity}: ${p.file}:${p.line} ${p.message}`),
    };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

function printTable(results: SizeResult[]): void {
  const lines: string[] = [];
  const row = (cols: string[]) => lines.push(`| ${cols.join(' | ')} |`);
  row(['cells', 'samples', 'CSV MB', 'grid MB', 'stage', 'rows in → out', 'wall s', 'CPU s', 'peak RSS MB']);
  row(['---:', '---:', '---:', '---:', '---', '---:', '---:', '---:', '---:']);
  for (const r of results) {
    row([String(r.cells), String(r.samples), r.csvMb.toFixed(1), r.gridMb.toFixed(0), 'read files', '', r.readSeconds.toFixed(2), '', '']);
    for (const s of r.stages) row(['', '', '', '', s.stage, `${s.rowsIn} → ${s.rowsOut}`, s.seconds.toFixed(2), s.cpuSeconds.toFixed(2), s.peakRssMb.toFixed(0)]);
    const total = r.stages.reduce((a, s) => a + s.seconds, 0);
    const cpu = r.stages.reduce((a, s) => a + s.cpuSeconds, 0);
    row(['', '', '', '', '**pipeline total**', '', total.toFixed(2), cpu.toFixed(2), r.stages.at(-1)?.peakRssMb.toFixed(0) ?? '']);
  }
  lines.push('');
  row(['cells', 'CSV MB', 'raw split s', 'CSV ingest s', 'raw MB/s', 'ingest MB/s', 'ingest % of raw']);
  row(['---:', '---:', '---:', '---:', '---:', '---:', '---:']);
  for (const r of results) {
    row([String(r.cells), r.csvMb.toFixed(1), r.rawSplitSeconds.toFixed(3), r.csvIngestSeconds.toFixed(3), (r.csvMb / r.rawSplitSeconds).toFixed(0), (r.csvMb / r.csvIngestSeconds).toFixed(1), `${((100 * r.rawSplitSeconds) / r.csvIngestSeconds).toFixed(1)} %`]);
  }
  for (const r of results) for (const p of r.problems) lines.push(`${r.cells} cells: ${p}`);
  process.stdout.write(`${lines.join('\n')}\n`);
}

const args = process.argv.slice(2);
const withGrids = !args.includes('--no-grids');
const one = args.indexOf('--one');
const gridArg = args.indexOf('--grids');
if (one >= 0) {
  process.stdout.write(JSON.stringify(measure(Number(args[one + 1]), gridArg >= 0 ? args[gridArg + 1] : null)));
} else {
  const sizes = args.includes('--full') ? [1e4, 1e5, 1e6] : [1e4, 1e5];
  process.stderr.write(`basinquota bench: ${sizes.join(', ')} cells, samples n/5, ${withGrids ? 'global 1° grids (33 depths × 12 months) of dFe and nitrate' : 'no grids'}, bootstrap n = 200, Node ${process.version}\n`);
  const self = fileURLToPath(import.meta.url);
  const gridDir = withGrids ? mkdtempSync(join(tmpdir(), 'bq-bench-grids-')) : null;
  if (gridDir) {
    const [, seconds] = time(() => generateGrids(gridDir));
    process.stderr.write(`  grids written in ${seconds.toFixed(1)} s\n`);
  }
  const results: SizeResult[] = [];
  for (const n of sizes) {
    const child = spawnSync(process.execPath, ['--import', 'tsx', '--max-old-space-size=8192', self, '--one', String(n), ...(gridDir ? ['--grids', gridDir] : [])], { encoding: 'utf8', maxBuffer: 1 << 26, stdio: ['ignore', 'pipe', 'inherit'] });
    if (child.status !== 0) {
      process.stderr.write(`size ${n} failed (exit ${child.status})\n`);
      continue;
    }
    results.push(JSON.parse(child.stdout) as SizeResult);
    process.stderr.write(`  ${n} cells done\n`);
  }
  if (gridDir) rmSync(gridDir, { recursive: true, force: true });
  printTable(results);


}

// A minimal valid synthesis project, written to a temp folder, from which every bad-input case is made by one patch.
import { mkdtempSync, mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { stringify } from 'yaml';

/** The base config as plain data; cases patch it. */
export function baseConfig(): Record<string, unknown> {
  return {
    report: { title: 'Corpus base', authors: ['A. Tester'] },
    inputs: {
      samples: [
        {
          path: 'samples.csv',
          units: { depth: 'm', temperature: 'degC', salinity: 'PSU', dissolved_fe: 'nmol/kg', nitrate: 'umol/kg' },
          flags: 'ioc',
        },
      ],
      cells: [{ path: 'cells.csv', units: { depth: 'm', fe: 'amol/cell', fe_sigma: 'amol/cell', carbon: 'fmol/cell' } }],
      regions: 'builtin-basins',
    },
    harmonise: { land_check: true },
    classes: { diatom: { aliases: ['Bacillariophyceae'], carbon: 'measured' } },
    fits: { models: ['ols'], bootstrap: { n: 0, seed: 1 }, min_cells: 3 },
  };
}

/** Bottle header of the base samples file (canonical names, so no column map is needed). */
export const SAMPLE_HEADER = 'cruise,station,time,lat,lon,depth,temperature,salinity,dissolved_fe,dissolved_fe_flag,nitrate,nitrate_flag';

/** The three open-ocean stations (North Pacific) of the base project. */
export const STATIONS: readonly { station: string; lat: number; lon: number }[] = [
  { station: 'S1', lat: 30, lon: -150 },
  { station: 'S2', lat: 32, lon: -152 },
  { station: 'S3', lat: 34, lon: -154 },
];

/** Base sample rows: two bottles per station (10 m, 50 m). */
export function sampleRows(): string[] {
  const rows: string[] = [];
  for (const [i, s] of STATIONS.entries()) {
    for (const [j, depth] of [10, 50].entries()) {
      rows.push(`CR1,${s.station},2021-05-0${i + 1}T0${j + 1}:00:00Z,${s.lat},${s.lon},${depth},15.5,34.8,${(0.1 + 0.1 * i + 0.05 * j).toFixed(2)},1,${(2 + i).toFixed(1)},1`);
    }
  }
  return rows;
}

/** Cell header of the base cells file. */
export const CELL_HEADER = 'cell_id,cruise,station,depth,phyto_class,fe,fe_sigma,carbon';

/** Base cell rows: three diatoms per bottle. */
export function cellRows(): string[] {
  const rows: string[] = [];
  let n = 0;
  for (const [i, s] of STATIONS.entries()) {
    for (const depth of [10, 50]) {
      for (let k = 0; k < 3; k++) {
        n++;
        rows.push(`c${String(n).padStart(3, '0')},CR1,${s.station},${depth},diatom,${(5 + i + k * 0.5).toFixed(2)},0.5,${(1 + k * 0.1).toFixed(2)}`);
      }
    }
  }
  return rows;
}

/** The base samples file text. */
export function samplesCsv(rows: string[] = sampleRows(), header = SAMPLE_HEADER): string {
  return `${[header, ...rows].join('\n')}\n`;
}

/** The base cells file text. */
export function cellsCsv(rows: string[] = cellRows(), header = CELL_HEADER): string {
  return `${[header, ...rows].join('\n')}\n`;
}

/** What a case changes in the base project. */
export interface ProjectPatch {
  /** Replace the config (given the base, return the config to write) — a function so nested edits are plain. */
  config?: (config: Record<string, unknown>) => Record<string, unknown>;
  /** Raw YAML text written instead of the config (syntax cases). */
  configText?: string;
  /** Files to write or replace, by relative path; strings are UTF-8, bytes are written as is. */
  files?: Record<string, string | Uint8Array>;
  /** Files of the base to leave out. */
  omit?: string[];
}

const made: string[] = [];

/** Remove every folder makeProject (and `extraDirs`) wrote in this process. */
export function removeProjects(extraDirs: readonly string[] = []): void {
  for (const dir of [...made.splice(0), ...extraDirs]) rmSync(dir, { recursive: true, force: true });
}

/** A fresh temp folder removed by removeProjects. */
export function tempDir(prefix: string): string {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  made.push(dir);
  return dir;
}

/** Write the base project with `patch` applied into a fresh temp folder; returns the folder. */
export function makeProject(patch: ProjectPatch = {}): string {
  const dir = tempDir('bq-corpus-');
  const files: Record<string, string | Uint8Array> = { 'samples.csv': samplesCsv(), 'cells.csv': cellsCsv(), ...patch.files };
  for (const name of patch.omit ?? []) delete files[name];
  const config = patch.config ? patch.config(baseConfig()) : baseConfig();
  files['basinquota.yaml'] = patch.configText ?? stringify(config);
  for (const [name, content] of Object.entries(files)) {
    const full = join(dir, name);
    mkdirSync(dirname(full), { recursive: true });
    writeFileSync(full, content);
  }
  return dir;
}

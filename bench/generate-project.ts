// Synthetic benchmark projects: n cells, n/5 bottle samples, a global 1° × 1° grid with 33 depths and 12 months of dFe and nitrate.
import { copyFileSync, mkdirSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { stringify } from 'yaml';
import { writeClassicNetcdf } from './netcdf-classic.js';

/** The 33 standard depths (m) of World Ocean Atlas climatologies. */
export const STANDARD_DEPTHS = [0, 10, 20, 30, 50, 75, 100, 125, 150, 200, 250, 300, 400, 500, 600, 700, 800, 900, 1000, 1100, 1200, 1300, 1400, 1500, 1750, 2000, 2500, 3000, 3500, 4000, 4500, 5000, 5500];

/** Seeded uniform numbers in [0, 1) (mulberry32). */
function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A smooth field: value at lon, lat, depth, month for one quantity. */
const field = (q: 'dfe' | 'no3', lon: number, lat: number, depth: number, month: number): number =>
  q === 'dfe'
    ? 0.05 + 0.4 * (1 - Math.exp(-depth / 500)) + 0.1 * Math.cos((lat * Math.PI) / 90) + 0.02 * Math.sin((month * Math.PI) / 6) + 0.01 * Math.sin((lon * Math.PI) / 180)
    : 2 + 30 * (1 - Math.exp(-depth / 400)) + 10 * Math.abs(Math.sin((lat * Math.PI) / 180)) + Math.cos((month * Math.PI) / 6);

/** Write one global grid file. */
function writeGrid(path: string, q: 'dfe' | 'no3'): void {
  const lon = Array.from({ length: 360 }, (_, i) => -179.5 + i);
  const lat = Array.from({ length: 180 }, (_, j) => -89.5 + j);
  const time = Array.from({ length: 12 }, (_, m) => 15 + 30.4 * m);
  const values = new Float32Array(12 * 33 * 180 * 360);
  let k = 0;
  for (let m = 0; m < 12; m++) for (const z of STANDARD_DEPTHS) for (const y of lat) for (const x of lon) values[k++] = field(q, x, y, z, m + 1);
  const bytes = writeClassicNetcdf({ time: 12, depth: 33, lat: 180, lon: 360 }, [
    { name: 'time', dims: ['time'], type: 'double', attributes: { standard_name: 'time', units: 'days since 2000-01-01', calendar: 'standard', climatology: 'climatology_bounds' }, values: time },
    { name: 'depth', dims: ['depth'], type: 'double', attributes: { standard_name: 'depth', units: 'm', positive: 'down' }, values: STANDARD_DEPTHS },
    { name: 'lat', dims: ['lat'], type: 'double', attributes: { standard_name: 'latitude', units: 'degrees_north' }, values: lat },
    { name: 'lon', dims: ['lon'], type: 'double', attributes: { standard_name: 'longitude', units: 'degrees_east' }, values: lon },
    { name: q, dims: ['time', 'depth', 'lat', 'lon'], type: 'float', attributes: { units: q === 'dfe' ? 'nmol/kg' : 'umol/kg' }, values },
  ]);
  writeFileSync(path, bytes);
}

/** What was written. */
export interface GeneratedProject {
  /** Project folder. */
  dir: string;
  /** Cells and samples written. */
  cells: number;
  samples: number;
  /** Bytes of the two CSV files, and of the grids. */
  csvBytes: number;
  gridBytes: number;
}

/** Write the two global grids (dfe.nc, no3.nc) into `dir` once; every size copies them. */
export function generateGrids(dir: string): void {
  writeGrid(join(dir, 'dfe.nc'), 'dfe');
  writeGrid(join(dir, 'no3.nc'), 'no3');
}

/** Write a benchmark project of `nCells` cells into `dir`, copying the grids from `gridDir` (none when null); bootstrap n = 200 keeps the fits stage short. */
export function generateProject(dir: string, nCells: number, gridDir: string | null): GeneratedProject {
  const withGrids = gridDir !== null;
  mkdirSync(dir, { recursive: true });
  const rnd = random(nCells);
  const bottlesPerStation = 12;
  const nSamples = Math.max(bottlesPerStation, Math.round(nCells / 5));
  const nStations = Math.ceil(nSamples / bottlesPerStation);
  const samples: string[] = ['cruise,station,cast,bottle,time,lat,lon,depth,temperature,salinity,dissolved_fe,dissolved_fe_flag,nitrate,nitrate_flag'];
  const stations: { cruise: string; station: string; lat: number; lon: number }[] = [];
  for (let s = 0; s < nStations; s++) {
    // Open Pacific, well away from land.
    const st = { cruise: `CR${1 + (s % 8)}`, station: `S${s}`, lat: -40 + 80 * rnd(), lon: -170 + 50 * rnd() };
    stations.push(st);
    const month = 1 + (s % 12);
    for (let b = 0; b < bottlesPerStation && samples.length <= nSamples; b++) {
      const z = STANDARD_DEPTHS[b];
      const fe = field('dfe', st.lon, st.lat, z, month) * (0.8 + 0.4 * rnd());
      const no3 = field('no3', st.lon, st.lat, z, month) * (0.9 + 0.2 * rnd());
      samples.push(`${st.cruise},${st.station},1,${b + 1},2021-${String(month).padStart(2, '0')}-15T06:00:00Z,${st.lat.toFixed(4)},${st.lon.toFixed(4)},${z},${(20 - z / 20).toFixed(2)},34.${Math.floor(rnd() * 900 + 100)},${fe.toFixed(4)},1,${no3.toFixed(3)},1`);
    }
  }
  const cells: string[] = ['cell_id,cruise,station,depth,phyto_class,fe,fe_sigma,p,p_sigma,carbon'];
  const classes = ['diatom', 'haptophyte', 'dinoflagellate'];
  for (let i = 0; i < nCells; i++) {
    const st = stations[Math.floor(rnd() * nStations)];
    // One cell in ten below the bottles, so it is matched from the grid.
    const z = rnd() < 0.1 ? 300 : STANDARD_DEPTHS[Math.floor(rnd() * bottlesPerStation)];
    const fe = 10 ** (0.5 + 0.5 * Math.log10(field('dfe', st.lon, st.lat, z, 6)) + 0.2 * (rnd() - 0.5));
    const c = 1 + rnd();
    cells.push(`c${i},${st.cruise},${st.station},${z},${classes[i % 3]},${(fe * c).toFixed(4)},${(0.1 * fe * c).toFixed(4)},${(10 * c).toFixed(3)},${c.toFixed(3)},${c.toFixed(4)}`);
  }
  const samplesText = `${samples.join('\n')}\n`;
  const cellsText = `${cells.join('\n')}\n`;
  writeFileSync(join(dir, 'samples.csv'), samplesText);
  writeFileSync(join(dir, 'cells.csv'), cellsText);
  let gridBytes = 0;
  if (gridDir) {
    for (const f of ['dfe.nc', 'no3.nc']) {
      copyFileSync(join(gridDir, f), join(dir, f));
      gridBytes += statSync(join(dir, f)).size;
    }
  }
  const config = {
    report: { title: `Benchmark, ${nCells} cells`, authors: ['Bench'] },
    inputs: {
      samples: [{ path: 'samples.csv', units: { depth: 'm', temperature: 'degC', salinity: 'PSU', dissolved_fe: 'nmol/kg', nitrate: 'umol/kg' } }],
      cells: [{ path: 'cells.csv', units: { depth: 'm', fe: 'amol/cell', fe_sigma: 'amol/cell', p: 'fmol/cell', p_sigma: 'fmol/cell', carbon: 'pmol/cell' } }],
      grids: withGrids
        ? [
            { path: 'dfe.nc', quantity: 'dissolved_fe', variable: 'dfe' },
            { path: 'no3.nc', quantity: 'nitrate', variable: 'no3' },
          ]
        : [],
      regions: 'builtin-basins',
    },
    classes: { diatom: { carbon: 'measured' }, haptophyte: { carbon: 'measured' }, dinoflagellate: { carbon: 'measured' } },
    fits: { bootstrap: { n: 200, seed: 1 } },
  };
  writeFileSync(join(dir, 'basinquota.yaml'), stringify(config));
  return { dir, cells: nCells, samples: samples.length - 1, csvBytes: Buffer.byteLength(samplesText) + Buffer.byteLength(cellsText), gridBytes };
}

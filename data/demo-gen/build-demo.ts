/** The whole demo project as text files in memory: bottle and cell files, grids, configs and the truth. */
import { makeBottles, type Bottle } from './bottles.js';
import { cellLayout } from './cell-formats.js';
import { depthKey, makeCells, type Cell } from './cells.js';
import { gridToCdl } from '../tools/grid-to-cdl.js';
import { configYaml, type CruiseInputs, type GridInput } from './config-yaml.js';
import { delimitedText } from './delimited-text.js';
import { SAMPLE_FAULTS, SWAPPED_STATION, injectCellFaults, injectSampleFaults, locateFaults, type CellRow, type FaultRecord, type SampleRow } from './faults.js';
import { makeRng } from './rng.js';
import { rotateLon360 } from './rotate-lon-360.js';
import { sampleLayout } from './sample-formats.js';
import { CRUISES, type Cruise } from './scenario.js';
import { silicateCsvGrid } from './silicate-csv-grid.js';
import { stableJson } from './stable-json.js';
import { GRID_DEPTHS, truthGrid } from './truth-grid.js';
import { truthCellsCsv, truthJson, type CruiseCounts } from './truth-file.js';

/** Seed value of the demo's random streams; each cruise draws from its own stream derived from it. */
export const RANDOM_SEED = 20240611;

/** Everything the generator writes: text files by path (relative to the demo folder) and the CDL files to turn into NetCDF. */
export interface DemoFiles {
  /** Path → file text, including the .cdl sources. */
  text: Map<string, string>;
  /** CDL paths each to be compiled into the .nc path beside it. */
  netcdf: { cdl: string; nc: string }[];
}

/** One cruise's generated rows and what the truth file needs from them. */
interface CruiseOutput {
  inputs: CruiseInputs;
  cells: Cell[];
  cellFaultKinds: Map<Cell, string>;
  faults: FaultRecord[];
  counts: CruiseCounts;
}

function buildCruise(cruise: Cruise, index: number, files: Map<string, string>): CruiseOutput {
  const layout = sampleLayout(cruise);
  const swapped = cruise.id === SWAPPED_STATION.cruise;
  const withExtra: Cruise = swapped ? { ...cruise, stations: [...cruise.stations, SWAPPED_STATION.intended] } : cruise;
  const bottles = makeBottles(withExtra, makeRng(RANDOM_SEED + 1000 * index + 1));
  const columns = Object.keys(layout.columns);
  const header = Object.values(layout.columns);
  const rows: SampleRow[] = bottles.map((bottle) => ({ fields: layout.fields(bottle), bottle }));
  const extraRows = rows.filter((r) => r.bottle.stationIndex === cruise.stations.length);
  const [iLat, iLon] = [columns.indexOf('lat'), columns.indexOf('lon')];
  for (const r of extraRows) [r.fields[iLat], r.fields[iLon]] = [r.fields[iLon], r.fields[iLat]];
  const pendingSamples = injectSampleFaults(cruise.id, rows, columns);
  const samplePath = `samples/${cruise.id}_bottles.${layout.ext}`;
  files.set(samplePath, delimitedText(header, rows, layout.delimiter));
  const faults = locateFaults(samplePath, rows, pendingSamples);
  if (extraRows.length) {
    const lines = extraRows.map((r) => rows.indexOf(r) + 2);
    const [lat, lon] = SWAPPED_STATION.intended;
    faults.push({
      file: samplePath, line: lines[0], lines, kind: 'swapped-position', expected_reason: SWAPPED_STATION.reason, expected_action: 'excluded',
      detail: `${extraRows[0].bottle.station}: intended ${lat} N, ${lon} E written with latitude and longitude swapped (${lon}, ${lat}), which is on land in southern Africa; no cells`,
    });
  }

  const cl = cellLayout(cruise);
  const avoid = new Set(SAMPLE_FAULTS.filter((f) => f.cruise === cruise.id && f.depth <= 100).map((f) => depthKey(f.station, f.depth)));
  const realBottles: Bottle[] = bottles.filter((b) => b.stationIndex < cruise.stations.length);
  const cells = makeCells(cruise, realBottles, { readBackFe: layout.readBackFe, contentUnitMol: cl.contentUnitMol, avoid, cellId: (s, d, k) => cl.cellId(cruise.id, s, d, k) }, makeRng(RANDOM_SEED + 1000 * index + 2));
  const cellRows: CellRow[] = cells.map((cell) => ({ fields: cl.fields(cell), cell, fault: '' }));
  const pendingCells = injectCellFaults(cruise.id, cellRows, Object.keys(cl.columns));
  const cellPath = `cells/${cruise.id}_cells.csv`;
  files.set(cellPath, delimitedText(Object.values(cl.columns), cellRows, ','));
  faults.push(...locateFaults(cellPath, cellRows, pendingCells));

  const cellFaultKinds = new Map(cellRows.filter((r) => r.fault).map((r) => [r.cell, r.fault]));
  const byClass: Record<string, number> = {};
  for (const r of cellRows) if (!r.fault) byClass[r.cell.phytoClass] = (byClass[r.cell.phytoClass] ?? 0) + 1;
  const excludedSamples = faults.filter((f) => f.file === samplePath && f.expected_action === 'excluded').reduce((n, f) => n + (f.lines?.length ?? 1), 0);
  const counts: CruiseCounts = {
    stations: withExtra.stations.length,
    stations_at_sea: cruise.stations.length,
    sample_file: samplePath,
    sample_rows: rows.length,
    sample_rows_excluded: excludedSamples,
    cell_file: cellPath,
    cell_rows: cellRows.length,
    cells_excluded: cellFaultKinds.size,
    cells_by_class: byClass,
    held_back: cruise.heldBack,
  };
  const detectionLimits: Record<string, number> = SAMPLE_FAULTS.some((f) => f.cruise === cruise.id && f.kind === 'below-detection') ? { dissolved_fe: 0.02 } : {};
  return {
    inputs: {
      cruise,
      samples: { path: samplePath, columns: layout.columns, units: layout.units, flags: layout.flags, detectionLimits },
      cells: { path: cellPath, columns: cl.columns, units: cl.units },
    },
    cells,
    cellFaultKinds,
    faults,
    counts,
  };
}

/** Grid inputs of the demo and their files. */
function buildGrids(files: Map<string, string>, netcdf: DemoFiles['netcdf']): GridInput[] {
  // dFe is written per litre so that its CF standard name (a per-volume concentration) is honest; the reader converts
  // with its default density, hence the factor 1.025 kg/L here. Its longitudes run 0–360.
  const specs = [
    { name: 'dfe_climatology', quantity: 'dissolved_fe', variable: 'dfe', units: 'nmol/kg', cfUnits: 'nmol L-1', scale: 1.025, longName: 'dissolved iron', standardName: 'mole_concentration_of_dissolved_iron_in_sea_water', lon360: true },
    { name: 'nitrate_climatology', quantity: 'nitrate', variable: 'nitrate', units: 'µmol/kg', cfUnits: 'umol kg-1', scale: 1, longName: 'nitrate', standardName: 'moles_of_nitrate_per_unit_mass_in_sea_water', lon360: false },
    { name: 'phosphate_climatology', quantity: 'phosphate', variable: 'phosphate', units: 'µmol/kg', cfUnits: 'umol kg-1', scale: 1, longName: 'phosphate', standardName: 'moles_of_phosphate_per_unit_mass_in_sea_water', lon360: false },
  ] as const;
  const out: GridInput[] = [];
  for (const s of specs) {
    const cdl = `grids/${s.name}.cdl`;
    const nc = `grids/${s.name}.nc`;
    const grid = truthGrid(s.quantity, { stepDeg: 5, depths: GRID_DEPTHS, units: s.units, source: nc, variable: s.variable, scale: s.scale });
    files.set(cdl, gridToCdl(s.lon360 ? rotateLon360(grid) : grid, {
      title: `Demo ${s.longName} climatology, 5 degree grid`,
      variableName: s.variable,
      standardName: s.standardName,
      units: s.cfUnits,
      longName: `${s.longName}, monthly climatology (invented demo field)`,
      datasetName: s.name,
      climatologyYears: [2000, 2020],
      globalAttributes: {
        comment: 'Invented field for the basinquota demo, sampled from the same smooth truth fields as the demo bottles; land is _FillValue.',
        source: 'data/generate-demo.ts (seeded, invented demo data)',
      },
    }));
    netcdf.push({ cdl, nc });
    out.push({ path: nc, quantity: s.quantity, variable: s.variable, note: `${s.longName}: 5° grid, 10 depths, 12 months${s.lon360 ? '; in nmol/L with longitudes 0–360' : ''}.` });
  }
  const csv = 'grids/silicate_10deg.csv';
  files.set(csv, silicateCsvGrid());
  out.push({ path: csv, quantity: 'silicate', units: 'µmol/kg', note: 'silicate as a plain CSV grid (lon, lat, depth, month, value): 10° grid, 4 depths; land nodes have an empty value.' });
  return out;
}

/** Generate the whole demo project in memory; the same code always gives the same text. */
export function buildDemo(): DemoFiles {
  const text = new Map<string, string>();
  const netcdf: DemoFiles['netcdf'] = [];
  const outputs = CRUISES.map((c, i) => buildCruise(c, i, text));
  const grids = buildGrids(text, netcdf);
  const inputs = outputs.map((o) => o.inputs);
  text.set('basinquota.yaml', configYaml(inputs, grids, 2));
  text.set('basinquota.v1.yaml', configYaml(inputs, grids, 1));
  const cells = outputs.flatMap((o) => o.cells);
  const faultKinds = new Map(outputs.flatMap((o) => [...o.cellFaultKinds]));
  text.set('truth-cells.csv', truthCellsCsv(cells, faultKinds));
  const counts = Object.fromEntries(outputs.map((o) => [o.inputs.cruise.id, o.counts]));
  text.set('truth.json', stableJson(truthJson({ randomSeed: RANDOM_SEED, cells, faults: outputs.flatMap((o) => o.faults), counts, grids })));
  return { text, netcdf };
}

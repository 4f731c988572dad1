/** truth.json and truth-cells.csv: the relationships the demo was generated from, the faults and the expected counts. */
import type { Cell } from './cells.js';
import type { GridInput } from './config-yaml.js';
import type { FaultRecord } from './faults.js';
import { fixed, sig } from './format.js';
import { CROSSOVER_PAIRS, CRUISES, PROGRAMME, SHIPS, stationName } from './scenario.js';
import {
  BIOVOLUME, CELL_SD_LOG10, CLASSES, CLASS_LAWS, CLASS_WEIGHTS, CROSSOVER_OFFSET, LOW_IRON_BOX, REDFIELD_C_P, STATION_SD_LOG10, inLowIronBox,
} from './truth-model.js';

/** Expected counts for one cruise, read by the end-to-end tests. */
export interface CruiseCounts {
  /** Stations written in the bottle file (including the swapped-position one). */
  stations: number;
  /** Stations at sea (the ones cells come from). */
  stations_at_sea: number;
  /** Bottle file. */
  sample_file: string;
  /** Data rows in the bottle file (header excluded). */
  sample_rows: number;
  /** Bottle rows the tool should exclude (faults with action excluded, counted per row). */
  sample_rows_excluded: number;
  /** Cell file. */
  cell_file: string;
  /** Data rows in the cell file. */
  cell_rows: number;
  /** Cell rows the tool should exclude. */
  cells_excluded: number;
  /** Usable cells per true class. */
  cells_by_class: Record<string, number>;
  /** Only in version 2. */
  held_back: boolean;
}

/** Great-circle distance in km (haversine, mean Earth radius 6371.0088 km). */
function distanceKm(a: readonly [number, number], b: readonly [number, number]): number {
  const r = Math.PI / 180;
  const h = Math.sin(((b[0] - a[0]) * r) / 2) ** 2 + Math.cos(a[0] * r) * Math.cos(b[0] * r) * Math.sin(((b[1] - a[1]) * r) / 2) ** 2;
  return 2 * 6371.0088 * Math.asin(Math.sqrt(h));
}

const CARBON_METHOD = { diatom: 'biovolume-diatom', dinoflagellate: 'biovolume-protist', haptophyte: 'biovolume-protist', cyanobacteria: 'phosphorus' } as const;

/** Inputs of truthJson. */
export interface TruthInputs {
  /** Seed value of the random streams. */
  randomSeed: number;
  /** Every generated cell. */
  cells: readonly Cell[];
  /** Every injected fault. */
  faults: readonly FaultRecord[];
  /** Counts per cruise. */
  counts: Record<string, CruiseCounts>;
  /** Grid inputs. */
  grids: readonly GridInput[];
}

/** The truth.json object (keys sorted when written). */
export function truthJson(t: TruthInputs): Record<string, unknown> {
  const byCruise = new Map(CRUISES.map((c) => [c.id, c]));
  const boxCells = t.cells.filter((c) => inLowIronBox(c.lat, c.lon));
  const boxStations = [...new Set(boxCells.map((c) => c.station))].sort();
  const totals = { cruises: CRUISES.length, stations: 0, stations_at_sea: 0, sample_rows: 0, cell_rows: 0, cells_excluded: 0, cells_by_class: {} as Record<string, number> };
  for (const c of Object.values(t.counts)) {
    totals.stations += c.stations;
    totals.stations_at_sea += c.stations_at_sea;
    totals.sample_rows += c.sample_rows;
    totals.cell_rows += c.cell_rows;
    totals.cells_excluded += c.cells_excluded;
    for (const [k, n] of Object.entries(c.cells_by_class)) totals.cells_by_class[k] = (totals.cells_by_class[k] ?? 0) + n;
  }
  return {
    description: 'Truth of the invented basinquota demo: everything in data/demo was generated from these relationships by data/generate-demo.ts.',
    random_seed: t.randomSeed,
    programme: PROGRAMME,
    ships: SHIPS.map((s) => ({ code: s.code, name: s.name })),
    cruises: CRUISES.map((c) => ({ id: c.id, ship: c.ship, basin: c.basin, start: c.start, held_back: c.heldBack, stations: c.stations.map((p, i) => ({ station: stationName(c.id, i), lat: p[0], lon: p[1] })) })),
    versions: { '1': CRUISES.filter((c) => !c.heldBack).map((c) => c.id), '2': CRUISES.map((c) => c.id) },
    fe_c_law: {
      form: 'log10(Fe:C [umol/mol]) = intercept + exponent * log10(dFe [nmol/kg]) + station effect + cell scatter (+ region offset)',
      classes: Object.fromEntries(CLASSES.map((k) => [k, {
        intercept: Number(CLASS_LAWS[k].intercept.toFixed(6)),
        fe_c_at_1_nmol_kg: Number((10 ** CLASS_LAWS[k].intercept).toPrecision(6)),
        exponent: CLASS_LAWS[k].exponent,
        carbon_method: CARBON_METHOD[k],
        biovolume_median_um3: BIOVOLUME[k].median,
      }])),
      station_effect_sd_log10: STATION_SD_LOG10,
      cell_scatter_sd_log10: CELL_SD_LOG10,
      ambient_dfe: 'dFe of the same station\'s bottle at exactly the cell depth, as read from the bottle file (per-litre values divided by EOS-80 in-situ density from the written T, S and pressure)',
      carbon: 'diatoms log10 pgC = -0.541 + 0.811 log10 V; other protists log10 pgC = -0.665 + 0.939 log10 V (Menden-Deuer & Lessard 2000); pg C / 12.011 / 1e12 = mol; cyanobacteria C = 106 P; V from the written biovolume or from the written shape and dimensions',
    },
    class_weights_by_basin: CLASS_WEIGHTS,
    low_iron_region: {
      ...LOW_IRON_BOX,
      fold: Number((10 ** LOW_IRON_BOX.offset_log10).toFixed(4)),
      stations: boxStations,
      cells: boxCells.length,
    },
    crossover: {
      ...CROSSOVER_OFFSET,
      applies: 'added to every dFe value of the cruise at depths >= min_depth_m (bottles at 1000, 1500, 2500 and 4000 m)',
      pairs: CROSSOVER_PAIRS.map(({ a, b }) => {
        const pa = byCruise.get(a[0])!.stations[a[1]];
        const pb = byCruise.get(b[0])!.stations[b[1]];
        return { a: stationName(a[0], a[1]), b: stationName(b[0], b[1]), distance_km: Number(distanceKm(pa, pb).toFixed(1)) };
      }),
    },
    redfield_c_p: REDFIELD_C_P,
    faults: [...t.faults].sort((x, y) => (x.file < y.file ? -1 : x.file > y.file ? 1 : x.line - y.line)),
    counts: { cruises: t.counts, totals },
    grids: t.grids.map((g) => ({ path: g.path, quantity: g.quantity, ...(g.variable ? { variable: g.variable } : {}) })),
  };
}

/** truth-cells.csv: per cell the true class, ambient dFe, Fe:C and carbon, and any injected fault. */
export function truthCellsCsv(cells: readonly Cell[], faults: ReadonlyMap<Cell, string>): string {
  const lines = ['cell_id,cruise,station,depth_m,class,in_low_iron_box,ambient_dfe_nmol_kg,station_effect_log10,true_fe_c_umol_mol,true_carbon_mol,fault'];
  for (const c of cells) {
    lines.push([c.cellId, c.cruise, c.station, fixed(c.depth, 0), c.phytoClass, inLowIronBox(c.lat, c.lon) ? 'true' : 'false', sig(c.ambientFe, 6), fixed(c.stationEffect, 4), sig(c.feC, 6), sig(c.carbon, 6), faults.get(c) ?? ''].join(','));
  }
  return `${lines.join('\n')}\n`;
}

/** Single cells for one cruise: class, size, true Fe:C from the class power law, and contents back-computed from carbon. */
import { biovolumeFromShape, type CellShape } from '../../lib/quotas/biovolume-from-shape.js';
import type { Bottle } from './bottles.js';
import { roundTo, sig } from './format.js';
import type { Rng } from './rng.js';
import { CELL_DEPTHS, type Cruise } from './scenario.js';
import {
  BIOVOLUME, CELL_SD_LOG10, CLASS_LABELS, CLASS_LAWS, CLASS_WEIGHTS, CYANO_FG_C_PER_UM3, LOW_IRON_BOX, OTHER_METALS, REDFIELD_C_P,
  STATION_SD_LOG10, carbonMolFromVolume, inLowIronBox, type PhytoClass,
} from './truth-model.js';

/** One generated cell in canonical units, with its truth. */
export interface Cell {
  /** Cell id as written. */
  cellId: string;
  /** Cruise id. */
  cruise: string;
  /** Station name. */
  station: string;
  /** Station latitude, degrees north. */
  lat: number;
  /** Station longitude, degrees east. */
  lon: number;
  /** Sampling depth, m: always one of the cast's bottle depths. */
  depth: number;
  /** True canonical class. */
  phytoClass: PhytoClass;
  /** Class label as written in the file. */
  label: string;
  /** Biovolume (µm³) as written, or NaN when the cell is described by shape and dimensions. */
  biovolume: number;
  /** Shape text, or '' when biovolume is given. */
  shape: string;
  /** Length (µm) as written, or NaN. */
  length: number;
  /** Width (µm) as written, or NaN. */
  width: number;
  /** True when the file also gives a measured carbon (equal to the true carbon). */
  carbonMeasured: boolean;
  /** True carbon, mol/cell, from the class's carbon method applied to the written size or P. */
  carbon: number;
  /** Ambient dFe (nmol/kg): the station's bottle at the cell depth, as read from the bottle file. */
  ambientFe: number;
  /** Station random effect on log10 Fe:C. */
  stationEffect: number;
  /** True Fe:C, µmol/mol. */
  feC: number;
  /** Contents in mol/cell and their 1-sigma uncertainties. */
  contents: Record<'fe' | 'p' | 'mn' | 'zn', { value: number; sigma: number }>;
}

/** Shape each class is measured as when a cell is sized from an image rather than given a biovolume. */
const SHAPES: Readonly<Record<PhytoClass, { shape: CellShape; text: string } | null>> = {
  diatom: { shape: 'cylinder', text: 'cylinder' },
  dinoflagellate: { shape: 'prolate-spheroid', text: 'prolate spheroid' },
  haptophyte: { shape: 'sphere', text: 'sphere' },
  cyanobacteria: null,
};

/** Options of makeCells. */
export interface MakeCellsOptions {
  /** dFe (nmol/kg) of a bottle as the tool will read it from the written file. */
  readBackFe: (bottle: Bottle) => number;
  /** Size of the file's content unit in mol/cell (1e-15 for fmol/cell), so P is rounded as it will be written. */
  contentUnitMol: number;
  /** Stations (0-based) and depths not to sample cells at (bottles with a censored or faulty dFe). */
  avoid: ReadonlySet<string>;
  /** Cell id from station index, depth and cell number. */
  cellId: (stationIndex: number, depth: number, k: number) => string;
}

/** Key of a station and depth in `avoid`. */
export function depthKey(stationIndex: number, depth: number): string {
  return `${stationIndex}@${depth}`;
}

function lognormal(rng: Rng, median: number, sdLog10: number): number {
  return median * 10 ** rng.normal(0, sdLog10);
}

/** Size a cell: either a written biovolume or a shape with written dimensions; returns the volume the tool will compute. */
function drawSize(rng: Rng, cls: PhytoClass): Pick<Cell, 'biovolume' | 'shape' | 'length' | 'width'> & { volume: number } {
  const v = lognormal(rng, BIOVOLUME[cls].median, BIOVOLUME[cls].sdLog10);
  const shape = SHAPES[cls];
  if (shape === null || rng.uniform() >= 0.15) {
    const written = Number(sig(v, 4));
    return { biovolume: written, shape: '', length: NaN, width: NaN, volume: written };
  }
  let length: number;
  let width: number;
  if (shape.shape === 'sphere') {
    length = roundTo(Math.cbrt((6 * v) / Math.PI), 2);
    width = NaN;
  } else {
    const aspect = rng.between(1.2, shape.shape === 'cylinder' ? 3 : 1.8);
    const k = shape.shape === 'cylinder' ? Math.PI / 4 : Math.PI / 6;
    width = roundTo(Math.cbrt(v / (k * aspect)), 2);
    length = roundTo(width * aspect, 2);
  }
  const volume = biovolumeFromShape(shape.shape, { length, width: Number.isNaN(width) ? undefined : width });
  return { biovolume: NaN, shape: shape.text, length, width, volume };
}

/** Cells of every station of a cruise at 2–3 bottle depths in the upper 100 m. */
export function makeCells(cruise: Cruise, bottles: readonly Bottle[], options: MakeCellsOptions, rng: Rng): Cell[] {
  const out: Cell[] = [];
  const weights = CLASS_WEIGHTS[cruise.basin];
  cruise.stations.forEach(([lat, lon], s) => {
    const stationEffect = rng.normal(0, STATION_SD_LOG10);
    const regional = inLowIronBox(lat, lon) ? LOW_IRON_BOX.offset_log10 : 0;
    const candidates = CELL_DEPTHS.filter((d) => !options.avoid.has(depthKey(s, d)));
    const nDepths = rng.int(2, 3);
    const depths: number[] = [];
    while (depths.length < nDepths) {
      const d = candidates[rng.int(0, candidates.length - 1)];
      if (!depths.includes(d)) depths.push(d);
    }
    depths.sort((a, b) => a - b);
    for (const depth of depths) {
      const bottle = bottles.find((b) => b.stationIndex === s && b.depth === depth)!;
      const ambientFe = options.readBackFe(bottle);
      const n = rng.int(6, 15);
      for (let k = 0; k < n; k++) {
        const cls = rng.pick(weights);
        const labels = CLASS_LABELS[cls];
        // The plain class name is the most common label; the others appear now and then.
        const label = rng.uniform() < 0.55 ? labels[0] : labels[rng.int(0, labels.length - 1)];
        const size = drawSize(rng, cls);
        const law = CLASS_LAWS[cls];
        const logFeC = law.intercept + law.exponent * Math.log10(ambientFe) + stationEffect + regional + rng.normal(0, CELL_SD_LOG10);
        const feC = 10 ** logFeC;
        let carbon: number;
        let p: number;
        if (cls === 'cyanobacteria') {
          const drawnCarbon = (CYANO_FG_C_PER_UM3 * size.volume * 1e-15) / 12.011;
          p = Number(sig(drawnCarbon / REDFIELD_C_P / options.contentUnitMol, 6)) * options.contentUnitMol;
          carbon = p * REDFIELD_C_P;
        } else {
          carbon = carbonMolFromVolume(size.volume, cls === 'diatom');
          p = carbon / (REDFIELD_C_P * 10 ** rng.normal(0, 0.1));
        }
        const sigmaOf = (value: number) => value * rng.between(0.1, 0.2);
        const metal = (m: keyof typeof OTHER_METALS) => lognormal(rng, OTHER_METALS[m].median, OTHER_METALS[m].sdLog10) * 1e-6 * carbon;
        const fe = feC * 1e-6 * carbon;
        const mn = metal('mn');
        const zn = metal('zn');
        out.push({
          cellId: options.cellId(s, depth, k + 1),
          cruise: cruise.id,
          station: bottle.station,
          lat,
          lon,
          depth,
          phytoClass: cls,
          label,
          ...size,
          carbonMeasured: rng.uniform() < 0.05,
          carbon,
          ambientFe,
          stationEffect,
          feC,
          contents: { fe: { value: fe, sigma: sigmaOf(fe) }, p: { value: p, sigma: sigmaOf(p) }, mn: { value: mn, sigma: sigmaOf(mn) }, zn: { value: zn, sigma: sigmaOf(zn) } },
        });
      }
    }
  });
  return out;
}

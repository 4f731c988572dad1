import { randomLcg, randomNormal } from 'd3-random';
import type { FitInput } from '../../lib/fits/index.js';

/** A class of the generated table: log10 Fe:C = a + b·log10 dFe, with log-normal measurement errors in both. */
export interface TrueClass {
  name: string;
  a: number;
  b: number;
  cellsPerStation: number;
  stations: number;
  /** Relative 1-σ error of Fe:C (stated in feCSigma and used to draw the scatter). */
  feCRelSigma: number;
}

/** Seeded cell table: stations with log-uniform dFe 0.05–2 nmol/kg, dFe observed with 10 % relative error. */
export function generateCells(classes: TrueClass[], seed: number): FitInput & { dFe: number[]; feC: number[]; feCSigma: number[] } {
  const rng = randomLcg(seed);
  const z = randomNormal.source(rng)(0, 1);
  const out = { cellClass: [] as string[], station: [] as string[], dFe: [] as number[], feC: [] as number[], feCSigma: [] as number[] };
  for (const c of classes) {
    for (let s = 0; s < c.stations; s++) {
      const trueLx = Math.log10(0.05) + rng() * Math.log10(40);
      for (let k = 0; k < c.cellsPerStation; k++) {
        const lx = trueLx + (0.1 / Math.LN10) * z();
        const ly = c.a + c.b * trueLx + (c.feCRelSigma / Math.LN10) * z();
        out.cellClass.push(c.name);
        out.station.push(`st${String(s).padStart(3, '0')}`);
        out.dFe.push(10 ** lx);
        out.feC.push(10 ** ly);
        out.feCSigma.push(c.feCRelSigma * 10 ** ly);
      }
    }
  }
  return out;
}

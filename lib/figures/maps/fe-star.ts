// Fe* (excess iron relative to phosphate), cell by cell from a dFe grid and a phosphate grid on the same lattice.
import type { Grid } from '../../types.js';

/**
 * Fe* = dFe − R_Fe:P · PO₄ (Parekh et al. 2005, Global Biogeochem. Cycles 19, GB2020, doi:10.1029/2004GB002280).
 * dFe in nmol kg⁻¹, PO₄ in µmol kg⁻¹ and R_Fe:P in mmol mol⁻¹ give Fe* in nmol kg⁻¹ (mmol/mol · µmol/kg = nmol/kg).
 * Throws if the grids do not share one lattice; NaN where either input is missing.
 */
export function feStarGrid(dfe: Grid, phosphate: Grid, rFePmmolPerMol: number): Grid {
  const same = (a: Float64Array, b: Float64Array) => a.length === b.length && a.every((v, i) => Math.abs(v - b[i]) < 1e-9);
  if (!same(dfe.lon, phosphate.lon) || !same(dfe.lat, phosphate.lat) || !same(dfe.depth, phosphate.depth) || !same(dfe.time, phosphate.time)) {
    throw new Error(`Fe*: ${dfe.source} and ${phosphate.source} are on different grids; regrid one onto the other first`);
  }
  const values = new Float32Array(dfe.values.length);
  for (let i = 0; i < values.length; i++) values[i] = dfe.values[i] - rFePmmolPerMol * phosphate.values[i];
  return { ...dfe, quantity: 'fe_star', units: 'nmol/kg', values, variable: 'fe_star', source: `${dfe.source} − R·${phosphate.source}` };
}

// Read every configured gridded field (NetCDF or CSV grid) into canonical-unit Grids.
import type { Config } from '../config/index.js';
import { readCsvGrid, readNetcdfGrid, type ToCanonical } from '../grids/index.js';
import type { Ledger } from '../ledger/index.js';
import { decodeUtf8 } from '../load/index.js';
import type { Grid, InputBytes, Problem } from '../types.js';
import { depthFromPressure, unitConversion } from '../units/index.js';
import { stageProblem } from './stage-problem.js';

/** A grid with the quantity it stands for. */
export interface QuantityGrid {
  /** Canonical quantity. */
  quantity: string;
  /** The field. */
  grid: Grid;
}

/** Unit converter for grids built on the shared unit parser; per-volume units use the config's default density (ledgered by the reader). */
function gridUnits(quantity: string, file: string, density: number): ToCanonical {
  return (unitsText) => {
    try {
      const c = unitConversion(quantity, unitsText, file);
      return c.perVolume ? { factor: c.factor / density, note: `${unitsText} → ${c.to} with a fixed density of ${density} kg m⁻³` } : { factor: c.factor };
    } catch (error) {
      return error instanceof Error ? error.message : String(error);
    }
  };
}

/** Read the config's grids; unreadable files become problems. */
export function readGrids(config: Config, files: Map<string, InputBytes>, ledger: Ledger): { grids: QuantityGrid[]; problems: Problem[] } {
  const grids: QuantityGrid[] = [];
  const problems: Problem[] = [];
  for (const entry of config.inputs.grids) {
    const bytes = files.get(entry.path);
    if (!bytes) continue;
    const options = {
      quantity: entry.quantity,
      variable: entry.variable,
      standardName: entry.standard_name,
      units: entry.units,
      toCanonical: gridUnits(entry.quantity, entry.path, config.harmonise.default_density),
      pressureToDepth: depthFromPressure,
      ledger,
    };
    try {
      if (/\.(csv|tsv|txt)$/i.test(entry.path)) {
        const text = decodeUtf8(bytes);
        if ('severity' in text) {
          problems.push(text);
          continue;
        }
        grids.push({ quantity: entry.quantity, grid: readCsvGrid(text, options) });
      } else grids.push({ quantity: entry.quantity, grid: readNetcdfGrid(bytes, options) });
    } catch (error) {
      problems.push(stageProblem(error, entry.path));
    }
  }
  return { grids, problems };
}

import { canonicalUnit } from './canonicalUnit.js';
import { AMOUNT_PER_VOLUME, MASS_PER_CELL, sameDimension } from './dimension.js';
import { inFile, noCanonicalUnit, unknownUnit, wrongDimension } from './messages.js';
import { parseUnit } from './parseUnit.js';

/** Molar mass of carbon, g mol⁻¹ (IUPAC standard atomic weight, conventional value 12.011; Meija et al. 2016, Pure Appl. Chem. 88:265). */
export const CARBON_MOLAR_MASS = 12.011;

/** How to turn a value in a user unit into the column's canonical unit. */
export interface UnitConversion {
  /** Unit as the user wrote it. */
  from: string;
  /** Canonical unit. */
  to: string;
  /** canonical = raw · factor, divided by seawater density in kg m⁻³ when `perVolume`. */
  factor: number;
  /** True for per-volume concentrations (per litre, per m³): divide by in-situ density ρ in kg m⁻³. */
  perVolume: boolean;
  /** True when a mass of carbon became an amount with CARBON_MOLAR_MASS. */
  viaMolarMass: boolean;
}

// Prefix products carry round-off (1e-6³ ≠ 1e-18 exactly); 15 significant digits make µm³ → µm³ exactly 1.
function tidy(x: number): number {
  return Number(x.toPrecision(15));
}

type Outcome = { ok: true; conversion: UnitConversion } | { ok: false; message: string };

function resolve(column: string, unitText: string): Outcome {
  const canonical = canonicalUnit(column);
  if (!canonical) return { ok: false, message: noCanonicalUnit(column) };
  const parsed = parseUnit(unitText);
  if (!parsed) return { ok: false, message: unknownUnit(unitText, column) };
  const base = { from: unitText, to: canonical.unit };
  if (sameDimension(parsed.dimension, canonical.dimension) && parsed.substance === undefined) {
    return { ok: true, conversion: { ...base, factor: tidy(parsed.factor / canonical.factor), perVolume: false, viaMolarMass: false } };
  }
  if (canonical.kind === 'concentration' && sameDimension(parsed.dimension, AMOUNT_PER_VOLUME) && parsed.substance === undefined) {
    // Base factor is mol m⁻³; dividing by ρ (kg m⁻³) gives mol kg⁻¹.
    return { ok: true, conversion: { ...base, factor: tidy(parsed.factor / canonical.factor), perVolume: true, viaMolarMass: false } };
  }
  if (canonical.kind === 'carbon' && sameDimension(parsed.dimension, MASS_PER_CELL) && (parsed.substance ?? 'C') === 'C') {
    // kg → g (×1000) → mol C (÷ 12.011).
    const factor = tidy((parsed.factor * 1000) / CARBON_MOLAR_MASS / canonical.factor);
    return { ok: true, conversion: { ...base, factor, perVolume: false, viaMolarMass: true } };
  }
  return { ok: false, message: wrongDimension(unitText, column, canonical.expected) };
}

/** Conversion from a user unit to a canonical column's unit; throws an error naming the file and column when the unit is unknown or of the wrong dimension. */
export function unitConversion(column: string, unitText: string, file: string): UnitConversion {
  const outcome = resolve(column, unitText);
  if (!outcome.ok) throw new Error(inFile(file, outcome.message));
  return outcome.conversion;
}

/** Check a configured unit for a canonical column: the error message, or null when the unit is usable. */
export function validateUnit(quantity: string, unitText: string): string | null {
  const outcome = resolve(quantity, unitText);
  return outcome.ok ? null : outcome.message;
}

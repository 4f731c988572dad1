/** Options of the quotas stage: the class taxonomy and how each class gets its carbon. */
import type { CarbonFactor, CarbonVolumeOptions } from './carbon-from-biovolume.js';

/** How a class's cellular carbon is obtained. */
export type CarbonMethod = 'measured' | 'biovolume-diatom' | 'biovolume-protist' | 'biovolume-factor' | 'phosphorus';

/** A reference (minimum) Fe:C quota for the luxury-uptake index, with its source. */
export interface MinimumFeC {
  /** Minimum Fe:C in µmol Fe per mol C. */
  value: number;
  /** Where the value comes from, shown in the method notes. */
  citation: string;
}

/** One canonical phytoplankton class. */
export interface ClassSpec {
  /** Raw labels that mean this class; matched case-insensitively after trimming. The canonical name always matches. */
  aliases: string[];
  /** Carbon method for cells of this class. */
  carbon: CarbonMethod;
  /** Relative 1-sigma error of the carbon estimate by this method (e.g. 0.3 for 30 %); measured carbon uses its own sigma when given. */
  relativeError: number;
  /** Minimum Fe:C of the class for `luxury_index`; absent → luxury_index NaN. */
  minFeC?: MinimumFeC;
}

/** Options of `computeQuotas`. */
export interface QuotaOptions {
  /** Canonical class name → its spec. Required: an unlisted raw class is excluded, never guessed. */
  classes: Record<string, ClassSpec>;
  /** Carbon–volume relation settings; default { form: 'log', largeDiatoms: false }. */
  biovolume?: CarbonVolumeOptions;
  /** Factor for 'biovolume-factor'; default DEFAULT_PICOCYANOBACTERIA_FACTOR (350 fg C µm⁻³). */
  carbonFactor?: CarbonFactor;
  /** C:P (mol/mol) for 'phosphorus'; default 106 (Redfield 1963). */
  carbonToPhosphorus?: number;
  /** Logical table name in ledger entries; default 'cells'. */
  table?: string;
}

/** The known "true" relationships the demo cells are generated from, and which truth.json records. */
import type { Basin } from './scenario.js';

/** Canonical phytoplankton classes of the demo. */
export type PhytoClass = 'diatom' | 'dinoflagellate' | 'haptophyte' | 'cyanobacteria';

/** Classes in a fixed order (files, counts and the truth file list them so). */
export const CLASSES: readonly PhytoClass[] = ['diatom', 'dinoflagellate', 'haptophyte', 'cyanobacteria'];

/** Power law per class: log10(Fe:C [µmol/mol]) = intercept + exponent · log10(dFe [nmol/kg]). */
export const CLASS_LAWS: Readonly<Record<PhytoClass, { intercept: number; exponent: number }>> = {
  diatom: { intercept: Math.log10(12), exponent: 0.55 },
  dinoflagellate: { intercept: Math.log10(9), exponent: 0.35 },
  haptophyte: { intercept: Math.log10(7), exponent: 0.45 },
  cyanobacteria: { intercept: Math.log10(5), exponent: 0.25 },
};

/** Standard deviation of the per-station random effect on log10 Fe:C (shared by all classes of a station). */
export const STATION_SD_LOG10 = 0.1;

/** Standard deviation of the per-cell scatter on log10 Fe:C. */
export const CELL_SD_LOG10 = 0.12;

/** The region whose cells hold deliberately less iron than the fit: an open-ocean box in the South Atlantic. */
export const LOW_IRON_BOX = { name: 'South Atlantic low-iron box', lat_min: -35, lat_max: -15, lon_min: -30, lon_max: 5, offset_log10: -0.3 } as const;

/** True when a position lies inside the low-iron box. */
export function inLowIronBox(lat: number, lon: number): boolean {
  const b = LOW_IRON_BOX;
  return lat >= b.lat_min && lat <= b.lat_max && lon >= b.lon_min && lon <= b.lon_max;
}

/** The dFe offset injected into one cruise of the crossover pair, at and below `min_depth_m`. */
export const CROSSOVER_OFFSET = { cruise: 'TH2308', reference_cruise: 'SG2104', offset_nmol_kg: 0.08, min_depth_m: 1000 } as const;

/** Relative share of each class among the cells analysed per basin. */
export const CLASS_WEIGHTS: Readonly<Record<Basin, Readonly<Record<PhytoClass, number>>>> = {
  'north-atlantic': { diatom: 0.35, dinoflagellate: 0.2, haptophyte: 0.3, cyanobacteria: 0.15 },
  'south-atlantic': { diatom: 0.2, dinoflagellate: 0.15, haptophyte: 0.3, cyanobacteria: 0.35 },
  'north-pacific': { diatom: 0.15, dinoflagellate: 0.15, haptophyte: 0.25, cyanobacteria: 0.45 },
  'southern-ocean': { diatom: 0.6, dinoflagellate: 0.15, haptophyte: 0.25, cyanobacteria: 0 },
  indian: { diatom: 0.25, dinoflagellate: 0.15, haptophyte: 0.25, cyanobacteria: 0.35 },
};

/** Labels a cell file may use for each class; all are aliases in the config. */
export const CLASS_LABELS: Readonly<Record<PhytoClass, readonly string[]>> = {
  diatom: ['diatom', 'Bacillariophyceae', 'centric diatom', 'pennate diatom'],
  dinoflagellate: ['dinoflagellate', 'Dinophyceae'],
  haptophyte: ['haptophyte', 'Prymnesiophyceae', 'coccolithophore'],
  cyanobacteria: ['cyanobacteria', 'Synechococcus', 'Cyanophyceae'],
};

/** Median biovolume (µm³) and log10 spread of each class. */
export const BIOVOLUME: Readonly<Record<PhytoClass, { median: number; sdLog10: number }>> = {
  diatom: { median: 900, sdLog10: 0.35 },
  dinoflagellate: { median: 2200, sdLog10: 0.3 },
  haptophyte: { median: 65, sdLog10: 0.2 },
  cyanobacteria: { median: 0.8, sdLog10: 0.12 },
};

/** Redfield C:P (mol/mol) used for carbon of the phosphorus class; Redfield (1963). */
export const REDFIELD_C_P = 106;

/** Carbon of picocyanobacteria per biovolume (fg C µm⁻³) used only to draw a plausible P content. */
export const CYANO_FG_C_PER_UM3 = 350;

/** Carbon in mol per cell from biovolume (µm³); Menden-Deuer & Lessard (2000) log form, diatoms or other protists. */
export function carbonMolFromVolume(volumeUm3: number, diatom: boolean): number {
  const pg = diatom ? 10 ** (-0.541 + 0.811 * Math.log10(volumeUm3)) : 10 ** (-0.665 + 0.939 * Math.log10(volumeUm3));
  return pg / 12.011 / 1e12;
}

/** Median other-metal to carbon ratios (µmol/mol) and their log10 spread, for Mn and Zn. */
export const OTHER_METALS = { mn: { median: 3, sdLog10: 0.2 }, zn: { median: 8, sdLog10: 0.25 } } as const;

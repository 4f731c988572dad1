// The basinquota.yaml schema: one zod definition, from which the types and the shipped JSON Schema both come.
import { z } from 'zod';

const text = z.string().min(1);
const positive = z.number().positive();

/** A column map: canonical name → the user's column header. */
const columnMap = z.record(z.string(), text).describe('Canonical column name → column header in the file.');

/** Units per canonical column, as written in the file (e.g. "nmol/L", "fmol/cell"). */
const unitMap = z.record(z.string(), text).describe('Canonical column name → unit of that column in the file.');

const flagScheme = z
  .union([z.enum(['ioc', 'woce', 'none']), z.object({ map: z.record(z.string(), z.enum(['good', 'questionable', 'bad', 'missing', 'below_detection'])) }).strict()])
  .describe('QC flag scheme of the file: "ioc" (IOC/IODE 2013), "woce" (WOCE bottle flags), "none", or {map: {raw: internal}}. Default "ioc".');

/** One bottle-data file. */
export const sampleInputSchema = z
  .object({
    path: text.describe('File path relative to the project folder (.csv, .tsv, .parquet, .arrow).'),
    cruise: text.optional().describe('Cruise id for every row when the file has no cruise column.'),
    delimiter: z.string().length(1).optional().describe('Field delimiter; default from the extension: "," for .csv, tab for .tsv.'),
    columns: columnMap.default({}),
    units: unitMap.default({}),
    flags: flagScheme.default('ioc'),
    detection_limits: z.record(z.string(), positive).default({}).describe('Detection limit per quantity in canonical units, used when a row gives none.'),
    fill_values: z.array(z.number()).optional().describe('Numbers that mean "missing" in this file; default -999, -9999, -99, 9.9e36, 9.96921e36.'),
  })
  .strict();

/** One single-cell quota file. */
export const cellInputSchema = z
  .object({
    path: text.describe('File path relative to the project folder.'),
    cruise: text.optional().describe('Cruise id for every row when the file has no cruise column.'),
    delimiter: z.string().length(1).optional().describe('Field delimiter; default from the extension.'),
    columns: columnMap.default({}),
    units: unitMap.default({}),
    fill_values: z.array(z.number()).optional().describe('Numbers that mean "missing"; default as for samples.'),
  })
  .strict();

/** One gridded field (NetCDF or CSV grid). */
export const gridInputSchema = z
  .object({
    path: text.describe('NetCDF (.nc) or CSV grid (.csv: lon, lat, depth, [month], value).'),
    quantity: z.enum(['dissolved_fe', 'nitrate', 'phosphate', 'silicate']).describe('Canonical quantity the field holds.'),
    variable: text.optional().describe('Variable name in the NetCDF file.'),
    standard_name: text.optional().describe('CF standard_name to find the variable by, when no variable name is given.'),
    units: text.optional().describe('Unit of a CSV grid, or to override a NetCDF variable without units.'),
  })
  .strict();

const regionsSchema = z
  .union([z.literal('builtin-basins'), z.object({ boxes_deg: positive.max(90) }).strict(), z.object({ path: text }).strict()])
  .default('builtin-basins')
  .describe('Region scheme: "builtin-basins", {boxes_deg: 10} or {path: regions.geojson}. Default builtin-basins.');

/** Carbon method per phytoplankton class. */
export const carbonMethodSchema = z.enum(['measured', 'biovolume-diatom', 'biovolume-protist', 'biovolume-factor', 'phosphorus']);

const citedValue = z.object({ value: positive, citation: text }).strict();

const classSchema = z
  .object({
    aliases: z.array(text).default([]).describe('Other labels in the cell files that mean this class (case-insensitive).'),
    carbon: carbonMethodSchema.describe('How cellular carbon is obtained for this class.'),
    relative_error: z.number().min(0).max(5).optional().describe('Relative 1-sigma error of the carbon estimate; default 0.3 for biovolume, 0.2 for phosphorus, 0 for measured.'),
    min_fe_c: citedValue.optional().describe('Reference minimum Fe:C (µmol/mol) with its citation, for the luxury-uptake index.'),
  })
  .strict();

/** The whole basinquota.yaml. */
export const configSchema = z
  .object({
    report: z
      .object({
        title: text.describe('Report title.'),
        authors: z.array(text).min(1).describe('Authors, in citation order.'),
        programme: text.optional().describe('Sampling programme or working group.'),
        licence: text.default('CC-BY-4.0').describe('Licence of the report; default CC-BY-4.0.'),
        contact: text.optional().describe('Contact e-mail or address.'),
      })
      .strict(),
    inputs: z
      .object({
        samples: z.array(sampleInputSchema).min(1).describe('Bottle-data files.'),
        cells: z.array(cellInputSchema).min(1).describe('Single-cell quota files.'),
        grids: z.array(gridInputSchema).default([]).describe('Gridded fields used where a cell has no matching bottle.'),
        regions: regionsSchema,
      })
      .strict(),
    harmonise: z
      .object({
        accept_flags: z.array(z.enum(['good', 'questionable', 'below_detection'])).default(['good', 'questionable', 'below_detection']).describe('Internal flags that enter matching and fits; default good, questionable (marked) and below_detection (substituted).'),
        detection_limit_policy: z.enum(['half', 'limit', 'exclude']).default('half').describe('Below-detection values: DL/2 (default, common practice), DL, or exclude.'),
        default_density: positive.default(1025).describe('Seawater density (kg/m³) for per-litre units when T or S is missing; default 1025.'),
        land_check: z.boolean().default(true).describe('Exclude stations on land (Natural Earth); default true.'),
        coast_tolerance_km: z.number().min(0).default(10).describe('Distance inland from the coast still accepted; default 10 km.'),
      })
      .strict()
      .default({ accept_flags: ['good', 'questionable', 'below_detection'], detection_limit_policy: 'half', default_density: 1025, land_check: true, coast_tolerance_km: 10 }),
    match: z
      .object({
        depth_tolerance_m: positive.optional().describe('Bottle depth tolerance (m); default max(10 m, 10 % of depth).'),
        interpolate_bracketing: z.boolean().default(true).describe('Interpolate between two bracketing bottles of the cast; default true.'),
        max_bracket_gap_m: positive.default(100).describe('Largest gap between bracketing bottles (m); default 100.'),
        max_grid_distance_km: positive.default(300).describe('No grid value farther than this from a valid node (km); default 300.'),
      })
      .strict()
      .default({ interpolate_bracketing: true, max_bracket_gap_m: 100, max_grid_distance_km: 300 }),
    classes: z.record(z.string().regex(/^[a-z][a-z0-9_-]*$/), classSchema).describe('Phytoplankton classes (lower-case ids) with aliases and carbon method.'),
    carbon: z
      .object({
        biovolume_form: z.enum(['log', 'rounded']).default('log').describe('Menden-Deuer & Lessard (2000) relations in the fitted log form (default) or the rounded power form.'),
        large_diatom_relation: z.boolean().default(false).describe('Use the separate relation for diatoms > 3000 µm³; default false.'),
        factor_fg_per_um3: citedValue.optional().describe('Carbon per biovolume (fg C µm⁻³) for classes with carbon "biovolume-factor", with its citation.'),
        redfield_c_p: positive.default(106).describe('C:P (mol/mol) for carbon from phosphorus; default 106 (Redfield 1963).'),
      })
      .strict()
      .default({ biovolume_form: 'log', large_diatom_relation: false, redfield_c_p: 106 }),
    crossover: z
      .object({
        max_distance_km: positive.default(200).describe('Station pairs closer than this are compared; default 200 km.'),
        max_days_apart: positive.optional().describe('Largest time between the two stations (days); default no limit.'),
        min_depth_m: z.number().min(0).default(1000).describe('Compare dFe profiles below this depth; default 1000 m.'),
        threshold_nmol_kg: positive.default(0.1).describe('Flag a cruise pair whose mean offset exceeds this; default 0.1 nmol/kg.'),
        max_gap_m: positive.default(1500).describe('Largest gap between two bottles of a profile that is interpolated across (m); default 1500, since deep bottles are often 500–1500 m apart.'),
      })
      .strict()
      .default({ max_distance_km: 200, min_depth_m: 1000, threshold_nmol_kg: 0.1, max_gap_m: 1500 }),
    fits: z
      .object({
        models: z.array(z.enum(['ols', 'sma', 'york', 'saturating'])).min(1).default(['ols', 'sma', 'york', 'saturating']).describe('Models fitted per class; default all four.'),
        primary: z.enum(['auto', 'ols', 'sma', 'york', 'saturating']).default('ols').describe('Model whose residuals define anomalies; "auto" = lowest AICc; default ols.'),
        level: z.number().gt(0.5).lt(1).default(0.95).describe('Confidence level of intervals; default 0.95.'),
        bootstrap: z
          .object({ n: z.number().int().min(0).default(1000).describe('Bootstrap replicates (0 = none); default 1000.'), seed: z.number().int().default(1).describe('Seed of the bootstrap; default 1.') })
          .strict()
          .default({ n: 1000, seed: 1 }),
        min_cells: z.number().int().min(3).default(10).describe('Classes with fewer cells are reported but not fitted; default 10.'),
        weighting: z.enum(['none', 'inverse-variance']).default('none').describe('OLS weighting; default none.'),
        dfe_relative_sigma: z.number().min(0).default(0.1).describe('Relative 1-sigma uncertainty of ambient dFe for the York fit; default 0.1.'),
      })
      .strict()
      .default({ models: ['ols', 'sma', 'york', 'saturating'], primary: 'ols', level: 0.95, bootstrap: { n: 1000, seed: 1 }, min_cells: 10, weighting: 'none', dfe_relative_sigma: 0.1 }),
    anomalies: z
      .object({
        min_stations: z.number().int().min(2).default(3).describe('Region × class groups with fewer stations are not tested; default 3.'),
        fdr_q: z.number().gt(0).lt(1).default(0.05).describe('Benjamini–Hochberg false discovery rate; default 0.05.'),
        target_fold: z.number().gt(1).default(1.5).describe('Fold difference the sampling-gap table plans for; default 1.5.'),
      })
      .strict()
      .default({ min_stations: 3, fdr_q: 0.05, target_fold: 1.5 }),
    figures: z
      .object({
        projection: z.enum(['equal-earth', 'south-polar', 'north-polar']).default('equal-earth').describe('Main map projection; default equal-earth.'),
        polar: z.array(z.enum(['south-polar', 'north-polar'])).default([]).describe('Extra polar maps; default none.'),
        depths_m: z.array(z.number().min(0)).min(1).default([0]).describe('Depth levels of field maps (m); default [0].'),
        widths_mm: z.array(positive).min(1).default([85, 180]).describe('Figure widths for the supplement (mm); default 85 and 180.'),
        dpi: z.array(z.number().int().min(72).max(1200)).min(1).default([300]).describe('PNG resolutions; default 300.'),
        max_points: z.number().int().min(100).default(5000).describe('Above this many points a scatter layer is binned; default 5000.'),
        hnlc_nitrate: positive.default(4).describe('Surface nitrate (µmol/kg) outlining HNLC waters; default 4.'),
        fe_star_ratio: citedValue.optional().describe('R Fe:P (mmol/mol) for Fe* = dFe − R·PO4 with its citation; default from the fits or Parekh et al. 2005.'),
      })
      .strict()
      .default({ projection: 'equal-earth', polar: [], depths_m: [0], widths_mm: [85, 180], dpi: [300], max_points: 5000, hnlc_nitrate: 4 }),
  })
  .strict();

/** A validated basinquota.yaml with defaults filled in. */
export type Config = z.infer<typeof configSchema>;
/** One samples entry of the config. */
export type SampleInputConfig = Config['inputs']['samples'][number];
/** One cells entry of the config. */
export type CellInputConfig = Config['inputs']['cells'][number];
/** One grids entry of the config. */
export type GridInputConfig = Config['inputs']['grids'][number];
/** One phytoplankton class of the config. */
export type ClassConfig = Config['classes'][string];

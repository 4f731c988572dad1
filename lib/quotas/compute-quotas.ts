/** The quotas stage: canonical class, cellular carbon and element:carbon / element:phosphorus quotas with uncertainties. */
import type * as aq from 'arquero';
import type { Ledger } from '../ledger/ledger.js';
import { ELEMENTS } from '../load/canonical.js';
import { keepRowsWith, numberColumn, textColumn } from '../match/table-columns.js';
import { biovolumeFromShape, parseCellShape } from './biovolume-from-shape.js';
import {
  carbonFromBiovolume,
  carbonFromFactor,
  DEFAULT_PICOCYANOBACTERIA_FACTOR,
  LARGE_DIATOM_VOLUME_UM3,
  picogramsCarbonToMol,
} from './carbon-from-biovolume.js';
import { carbonFromPhosphorus, REDFIELD_C_TO_P } from './carbon-from-phosphorus.js';
import { missingInput, noCarbon, nonPositiveContent,
  missingContent, noSigma, unknownClass } from './messages.js';
import type { ClassSpec, QuotaOptions } from './quota-options.js';
import { classResolver } from './resolve-class.js';
import { ratioWithSigma } from './ratio-with-sigma.js';

interface CarbonEstimate {
  mol: number;
  sigma: number;
  method: string;
  problem: string;
}

/** Per-row inputs the carbon methods read. */
interface CellColumns {
  carbon: Float64Array;
  carbonSigma: Float64Array;
  biovolume: Float64Array;
  shape: string[];
  length: Float64Array;
  width: Float64Array;
  height: Float64Array;
  p: Float64Array;
  pSigma: Float64Array;
}

function cellVolume(cols: CellColumns, i: number): number {
  const v = cols.biovolume[i];
  if (Number.isFinite(v) && v > 0) return v;
  const shape = parseCellShape(cols.shape[i]);
  if (shape === null) return Number.NaN;
  return biovolumeFromShape(shape, { length: cols.length[i], width: cols.width[i], height: cols.height[i] });
}

function estimateCarbon(spec: ClassSpec, cols: CellColumns, i: number, options: QuotaOptions): CarbonEstimate {
  const rel = spec.relativeError;
  const fail = (problem: string): CarbonEstimate => ({ mol: Number.NaN, sigma: Number.NaN, method: spec.carbon, problem });
  switch (spec.carbon) {
    case 'measured': {
      const c = cols.carbon[i];
      if (!(Number.isFinite(c) && c > 0)) return fail(missingInput('positive carbon'));
      const s = cols.carbonSigma[i];
      return { mol: c, sigma: Number.isFinite(s) && s >= 0 ? s : rel * c, method: 'measured', problem: '' };
    }
    case 'biovolume-diatom':
    case 'biovolume-protist':
    case 'biovolume-factor': {
      const v = cellVolume(cols, i);
      if (!Number.isFinite(v)) return fail(missingInput('biovolume (or a known cell_shape with its dimensions)'));
      let pg: number;
      let method: string = spec.carbon;
      if (spec.carbon === 'biovolume-factor') {
        pg = carbonFromFactor(v, options.carbonFactor ?? DEFAULT_PICOCYANOBACTERIA_FACTOR);
      } else {
        const relation = spec.carbon === 'biovolume-diatom' ? 'diatom' : 'protist';
        pg = carbonFromBiovolume(v, relation, options.biovolume);
        if (relation === 'diatom' && options.biovolume?.largeDiatoms === true && v > LARGE_DIATOM_VOLUME_UM3) {
          method = 'biovolume-diatom-large';
        }
      }
      const mol = picogramsCarbonToMol(pg);
      return { mol, sigma: rel * mol, method, problem: '' };
    }
    case 'phosphorus': {
      const p = cols.p[i];
      const mol = carbonFromPhosphorus(p, options.carbonToPhosphorus ?? REDFIELD_C_TO_P);
      if (!Number.isFinite(mol)) return fail(missingInput('positive p content'));
      // The P measurement error adds to the scatter of C:P about its assumed value.
      const relP = Number.isFinite(cols.pSigma[i]) ? cols.pSigma[i] / p : 0;
      return { mol, sigma: mol * Math.hypot(rel, relP), method: 'phosphorus', problem: '' };
    }
  }
}

/**
 * Add `class`, `carbon_mol` (mol C/cell), `carbon_method`, `carbon_sigma_mol`, `fe_c` (µmol/mol), `fe_c_sigma`,
 * `fe_p` (mmol/mol), `fe_p_sigma`, per other element `<el>_c`, `<el>_c_sigma` (µmol/mol), `<el>_p`, `<el>_p_sigma`
 * (mmol/mol), `luxury_index` (Fe:C / class minimum Fe:C) and `c_fe`, `c_fe_sigma` (mol C per mol Fe = 1e6 / Fe:C).
 * Sigmas by first-order propagation, relative errors in quadrature (Taylor 1997, An Introduction to Error Analysis, §3.8).
 * Excludes unknown classes ('unknown-class'), non-positive Fe ('non-positive-content') and cells without carbon ('no-carbon').
 */
export function computeQuotas(cells: aq.ColumnTable, options: QuotaOptions, ledger: Ledger): aq.ColumnTable {
  const resolve = classResolver(options.classes);
  const tableName = options.table ?? 'cells';
  const n = cells.numRows();
  const files = textColumn(cells, 'source_file');
  const lines = numberColumn(cells, 'source_line');
  const rawClass = textColumn(cells, 'phyto_class');
  const fe = numberColumn(cells, 'fe');
  const feSigma = numberColumn(cells, 'fe_sigma');
  const cols: CellColumns = {
    carbon: numberColumn(cells, 'carbon'),
    carbonSigma: numberColumn(cells, 'carbon_sigma'),
    biovolume: numberColumn(cells, 'biovolume'),
    shape: textColumn(cells, 'cell_shape'),
    length: numberColumn(cells, 'cell_length'),
    width: numberColumn(cells, 'cell_width'),
    height: numberColumn(cells, 'cell_height'),
    p: numberColumn(cells, 'p'),
    pSigma: numberColumn(cells, 'p_sigma'),
  };
  const present = new Set(cells.columnNames());
  const others = ELEMENTS.filter((el) => el !== 'fe' && present.has(el));
  const otherValues = others.map((el) => ({ el, value: numberColumn(cells, el), sigma: numberColumn(cells, `${el}_sigma`) }));

  const note = (i: number, action: 'excluded' | 'flagged', reason: string, detail: string) =>
    ledger.add({ table: tableName, file: files[i], line: Number.isFinite(lines[i]) ? lines[i] : 0, stage: 'quotas', action, reason, detail });

  const keep: number[] = [];
  const out = new Map<string, unknown[]>();
  const push = (name: string, value: unknown) => {
    let column = out.get(name);
    if (column === undefined) out.set(name, (column = []));
    column.push(value);
  };
  const order: string[] = ['class', 'carbon_mol', 'carbon_method', 'carbon_sigma_mol', 'fe_c', 'fe_c_sigma', 'fe_p', 'fe_p_sigma'];
  for (const { el } of otherValues) {
    order.push(`${el}_c`, `${el}_c_sigma`);
    if (el !== 'p') order.push(`${el}_p`, `${el}_p_sigma`);
  }
  order.push('luxury_index', 'c_fe', 'c_fe_sigma');
  for (const name of order) out.set(name, []);

  for (let i = 0; i < n; i++) {
    const name = resolve(rawClass[i]);
    if (name === null) {
      note(i, 'excluded', 'unknown-class', unknownClass(rawClass[i]));
      continue;
    }
    if (!Number.isFinite(fe[i])) {
      note(i, 'excluded', 'missing-content', missingContent('fe'));
      continue;
    }
    if (fe[i] <= 0) {
      note(i, 'excluded', 'non-positive-content', nonPositiveContent('fe', fe[i]));
      continue;
    }
    const spec = options.classes[name];
    const carbon = estimateCarbon(spec, cols, i, options);
    if (!Number.isFinite(carbon.mol)) {
      note(i, 'excluded', 'no-carbon', noCarbon(spec.carbon, carbon.problem));
      continue;
    }
    if (!Number.isFinite(feSigma[i])) note(i, 'flagged', 'no-sigma', noSigma('fe'));
    keep.push(i);
    const feC = ratioWithSigma(fe[i], feSigma[i], carbon.mol, carbon.sigma, 1e6);
    const feP = ratioWithSigma(fe[i], feSigma[i], cols.p[i], cols.pSigma[i], 1e3);
    push('class', name);
    push('carbon_mol', carbon.mol);
    push('carbon_method', carbon.method);
    push('carbon_sigma_mol', carbon.sigma);
    push('fe_c', feC.value);
    push('fe_c_sigma', feC.sigma);
    push('fe_p', feP.value);
    push('fe_p_sigma', feP.sigma);
    for (const { el, value, sigma } of otherValues) {
      const elC = ratioWithSigma(value[i], sigma[i], carbon.mol, carbon.sigma, 1e6);
      push(`${el}_c`, elC.value);
      push(`${el}_c_sigma`, elC.sigma);
      if (el === 'p') continue;
      const elP = ratioWithSigma(value[i], sigma[i], cols.p[i], cols.pSigma[i], 1e3);
      push(`${el}_p`, elP.value);
      push(`${el}_p_sigma`, elP.sigma);
    }
    push('luxury_index', spec.minFeC === undefined ? Number.NaN : feC.value / spec.minFeC.value);
    // Fe:C is in µmol/mol, so mol C per mol Fe is 1e6 / Fe:C; the relative error carries over unchanged.
    const cFe = 1e6 / feC.value;
    push('c_fe', cFe);
    push('c_fe_sigma', cFe * (feC.sigma / feC.value));
  }
  return keepRowsWith(cells, keep, order.map((name) => [name, out.get(name) ?? []]));
}

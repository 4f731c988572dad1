// Method notes of the quotas stage: carbon per class, quota formulas, propagated uncertainty.
import type * as aq from 'arquero';
import type { Config } from '../../config/index.js';
import type { PipelineResult } from '../../pipeline/index.js';
import { DEFAULT_PICOCYANOBACTERIA_FACTOR } from '../../quotas/index.js';
import { FORMULA_TEX } from './formulas.js';
import { CARBON_METHOD_TEXT, MIN_QUOTA_TEXT } from './messages.js';
import type { MethodFormula, MethodStage } from './methods-model.js';
import { formula } from './render-formula.js';

/** Cells per "class\0carbon_method" with finite carbon. */
function carbonCounts(cells: aq.ColumnTable): Map<string, number> {
  const out = new Map<string, number>();
  const names = cells.columnNames();
  if (cells.numRows() === 0 || !names.includes('carbon_method') || !names.includes('class')) return out;
  const cls = cells.array('class') as ArrayLike<string>;
  const method = cells.array('carbon_method') as ArrayLike<string>;
  const mol = cells.array('carbon_mol') as ArrayLike<number>;
  for (let i = 0; i < cells.numRows(); i++) {
    if (!Number.isFinite(mol[i])) continue;
    const key = `${cls[i]}\u0000${method[i]}`;
    out.set(key, (out.get(key) ?? 0) + 1);
  }
  return out;
}

/** Cells whose biovolume came from shape and dimensions (no positive biovolume given) and whose carbon used it. */
export function shapeBiovolumeCells(cells: aq.ColumnTable): number {
  const names = cells.columnNames();
  if (cells.numRows() === 0 || !names.includes('cell_shape') || !names.includes('carbon_method')) return 0;
  const shape = cells.array('cell_shape') as ArrayLike<string | null>;
  const bv = names.includes('biovolume') ? (cells.array('biovolume') as ArrayLike<number>) : null;
  const method = cells.array('carbon_method') as ArrayLike<string>;
  const mol = cells.array('carbon_mol') as ArrayLike<number>;
  let n = 0;
  for (let i = 0; i < cells.numRows(); i++) {
    const given = bv !== null && Number.isFinite(bv[i]) && bv[i] > 0;
    if (!given && shape[i] && String(method[i]).startsWith('biovolume') && Number.isFinite(mol[i])) n++;
  }
  return n;
}

/** The quotas stage. Cites only the carbon relations that cells actually used. */
export function quotaStage(result: PipelineResult, config: Config): MethodStage {
  const counts = carbonCounts(result.cells);
  const used = new Set([...counts.keys()].map((k) => k.split('\u0000')[1]));
  const rows = [...counts.entries()].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)).map(([key, n]) => {
    const [cls, method] = key.split('\u0000');
    return [cls, CARBON_METHOD_TEXT[method] ?? method, String(n)];
  });
  const mdl = [...used].some((m) => m === 'biovolume-diatom' || m === 'biovolume-protist' || m === 'biovolume-diatom-large');
  const factor = config.carbon.factor_fg_per_um3 ?? { value: DEFAULT_PICOCYANOBACTERIA_FACTOR.fgCPerUm3, citation: DEFAULT_PICOCYANOBACTERIA_FACTOR.citation };
  const shapes = shapeBiovolumeCells(result.cells);
  const formulas: MethodFormula[] = [];
  const references: string[] = [];
  const parameters = [];
  if (mdl) {
    formulas.push(formula('mdl-relation', 'Carbon–volume relation (C in pg, V in µm³)', FORMULA_TEX['mdl-relation']));
    parameters.push({ name: 'Carbon–volume form', value: config.carbon.biovolume_form === 'log' ? 'fitted log form, log10 C = a + b log10 V (diatoms a = −0.541, b = 0.811; protists a = −0.665, b = 0.939)' : 'rounded power form C = 0.288 V^0.811 (diatoms), 0.216 V^0.939 (protists)' });
    parameters.push({ name: 'Large-diatom relation (> 3000 µm³)', value: config.carbon.large_diatom_relation ? 'on: C = 0.117 V^0.881' : 'off' });
    references.push('menden-deuer2000');
  }
  if (shapes > 0) {
    parameters.push({ name: 'Biovolumes from cell shape and dimensions', value: `${shapes} cells` });
    references.push('hillebrand1999');
  }
  if (used.has('biovolume-factor')) {
    formulas.push(formula('factor-relation', 'Carbon from biovolume by a fixed factor', FORMULA_TEX['factor-relation']));
    parameters.push({ name: 'Carbon per biovolume', value: `${factor.value} fg C µm⁻³ (${factor.citation})` });
    references.push('user:carbon-factor');
  }
  if (used.has('phosphorus')) {
    formulas.push(formula('redfield-carbon', 'Carbon from cellular phosphorus', FORMULA_TEX['redfield-carbon']));
    parameters.push({ name: 'C:P ratio', value: `${config.carbon.redfield_c_p} mol mol⁻¹${config.carbon.redfield_c_p === 106 ? ' (Redfield et al. 1963)' : ''}` });
    references.push('redfield1963');
  }
  const minima = Object.entries(config.classes).filter(([, c]) => c.min_fe_c).map(([name, c]) => ({ name: `Minimum Fe:C, ${name}`, value: `${c.min_fe_c!.value} µmol mol⁻¹ (${c.min_fe_c!.citation})` }));
  formulas.push(
    formula('fe-c', 'Fe:C quota', FORMULA_TEX['fe-c']),
    formula('fe-p', 'Fe:P quota', FORMULA_TEX['fe-p']),
    formula('ratio-sigma', 'Propagated 1σ of a ratio q (independent errors)', FORMULA_TEX['ratio-sigma']),
  );
  return {
    id: 'quotas',
    title: 'Cellular carbon and quotas',
    text: ['Cellular carbon was obtained per class as configured; element quotas are ratios to carbon (and to phosphorus) with 1σ uncertainties propagated in quadrature.', ...(minima.length ? [MIN_QUOTA_TEXT] : [])],
    parameters: [...parameters, ...minima],
    tables: [{ caption: 'Carbon method per class (cells with carbon)', columns: ['Class', 'Carbon from', 'Cells'], rows }],
    formulas,
    references,
  };
}

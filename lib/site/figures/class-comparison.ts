// Quotas page: Fe:C by class as strip and box with each class's geometric mean and interval, plus the ANCOVA result.
import { classComparisonSpec, figureCsv, type ClassSummary, type ClassValue } from '../../figures/index.js';
import { cellRows, distinct } from './cell-rows.js';
import { pText, sig } from './format.js';
import { geometricMean, seededUniform } from './geometric-mean.js';
import { renderSpec } from './render-spec.js';
import type { FigureContext, SiteFigure } from './site-figure.js';

/** The class comparison figure (jitter seeded, so the bytes repeat). */
export async function classComparison(ctx: FigureContext): Promise<SiteFigure> {
  const rows = cellRows(ctx.result.cells).filter((r) => r.feC > 0);
  const random = seededUniform(1);
  const values: ClassValue[] = rows.map((r) => ({ phytoClass: r.phytoClass, feC: r.feC, jitter: random() - 0.5 }));
  const level = ctx.result.fits?.options.level ?? 0.95;
  const summaries: ClassSummary[] = [];
  for (const c of distinct(rows, (r) => r.phytoClass)) {
    const g = geometricMean(rows.filter((r) => r.phytoClass === c).map((r) => r.feC), level);
    if (g) summaries.push({ phytoClass: c, mean: g.value, lower: g.lower, upper: g.upper });
  }
  const ancova = ctx.result.fits?.classDifferences.ancova ?? null;
  const test = ancova
    ? ` An ANCOVA of log10 Fe:C on log10 dFe gives F = ${sig(ancova.equalSlopes.f)} (df ${ancova.equalSlopes.df1}, ${ancova.equalSlopes.df2}, p ${pText(ancova.equalSlopes.p).startsWith('<') ? pText(ancova.equalSlopes.p) : `= ${pText(ancova.equalSlopes.p)}`}) for equal slopes across classes.`
    : '';
  return {
    id: 'class-comparison',
    page: 'quotas',
    title: 'Fe:C by class',
    caption: `Fe:C of ${values.length} cells by class; diamonds are geometric means with ${Math.round(level * 100)} % intervals: ${summaries.map((s) => `${s.phytoClass} ${sig(s.mean)} (${sig(s.lower)}–${sig(s.upper)}) µmol mol⁻¹`).join(', ')}.${test}`,
    alt: `Strip and box plot of Fe:C on a log axis for ${summaries.length} classes with their geometric means.`,
    ...(await renderSpec(ctx.renderer, classComparisonSpec(values, summaries))),
    csv: figureCsv(summaries.map((s) => ({ ...s, n: rows.filter((r) => r.phytoClass === s.phytoClass).length })), [{ key: 'phytoClass', header: 'class' }, 'n', { key: 'mean', header: 'geometric_mean_fe_c_umol_mol' }, 'lower', 'upper']),
    caution: null,
  };
}

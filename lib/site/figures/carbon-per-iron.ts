// Quotas page: implied C:Fe (mol C per mol Fe in the cells) by class and region, with the caution about its use.
import { luxuryUptakeSpec } from '../../figures/index.js';
import { cellRows } from './cell-rows.js';
import { classRegionEstimates, estimatesCsv } from './class-region-estimates.js';
import { sig } from './format.js';
import { CARBON_PER_IRON_CAUTION } from './messages.js';
import { regionNames } from './region-names.js';
import { renderSpec } from './render-spec.js';
import type { FigureContext, SiteFigure } from './site-figure.js';

/** The implied C:Fe efficiency figure; always carries CARBON_PER_IRON_CAUTION. */
export async function carbonPerIron(ctx: FigureContext): Promise<SiteFigure> {
  const level = ctx.result.fits?.options.level ?? 0.95;
  const estimates = classRegionEstimates(cellRows(ctx.result.cells), (r) => r.cFe, regionNames(ctx.result.regions), level);
  const values = estimates.map((e) => e.value).sort((a, b) => a - b);
  return {
    id: 'c-fe-efficiency',
    page: 'quotas',
    title: 'Implied C:Fe by class and region',
    caption:
      `Geometric mean cellular C:Fe (mol mol⁻¹, the inverse of Fe:C) for ${estimates.length} class × region groups with ${Math.round(level * 100)} % intervals` +
      `${values.length ? `, from ${sig(values[0])} to ${sig(values[values.length - 1])}` : ''}. These describe the cells measured, not the carbon that added iron would remove.`,
    alt: 'Dot plot of implied carbon-to-iron ratios per region, one dot per class with an interval, on a log axis.',
    ...(await renderSpec(ctx.renderer, luxuryUptakeSpec(estimates, { quantity: 'c-to-fe' }))),
    csv: estimatesCsv(estimates, 'c_fe_mol_mol'),
    caution: CARBON_PER_IRON_CAUTION,
  };
}

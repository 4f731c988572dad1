// Quotas page: luxury-uptake index (Fe:C over the class's cited minimum Fe:C) by class and region.
import { luxuryUptakeSpec } from '../../figures/index.js';
import { cellRows } from './cell-rows.js';
import { classRegionEstimates, estimatesCsv } from './class-region-estimates.js';
import { sig } from './format.js';
import { regionNames } from './region-names.js';
import { renderSpec } from './render-spec.js';
import type { FigureContext, SiteFigure } from './site-figure.js';

/** The luxury-uptake figure, or null when no class in the config gives min_fe_c. */
export async function luxuryUptake(ctx: FigureContext): Promise<SiteFigure | null> {
  const withMin = Object.entries(ctx.config.classes).filter(([, c]) => c.min_fe_c).sort(([a], [b]) => (a < b ? -1 : 1));
  if (!withMin.length) return null;
  const level = ctx.result.fits?.options.level ?? 0.95;
  const rows = cellRows(ctx.result.cells);
  const estimates = classRegionEstimates(rows, (r) => r.luxury, regionNames(ctx.result.regions), level);
  const above = estimates.filter((e) => e.lower > 1).length;
  return {
    id: 'luxury-uptake',
    page: 'quotas',
    title: 'Luxury-uptake index by class and region',
    caption:
      `Geometric mean of Fe:C divided by each class's reference minimum Fe:C (${withMin.map(([name, c]) => `${name} ${sig(c.min_fe_c!.value)} µmol mol⁻¹`).join(', ')}) for ${estimates.length} class × region groups, ` +
      `with ${Math.round(level * 100)} % intervals; ${above} groups lie wholly above 1, the dashed line where cells hold only their minimum iron.`,
    alt: `Dot plot of the luxury-uptake index per region, one dot per class with an interval, on a log axis with a reference line at 1.`,
    ...(await renderSpec(ctx.renderer, luxuryUptakeSpec(estimates, { quantity: 'index' }))),
    csv: estimatesCsv(estimates, 'luxury_index'),
    caution: null,
  };
}

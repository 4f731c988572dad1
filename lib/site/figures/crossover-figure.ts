// Quotas page: deep dFe offsets between cruise pairs at crossover stations, with 95 % intervals.
import { crossoverOffsetsSpec, type CrossoverOffset } from '../../figures/index.js';
import { rowsCsv } from './rows-csv.js';
import { tQuantile } from '../../stats/index.js';
import { sig } from './format.js';
import { renderSpec } from './render-spec.js';
import type { FigureContext, SiteFigure } from './site-figure.js';

/** The crossover offsets figure, or null when no cruise pair met. */
export async function crossoverFigure(ctx: FigureContext): Promise<SiteFigure | null> {
  const offsets = ctx.result.crossover.offsets;
  if (!offsets.length) return null;
  const rows: (CrossoverOffset & { flagged: boolean; stationPairs: number })[] = offsets.map((o) => {
    // Normal-theory 95 % interval; t on n − 1 depths when there are few.
    const q = o.n_depths > 1 ? tQuantile(0.975, o.n_depths - 1) : 1.96;
    return { pair: `${o.cruise_a} − ${o.cruise_b}`, variable: 'dFe', offset: o.offset_nmol_kg, lower: o.offset_nmol_kg - q * o.se_nmol_kg, upper: o.offset_nmol_kg + q * o.se_nmol_kg, n: o.n_depths, flagged: o.flagged, stationPairs: o.n_station_pairs };
  });
  const flagged = rows.filter((r) => r.flagged);
  const threshold = ctx.config.crossover.threshold_nmol_kg;
  return {
    id: 'crossover-offsets',
    page: 'quotas',
    title: 'Deep dFe offsets between cruises',
    caption:
      `Mean deep dFe difference for ${rows.length} cruise pairs at nearby stations, with 95 % intervals; ` +
      `${flagged.length ? `${flagged.map((r) => `${r.pair} ${sig(r.offset, 2)} nmol kg⁻¹ (${r.n} depths)`).join(', ')} exceed${flagged.length === 1 ? 's' : ''}` : 'none exceeds'} the ${sig(threshold)} nmol kg⁻¹ threshold.`,
    alt: `Dot plot of dFe offsets with error bars for ${rows.length} cruise pairs against a zero line.`,
    ...(await renderSpec(ctx.renderer, crossoverOffsetsSpec(rows, { unit: 'nmol kg⁻¹' }))),
    csv: rowsCsv(rows, ['pair', 'variable', { key: 'offset', header: 'offset_nmol_kg' }, 'lower', 'upper', { key: 'n', header: 'depths' }, { key: 'stationPairs', header: 'station_pairs' }, 'flagged']),
    caution: null,
  };
}

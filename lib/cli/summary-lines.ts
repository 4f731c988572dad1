// The closing lines of `basinquota build`: per class the primary fit with its interval, and the flagged regions.
import type { PipelineResult } from '../pipeline/index.js';
import { formatNumber } from '../version/index.js';

/** Lines printed after a successful build. */
export function summaryLines(result: PipelineResult): string[] {
  const lines: string[] = [];
  for (const cls of result.fits?.classes ?? []) {
    if (!cls.fitted) {
      lines.push(`  ${cls.class}: not fitted (${cls.reason})`);
      continue;
    }
    const model = cls.models.find((m) => m.model === cls.primary);
    if (!model || !model.fitted) continue;
    const params = model.parameters as Record<string, { estimate: number; interval: { lower: number; upper: number } }>;
    const [name, p] = 'exponent' in params ? ['exponent', params.exponent] : Object.entries(params)[0];
    lines.push(`  ${cls.class}: ${cls.primary} ${name} ${formatNumber(p.estimate)} (95 % CI ${formatNumber(p.interval.lower)}–${formatNumber(p.interval.upper)}), n = ${cls.nCells} cells at ${cls.nStations} stations`);
  }
  const flagged = (result.anomalies?.groups ?? []).filter((g) => g.flag === 'lower-than-fit' || g.flag === 'higher-than-fit');
  lines.push(`  flagged region × class groups: ${flagged.length}${flagged.length ? ` (${flagged.map((g) => `${g.region}/${g.phytoClass} ${g.flag}`).join(', ')})` : ''}`);
  return lines;
}

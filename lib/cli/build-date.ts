// The build date: SOURCE_DATE_EPOCH (reproducible-builds.org) or the newest input time, never the clock.
import type { PipelineResult } from '../pipeline/index.js';

/** ISO date (YYYY-MM-DD) of the build. */
export function buildDate(result: PipelineResult, env: NodeJS.ProcessEnv = process.env): string {
  const epoch = env.SOURCE_DATE_EPOCH;
  if (epoch && /^\d+$/.test(epoch)) return new Date(Number(epoch) * 1000).toISOString().slice(0, 10);
  let newest = -Infinity;
  for (const table of [result.samples, result.cells]) {
    if (!table.columnNames().includes('time')) continue;
    const t = table.array('time') as ArrayLike<number>;
    for (let i = 0; i < t.length; i++) if (t[i] > newest) newest = t[i];
  }
  return Number.isFinite(newest) ? new Date(newest).toISOString().slice(0, 10) : '1970-01-01';
}

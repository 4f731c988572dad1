// Property tests: runPipeline on random faulty sample and cell tables never throws and keeps the ledger invariant per file.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { stringify } from 'yaml';
import { configHooks } from '../../lib/cli/config-hooks.js';
import { parseConfig } from '../../lib/config/index.js';
import { runPipeline, type ProjectInputs } from '../../lib/pipeline/index.js';
import { baseConfig } from '../corpus/make-project.js';
import { ledgerBalance } from '../corpus/run-case.js';
import { cellsTable, samplesTable } from './arbitraries.js';

const SEED = 20240317;
const encoder = new TextEncoder();

function inputs(samples: string, cells: string): ProjectInputs {
  const configText = stringify(baseConfig());
  const parsed = parseConfig('basinquota.yaml', configText, configHooks());
  if (!parsed.config) throw new Error(`base config invalid: ${JSON.stringify(parsed.problems)}`);
  const files = new Map([
    ['samples.csv', { name: 'samples.csv', bytes: encoder.encode(samples) }],
    ['cells.csv', { name: 'cells.csv', bytes: encoder.encode(cells) }],
  ]);
  return { configFile: 'basinquota.yaml', config: parsed.config, configText, files };
}

describe('runPipeline(random faulty tables)', () => {
  it('runPipeline(samples, cells) never throws and rows read = rows used + rows excluded for every file', () => {
    fc.assert(
      fc.property(samplesTable, cellsTable, (s, c) => {
        const result = runPipeline(inputs(s.text, c.text));
        expect(result.problems.filter((p) => p.message.includes('internal'))).toEqual([]);
        if (result.problems.some((p) => p.severity === 'error')) return;
        const balance = ledgerBalance(result);
        expect(balance.map((b) => b.file).sort()).toEqual(['cells.csv', 'samples.csv']);
        for (const b of balance) expect({ file: b.file, read: b.read }).toEqual({ file: b.file, read: b.used + b.excluded });
      }),
      { seed: SEED, numRuns: 50 },
    );
  });
});

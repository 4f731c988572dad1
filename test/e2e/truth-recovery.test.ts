// The demo was generated from a documented truth (data/demo/truth.json, truth-cells.csv); the pipeline must recover it.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { beforeAll, describe, expect, it } from 'vitest';
import { readProject } from '../../lib/cli/read-project.js';
import { runPipeline, type PipelineResult } from '../../lib/pipeline/index.js';

const DEMO = join(import.meta.dirname, '..', '..', 'data', 'demo');

interface Truth {
  fe_c_law: { classes: Record<string, { exponent: number; intercept: number }> };
  low_iron_region: { stations: string[] };
}

let result: PipelineResult;
const truth = JSON.parse(readFileSync(join(DEMO, 'truth.json'), 'utf8')) as Truth;

beforeAll(() => {
  const project = readProject(DEMO);
  expect(project.problems.filter((p) => p.severity === 'error')).toEqual([]);
  result = runPipeline(project.inputs!);
  expect(result.problems.filter((p) => p.severity === 'error')).toEqual([]);
});

describe('runPipeline(demo) against the generator truth', () => {
  it('recovers every cell’s true Fe:C within the rounding of the written contents (6 significant digits)', () => {
    const rows = parse(readFileSync(join(DEMO, 'truth-cells.csv'), 'utf8'), { columns: true }) as Record<string, string>[];
    const ids = result.cells.array('cell_id') as ArrayLike<string>;
    const feC = result.cells.array('fe_c') as ArrayLike<number>;
    const byId = new Map<string, number>();
    for (let i = 0; i < ids.length; i++) byId.set(ids[i], feC[i]);
    let compared = 0;
    for (const row of rows) {
      if (row.fault) {
        expect(byId.has(row.cell_id)).toBe(false); // the faulty cells are ledgered, not in the merged table
        continue;
      }
      const got = byId.get(row.cell_id);
      expect(got, row.cell_id).toBeDefined();
      expect(Math.abs(got! / Number(row.true_fe_c_umol_mol) - 1)).toBeLessThan(1e-4);
      compared++;
    }
    expect(compared).toBe(result.cells.numRows());
  });

  it('matches every cell to a bottle of its station (the truth used the bottle at the cell depth)', () => {
    const source = Array.from(result.cells.array('ambient_dissolved_fe_source') as ArrayLike<string>);
    expect(new Set(source)).toEqual(new Set(['bottle']));
  });

  it('each class’s fitted exponent has the generator’s exponent inside its 95 % interval', () => {
    for (const [cls, law] of Object.entries(truth.fe_c_law.classes)) {
      const fit = result.fits!.classes.find((c) => c.class === cls);
      expect(fit?.fitted, cls).toBe(true);
      if (!fit?.fitted) continue;
      const ols = fit.models.find((m) => m.model === 'ols');
      if (!ols?.fitted || ols.model === 'saturating') throw new Error(`no OLS fit for ${cls}`);
      const { lower, upper } = ols.parameters.exponent.interval;
      expect(law.exponent, cls).toBeGreaterThanOrEqual(lower);
      expect(law.exponent, cls).toBeLessThanOrEqual(upper);
    }
  });

  it('flags the deliberately depleted region lower-than-fit for every class, and no other region', () => {
    const flagged = result.anomalies!.groups.filter((g) => g.flag !== 'none' && g.status === 'tested');
    expect(flagged.map((g) => `${g.region} ${g.phytoClass} ${g.flag}`).sort()).toEqual(
      Object.keys(truth.fe_c_law.classes)
        .sort()
        .map((cls) => `south-atlantic ${cls} lower-than-fit`),
    );
  });

  it('keeps the ledger invariant per input file: rows read = rows kept + rows excluded', () => {
    for (const count of result.counts) {
      const table = count.table === 'samples' ? result.samples : result.cells;
      const kept = (Array.from(table.array('source_file') as ArrayLike<string>) as string[]).filter((f) => f === count.file).length;
      expect(kept + result.ledger.excluded(count.table, count.file).length, count.file).toBe(count.rowsRead);
    }
  });
});

describe('runPipeline(demo) cross-cruise comparison', () => {
  it('recovers the dFe offset injected into one cruise below 1000 m within two standard errors', () => {
    const crossover = JSON.parse(readFileSync(join(DEMO, 'truth.json'), 'utf8')).crossover as { cruise: string; reference_cruise: string; offset_nmol_kg: number };
    const pair = result.crossover.offsets.find((o) => [o.cruise_a, o.cruise_b].sort().join() === [crossover.cruise, crossover.reference_cruise].sort().join());
    expect(pair).toBeDefined();
    // offset_nmol_kg is cruise_a − cruise_b; the truth adds the offset to `cruise`.
    const expected = pair!.cruise_a === crossover.cruise ? crossover.offset_nmol_kg : -crossover.offset_nmol_kg;
    // Two SE, not one: a ±1 SE interval misses the truth about a third of the time even when unbiased (common practice).
    expect(Math.abs(pair!.offset_nmol_kg - expected)).toBeLessThanOrEqual(2 * pair!.se_nmol_kg);
    expect(pair!.n_station_pairs).toBe(3);
    expect(pair!.flagged).toBe(true);
  });
});

import * as aq from 'arquero';
import { randomLcg, randomNormal } from 'd3-random';
import { describe, expect, it } from 'vitest';
import { Ledger } from '../../lib/ledger/index.js';
import { applyOffsets, crossoverOffsets } from '../../lib/match/index.js';

/** Deep profile, linear in depth so linear interpolation between bottles is exact (nmol/kg). */
function truth(z: number): number {
  return 0.4 + 0.0001 * (z - 1000);
}

interface Synth {
  offset: number;
  noise?: () => number;
  pairs?: number;
}

/** Cruise A samples every 200 m, cruise B every 300 m from 900 m, at the same stations 20 km apart; B reads `offset` high. */
function twoCruises({ offset, noise = () => 0, pairs = 6 }: Synth): aq.ColumnTable {
  const rows: Record<string, unknown>[] = [];
  for (let s = 0; s < pairs; s++) {
    // Stations 10° of longitude apart, so only the intended A–B pairs fall within 200 km.
    const lon = -170 + s * 10;
    for (let z = 800; z <= 4000; z += 200) rows.push({ cruise: 'A', station: `a${s}`, lat: -40, lon, time: Date.UTC(2010, 0, 1), depth: z, dissolved_fe: truth(z) + noise(), dissolved_fe_quality: 'good' });
    for (let z = 900; z <= 4200; z += 300) rows.push({ cruise: 'B', station: `b${s}`, lat: -40.18, lon, time: Date.UTC(2018, 5, 1), depth: z, dissolved_fe: truth(z) + offset + noise(), dissolved_fe_quality: 'good' });
  }
  return aq.from(rows.map((r, i) => ({ ...r, source_file: 'deep.csv', source_line: i + 2 })));
}

describe('crossoverOffsets(samples, options)', () => {
  it('recovers an injected offset exactly from noiseless profiles', () => {
    const { offsets, pairs } = crossoverOffsets(twoCruises({ offset: 0.08 }));
    expect(pairs).toHaveLength(6);
    expect(offsets).toHaveLength(1);
    const [o] = offsets;
    expect([o.cruise_a, o.cruise_b]).toEqual(['A', 'B']);
    // A − B = −0.08 nmol/kg by construction.
    expect(o.offset_nmol_kg).toBeCloseTo(-0.08, 12);
    expect(o.n_station_pairs).toBe(6);
    // Common depths 1000, 1250, …, 4000 m (13) are covered by both A (800–4000) and B (900–4200).
    expect(o.n_depths).toBe(6 * 13);
    expect(o.se_basis).toBe('station-pairs');
    expect(pairs[0].distance_km).toBeCloseTo(0.18 * 111.19508023353291, 6); // Haversine 1° of latitude = 111.195 km (IUGG mean radius).
    expect(pairs[0].days_apart).toBeCloseTo((Date.UTC(2018, 5, 1) - Date.UTC(2010, 0, 1)) / 86_400_000, 9);
  });

  it('recovers a noisy injected offset within its standard error, with about nominal coverage over replicates', () => {
    const rng = randomNormal.source(randomLcg(42))(0, 0.03);
    const { offsets } = crossoverOffsets(twoCruises({ offset: 0.08, noise: rng }), { thresholdNmolKg: 0.05 });
    const [o] = offsets;
    expect(Math.abs(o.offset_nmol_kg - -0.08)).toBeLessThan(o.se_nmol_kg * 2);
    expect(o.flagged).toBe(true);
    // Over 300 seeded replicates the ±1 SE and ±2 SE intervals (6 station pairs, 5 df) should cover the truth
    // P(|t₅| < 1) = 0.637 and P(|t₅| < 2) = 0.898 of the time (Student t, from memory); allow sampling error of ~±0.06.
    let within1 = 0;
    let covered = 0;
    const reps = 300;
    for (let r = 0; r < reps; r++) {
      const noise = randomNormal.source(randomLcg(1000 + r))(0, 0.03);
      const [rep] = crossoverOffsets(twoCruises({ offset: 0.08, noise })).offsets;
      if (Math.abs(rep.offset_nmol_kg + 0.08) < rep.se_nmol_kg) within1++;
      if (Math.abs(rep.offset_nmol_kg + 0.08) < 2 * rep.se_nmol_kg) covered++;
    }
    expect(within1 / reps).toBeGreaterThan(0.57);
    expect(within1 / reps).toBeLessThan(0.7);
    expect(covered / reps).toBeGreaterThan(0.84);
    expect(covered / reps).toBeLessThan(0.96);
  });

  it('leaves out stations beyond the distance or time window and does not flag offsets within the threshold', () => {
    expect(crossoverOffsets(twoCruises({ offset: 0.08 }), { maxDistanceKm: 15 }).offsets).toEqual([]);
    expect(crossoverOffsets(twoCruises({ offset: 0.08 }), { maxDaysApart: 365 }).offsets).toEqual([]);
    const [small] = crossoverOffsets(twoCruises({ offset: 0.02 })).offsets;
    expect(small.flagged).toBe(false);
  });

  it('uses depth differences for the standard error of a single station pair', () => {
    const [o] = crossoverOffsets(twoCruises({ offset: 0.08, pairs: 1 })).offsets;
    expect(o.se_basis).toBe('depths');
    expect(o.se_nmol_kg).toBeCloseTo(0, 12);
  });
});

describe('applyOffsets(samples, approved, ledger)', () => {
  it('subtracts an approved offset from one cruise and ledgers each changed row', () => {
    const samples = aq.from([
      { cruise: 'A', dissolved_fe: 0.5, source_file: 'a.csv', source_line: 2 },
      { cruise: 'B', dissolved_fe: 0.58, source_file: 'b.csv', source_line: 2 },
      { cruise: 'B', dissolved_fe: Number.NaN, source_file: 'b.csv', source_line: 3 },
    ]);
    const before = JSON.stringify(samples.objects());
    const ledger = new Ledger();
    const out = applyOffsets(samples, [{ cruise: 'B', offsetNmolKg: 0.08 }], ledger);
    expect(out.array('dissolved_fe')[0]).toBe(0.5);
    expect(out.array('dissolved_fe')[1] as number).toBeCloseTo(0.5, 12);
    expect(out.array('dissolved_fe')[2]).toBeNaN();
    expect(ledger.entries).toHaveLength(1);
    expect(ledger.entries[0]).toMatchObject({ table: 'samples', file: 'b.csv', line: 2, action: 'converted', reason: 'crossover-offset-applied' });
    expect(ledger.entries[0].detail).toBe('dissolved_fe of cruise B corrected by −(0.08) nmol/kg: 0.58 → 0.49999999999999994');
    expect(JSON.stringify(samples.objects())).toBe(before);
  });
});

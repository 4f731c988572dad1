import * as aq from 'arquero';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Ledger } from '../../lib/ledger/index.js';
import { matchCells } from '../../lib/match/index.js';
import type { GridSampler } from '../../lib/match/index.js';
import type { Grid } from '../../lib/types.js';
import { sampleGrid } from '../../lib/geo/index.js';

interface Bottle {
  station?: string;
  cast?: string;
  depth: number;
  fe?: number;
  no3?: number;
  feQuality?: string;
  lat?: number;
  lon?: number;
  time?: number;
}

function samples(bottles: Bottle[]): aq.ColumnTable {
  return aq.from(
    bottles.map((b, i) => ({
      cruise: 'C1',
      station: b.station ?? 'S1',
      cast: b.cast ?? '',
      bottle: String(i + 1),
      lat: b.lat ?? -50,
      lon: b.lon ?? 140,
      time: b.time ?? Date.UTC(2020, 0, 15),
      depth: b.depth,
      dissolved_fe: b.fe ?? Number.NaN,
      dissolved_fe_quality: b.fe === undefined ? 'missing' : (b.feQuality ?? 'good'),
      dissolved_fe_below_dl: false,
      nitrate: b.no3 ?? Number.NaN,
      nitrate_quality: b.no3 === undefined ? 'missing' : 'good',
      nitrate_below_dl: false,
      source_file: 'bottles.csv',
      source_line: i + 2,
    })),
  );
}

function cells(rows: { depth: number; station?: string; cast?: string; lat?: number; lon?: number; time?: number }[]): aq.ColumnTable {
  return aq.from(
    rows.map((r, i) => ({
      cell_id: `c${i + 1}`,
      cruise: 'C1',
      station: r.station ?? 'S1',
      cast: r.cast ?? '',
      lat: r.lat ?? -50,
      lon: r.lon ?? 140,
      time: r.time ?? Date.UTC(2020, 0, 16),
      depth: r.depth,
      phyto_class: 'diatom',
      source_file: 'cells.csv',
      source_line: i + 2,
    })),
  );
}

const profile = samples([
  { depth: 10, fe: 0.1, no3: 20 },
  { depth: 30, fe: 0.2, no3: 22 },
  { depth: 50, fe: 0.3, no3: 24 },
  { depth: 150, fe: 0.5, no3: 28 },
]);

describe('matchCells(cells, samples, grids, options, ledger)', () => {
  it('takes the bottle nearest in depth at the same station', () => {
    const out = matchCells(cells([{ depth: 28 }]), profile, [], {}, new Ledger());
    expect(out.get('ambient_dissolved_fe', 0)).toBe(0.2);
    expect(out.get('ambient_dissolved_fe_source', 0)).toBe('bottle');
    expect(out.get('ambient_dissolved_fe_offset_m', 0)).toBe(2);
    expect(out.get('ambient_dissolved_fe_quality', 0)).toBe('good');
    expect(out.get('ambient_nitrate', 0)).toBe(22);
    expect(out.get('position_source', 0)).toBe('cell');
  });

  it('matches a bottle exactly at the default tolerance max(10 m, 10 % of depth) and not beyond', () => {
    const options = { interpolateBracketing: false };
    // Cell at 40 m: tolerance max(10, 4) = 10 m; bottles at 30 and 50 are exactly 10 m away → the shallower wins the tie.
    const atEdge = matchCells(cells([{ depth: 40 }]), profile, [], options, new Ledger());
    expect(atEdge.get('ambient_dissolved_fe', 0)).toBe(0.2);
    expect(atEdge.get('ambient_dissolved_fe_offset_m', 0)).toBe(-10);
    // Cell at 135 m: tolerance 13.5 m; bottle at 150 is 15 m away → no bottle match.
    const ledger = new Ledger();
    const beyond = matchCells(cells([{ depth: 135 }]), profile, [], options, ledger);
    expect(beyond.get('ambient_dissolved_fe_source', 0)).toBe('none');
    expect(beyond.get('ambient_dissolved_fe', 0)).toBeNaN();
    // Cell at 136.4 m: tolerance 13.64 m, bottle 13.6 m away → matched.
    const inside = matchCells(cells([{ depth: 136.4 }]), profile, [], options, new Ledger());
    expect(inside.get('ambient_dissolved_fe', 0)).toBe(0.5);
  });

  it('takes a fixed tolerance when given a number', () => {
    const out = matchCells(cells([{ depth: 35 }]), profile, [], { depthToleranceM: 4, interpolateBracketing: false }, new Ledger());
    expect(out.get('ambient_dissolved_fe_source', 0)).toBe('none');
  });

  it('interpolates linearly between bracketing bottles when the nearest is outside the tolerance', () => {
    // Cell at 100 m between 50 m (0.3) and 150 m (0.5), gap 100 m = default max gap: 0.3 + 0.5·0.2 = 0.4.
    const out = matchCells(cells([{ depth: 100 }]), profile, [], {}, new Ledger());
    expect(out.get('ambient_dissolved_fe_source', 0)).toBe('bottle-interpolated');
    expect(out.get('ambient_dissolved_fe', 0) as number).toBeCloseTo(0.4, 12);
    expect(out.get('ambient_nitrate', 0) as number).toBeCloseTo(26, 12);
    // Offset to the nearer bracketing bottle (50 m is 50 m above; equal distance → the shallower, signed negative).
    expect(out.get('ambient_dissolved_fe_offset_m', 0)).toBe(-50);
    // A smaller max gap refuses the bracket.
    const refused = matchCells(cells([{ depth: 100 }]), profile, [], { maxBracketGapM: 99 }, new Ledger());
    expect(refused.get('ambient_dissolved_fe_source', 0)).toBe('none');
  });

  it('does not interpolate across casts, and keeps to the cell’s cast when both give one', () => {
    const twoCasts = samples([
      { cast: '1', depth: 50, fe: 0.3 },
      { cast: '2', depth: 150, fe: 0.5 },
      { cast: '2', depth: 20, fe: 0.9 },
    ]);
    const mixed = matchCells(cells([{ depth: 100 }]), twoCasts, [], {}, new Ledger());
    expect(mixed.get('ambient_dissolved_fe_source', 0)).toBe('none');
    const ownCast = matchCells(cells([{ depth: 45, cast: '2' }]), twoCasts, [], {}, new Ledger());
    // Cast 2 has 20 and 150 m: nearest 25 m away (tolerance 10 m); bracket 20–150 m is a 130 m gap → nothing from the bottles.
    expect(ownCast.get('ambient_dissolved_fe_source', 0)).toBe('none');
    const ledger = new Ledger();
    const unknownCast = matchCells(cells([{ depth: 50, cast: '7' }]), twoCasts, [], {}, ledger);
    expect(unknownCast.get('ambient_dissolved_fe_source', 0)).toBe('none');
    expect(ledger.entries[0].detail).toBe('no ambient dissolved_fe: no usable bottle of cast 7; no grid given; cell kept with dissolved_fe missing');
  });

  it('falls back to the grid at the cell’s position, depth and month', () => {
    const calls: Parameters<GridSampler>[] = [];
    const fake: GridSampler = (grid, point, opts) => {
      calls.push([grid, point, opts]);
      return grid.quantity === 'dissolved_fe' ? { value: 0.77, distanceKm: 12.5 } : null;
    };
    const grid = { quantity: 'dissolved_fe' } as Grid;
    const out = matchCells(cells([{ depth: 800, station: 'elsewhere', lat: -55, lon: 150, time: Date.UTC(2020, 6, 3) }]), profile, [{ quantity: 'dissolved_fe', grid }], { sampleGrid: fake, maxGridDistanceKm: 50 }, new Ledger());
    expect(out.get('ambient_dissolved_fe', 0)).toBe(0.77);
    expect(out.get('ambient_dissolved_fe_source', 0)).toBe('grid');
    expect(out.get('ambient_dissolved_fe_distance_km', 0)).toBe(12.5);
    expect(out.get('ambient_dissolved_fe_quality', 0)).toBe('good');
    expect(out.get('ambient_dissolved_fe_offset_m', 0)).toBeNaN();
    expect(calls).toHaveLength(1);
    expect(calls[0][1]).toEqual({ lon: 150, lat: -55, depth: 800, month: 7, timeMs: Date.UTC(2020, 6, 3) });
    expect(calls[0][2]).toEqual({ maxDistanceKm: 50 });
  });

  it('keeps a cell without any ambient value and flags it once per quantity', () => {
    const ledger = new Ledger();
    const out = matchCells(cells([{ depth: 600 }]), profile, [], {}, ledger);
    expect(out.numRows()).toBe(1);
    expect(ledger.entries.map((e) => [e.action, e.reason, e.line])).toEqual([
      ['flagged', 'no-ambient-dissolved_fe', 2],
      ['flagged', 'no-ambient-nitrate', 2],
    ]);
    expect(ledger.entries[0].detail).toBe('no ambient dissolved_fe: nearest bottle 450.0 m away (tolerance 60.0 m); no grid given; cell kept with dissolved_fe missing');
  });

  it('marks cells matched to questionable bottles and skips bad ones', () => {
    const flagged = samples([
      { depth: 20, fe: 0.4, feQuality: 'questionable', no3: 1 },
      { depth: 22, fe: 9.9, feQuality: 'bad', no3: 1 },
    ]);
    const out = matchCells(cells([{ depth: 22 }]), flagged, [], {}, new Ledger());
    expect(out.get('ambient_dissolved_fe', 0)).toBe(0.4);
    expect(out.get('ambient_dissolved_fe_quality', 0)).toBe('questionable');
  });

  it('gives a cell without position its station’s mean bottle position, across the dateline', () => {
    const dateline = samples([
      { depth: 10, fe: 0.1, lat: -60, lon: 179 },
      { depth: 20, fe: 0.1, lat: -62, lon: -179 },
    ]);
    const ledger = new Ledger();
    const out = matchCells(cells([{ depth: 10, lat: Number.NaN, lon: Number.NaN }]), dateline, [], {}, ledger);
    expect(out.get('lat', 0)).toBeCloseTo(-61, 12);
    // Circular mean of 179°E and 179°W is the dateline, written −180 in [-180, 180).
    expect(out.get('lon', 0) as number).toBeCloseTo(-180, 9);
    expect(out.get('position_source', 0)).toBe('station');
    expect(ledger.entries[0].reason).toBe('station-position');
    expect(ledger.entries[0].action).toBe('converted');
    expect(out.columnNames().indexOf('lat')).toBe(4);
  });

  it('excludes a cell whose station is in no sample file and that has no position', () => {
    const ledger = new Ledger();
    const input = cells([{ depth: 10 }, { depth: 10, station: 'ghost', lat: Number.NaN, lon: Number.NaN }]);
    const out = matchCells(input, profile, [], {}, ledger);
    expect(out.array('cell_id')).toEqual(['c1']);
    const excluded = ledger.excluded('cells');
    expect(excluded.map((e) => [e.line, e.reason, e.detail])).toEqual([
      [3, 'no-position', 'cell has no lat/lon and station ghost of cruise C1 has no positioned bottle in the samples; cell excluded'],
    ]);
    // Ledger invariant: rows in = rows out + excluded.
    expect(out.numRows() + excluded.length).toBe(input.numRows());
  });

  it('does not mutate its inputs and writes the ambient columns in a stable order', () => {
    const input = cells([{ depth: 28 }]);
    const before = [JSON.stringify(input.objects()), JSON.stringify(profile.objects())];
    const out = matchCells(input, profile, [], {}, new Ledger());
    expect([JSON.stringify(input.objects()), JSON.stringify(profile.objects())]).toEqual(before);
    expect(out.columnNames().slice(input.numCols())).toEqual([
      'position_source',
      'ambient_dissolved_fe', 'ambient_dissolved_fe_source', 'ambient_dissolved_fe_offset_m', 'ambient_dissolved_fe_distance_km', 'ambient_dissolved_fe_quality', 'ambient_dissolved_fe_below_dl',
      'ambient_nitrate', 'ambient_nitrate_source', 'ambient_nitrate_offset_m', 'ambient_nitrate_distance_km', 'ambient_nitrate_quality', 'ambient_nitrate_below_dl',
    ]);
  });

  it('refuses grids without a sampler', () => {
    expect(() => matchCells(cells([]), profile, [{ quantity: 'nitrate', grid: {} as Grid }], {}, new Ledger())).toThrow('matchCells was given grids but no sampleGrid function');
  });

  // Speed is measured by `npm run bench`, not by timed unit tests.
  it('matches a large table of cells to their bottles, every cell within its tolerance', () => {
    const bottles: Bottle[] = [];
    for (let s = 0; s < 500; s++) for (let z = 0; z < 24; z++) bottles.push({ station: `S${s}`, depth: z * 25, fe: 0.1 + z * 0.01, no3: 20 });
    const table = samples(bottles);
    const n = 20_000;
    const many = aq.table({
      cell_id: Array.from({ length: n }, (_, i) => `c${i}`),
      cruise: new Array<string>(n).fill('C1'),
      station: Array.from({ length: n }, (_, i) => `S${i % 500}`),
      cast: new Array<string>(n).fill(''),
      lat: new Float64Array(n).fill(-50),
      lon: new Float64Array(n).fill(140),
      time: new Float64Array(n).fill(0),
      depth: Float64Array.from({ length: n }, (_, i) => (i * 7) % 500),
    });
    const ledger = new Ledger();
    const out = matchCells(many, table, [], {}, ledger);
    expect(out.numRows()).toBe(n);
    // Bottles every 25 m: the nearest is at most 12.5 m away, within max(10 m, 10 % of depth) below 125 m, interpolated above.
    const source = new Set(Array.from(out.array('ambient_dissolved_fe_source') as ArrayLike<string>));
    expect([...source].every((s) => s === 'bottle' || s === 'bottle-interpolated')).toBe(true);
  });
});

describe('matchCells ledger invariant', () => {
  it('accepts the real lib/geo sampler as its GridSampler', () => {
    const real: GridSampler = sampleGrid;
    expect(typeof real).toBe('function');
  });

  it('keeps every cell or excludes it with exactly one entry, for arbitrary stations and positions', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            station: fc.constantFrom('S1', 'S2', 'ghost'),
            depth: fc.oneof(fc.double({ min: 0, max: 300, noNaN: true }), fc.constant(Number.NaN)),
            positioned: fc.boolean(),
          }),
          { maxLength: 30 },
        ),
        (rows) => {
          const input = cells(rows.map((r) => ({ station: r.station, depth: r.depth, lat: r.positioned ? -50 : Number.NaN, lon: r.positioned ? 140 : Number.NaN })));
          const ledger = new Ledger();
          const out = matchCells(input, profile, [], {}, ledger);
          const excluded = ledger.excluded('cells');
          expect(out.numRows() + excluded.length).toBe(input.numRows());
          expect(new Set(excluded.map((e) => e.line)).size).toBe(excluded.length);
          // Only positionless cells of unknown stations leave.
          expect(excluded.every((e) => e.reason === 'no-position')).toBe(true);
        },
      ),
      { seed: 7, numRuns: 100 },
    );
  });

  it('carries the below-detection mark of the matched bottle', () => {
    const table = profile.derive({ dissolved_fe_below_dl: (d: { depth: number }) => d.depth === 10 });
    const out = matchCells(cells([{ depth: 12 }, { depth: 30 }]), table, [], {}, new Ledger());
    expect(out.array('ambient_dissolved_fe_below_dl')).toEqual([true, false]);
  });
});

import { describe, expect, it } from 'vitest';
import { createRenderer } from '../../../lib/figures/render.js';
import {
  classComparisonSpec, crossoverOffsetsSpec, feCVsDfeSpec, logBin2d, luxuryUptakeSpec, normalQuantilePoints,
  normalQuantileSpec, profilesSpec, residualByRegionSpec, residualsVsFittedSpec, type FeCPoint,
} from '../../../lib/figures/plots/index.js';
import { testFont } from '../font-fixture.js';

const warnings: string[] = [];
const renderer = createRenderer({ ...testFont, onWarning: (m) => warnings.push(m) });

const classes = ['diatom', 'dinoflagellate'];
const points: FeCPoint[] = [];
for (let i = 0; i < 24; i++) {
  points.push({ phytoClass: classes[i % 2], dfe: 0.05 * 1.3 ** i, feC: 2 * 1.2 ** i, region: i < 12 ? 'Drake' : 'Scotia', matchSource: i % 3 ? 'bottle' : 'grid' });
}
const fit = classes.flatMap((c) => [0.05, 0.5, 5].map((d) => ({ phytoClass: c, dfe: d, fit: 10 * d ** 0.5, lower: 8 * d ** 0.5, upper: 12 * d ** 0.5, predLower: 4 * d ** 0.5, predUpper: 25 * d ** 0.5 })));
const residuals = points.map((p, i) => ({ fitted: Math.log10(p.feC), residual: ((i * 7) % 11) / 20 - 0.25, phytoClass: p.phytoClass, region: p.region ?? '' }));

describe('plot builders', () => {
  it('feCVsDfeSpec(points, fit) matches its committed snapshot', async () => {
    await expect(JSON.stringify(feCVsDfeSpec(points, fit), null, 2) + '\n').toMatchFileSnapshot('__snapshots__/fe-c-vs-dfe.spec.json');
  });

  it('feCVsDfeSpec titles both log axes with units and draws fit, confidence and prediction layers', () => {
    const spec = JSON.stringify(feCVsDfeSpec(points, fit));
    expect(spec).toContain('"title":"Fe:C (µmol mol⁻¹)"');
    expect(spec).toContain('"title":"dissolved Fe (nmol kg⁻¹)"');
    expect(spec.match(/"type":"log"/g)!.length).toBeGreaterThanOrEqual(2);
    expect(spec).toContain('"field":"predLower"');
    expect(JSON.stringify(feCVsDfeSpec(points, fit, { predictionBand: false }))).not.toContain('"field":"predLower"');
  });

  it('feCVsDfeSpec switches to a binned heatmap above denseThreshold points', () => {
    const spec = feCVsDfeSpec(points, fit, { denseThreshold: 10 }) as unknown as { data: { values: { layer: string }[] } };
    const kinds = new Set(spec.data.values.map((r) => r.layer));
    expect(kinds.has('bin')).toBe(true);
    expect(kinds.has('cell')).toBe(false);
  });

  it('every builder renders to SVG without vega or vega-lite warnings', async () => {
    warnings.length = 0;
    const specs = [
      feCVsDfeSpec(points, fit),
      feCVsDfeSpec(points, fit, { denseThreshold: 10, colourBy: 'matchSource' }),
      classComparisonSpec(points.map((p, i) => ({ phytoClass: p.phytoClass, feC: p.feC, jitter: ((i * 37) % 100) / 100 - 0.5 })), classes.map((c) => ({ phytoClass: c, mean: 10, lower: 7, upper: 14 }))),
      residualsVsFittedSpec(residuals),
      normalQuantileSpec(residuals.map((r) => r.residual)),
      residualByRegionSpec(residuals),
      profilesSpec([0, 50, 100, 200].flatMap((depth) => [{ cruise: 'AB01', station: 'S1', depth, dfe: 0.1 + depth / 500, nitrate: 5 + depth / 20 }, { cruise: 'CD02', station: 'S9', depth, dfe: 0.2, nitrate: 20 }])),
      crossoverOffsetsSpec([{ pair: 'AB01 − CD02', variable: 'dFe', offset: 0.03, lower: -0.01, upper: 0.07, n: 8 }], { unit: 'nmol kg⁻¹' }),
      luxuryUptakeSpec([{ phytoClass: 'diatom', region: 'Drake', value: 3, lower: 2, upper: 4.5 }, { phytoClass: 'dinoflagellate', region: 'Drake', value: 1.5, lower: 1.1, upper: 2 }], { quantity: 'index' }),
    ];
    for (const spec of specs) {
      const svg = await renderer.toSvg(spec);
      expect(svg.startsWith('<svg')).toBe(true);
    }
    expect(warnings).toEqual([]);
  });

  it('profilesSpec reverses the depth axis so the surface is at the top', () => {
    expect(JSON.stringify(profilesSpec([{ cruise: 'A', station: 's', depth: 10, dfe: 1 }]))).toContain('"scale":{"reverse":true}');
  });
});

describe('normalQuantilePoints', () => {
  it('normalQuantilePoints(residuals) pairs sorted residuals with Φ⁻¹((i − 0.5)/n)', () => {
    const q = normalQuantilePoints([3, 1, 2]);
    expect(q.map((p) => p.sample)).toEqual([1, 2, 3]);
    // Φ⁻¹(1/6) = −0.9674215661017 (R: qnorm(1/6)); the middle of three is Φ⁻¹(0.5) = 0.
    expect(q[0].theoretical).toBeCloseTo(-0.9674215661017, 9);
    expect(q[1].theoretical).toBeCloseTo(0, 12);
    expect(q[2].theoretical).toBeCloseTo(0.9674215661017, 9);
  });
});

describe('logBin2d', () => {
  it('logBin2d(points, bins) counts every positive point once and skips non-positive ones', () => {
    const pts = [...points.map((p) => ({ group: p.phytoClass, x: p.dfe, y: p.feC })), { group: 'diatom', x: 0, y: 1 }];
    const bins = logBin2d(pts, 5);
    expect(bins.reduce((s, b) => s + b.count, 0)).toBe(points.length);
    for (const b of bins) expect(b.x1).toBeGreaterThan(b.x0);
  });
});

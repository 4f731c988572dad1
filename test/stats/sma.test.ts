import { describe, expect, it } from 'vitest';
import { sma } from '../../lib/stats/sma.js';
import { dist, speed } from './cars.js';
import { expectRel } from './close.js';

describe('sma', () => {
  it('sma(speed, dist) reproduces the standardised major axis of the cars data', () => {
    const f = sma(speed, dist);
    // Warton et al. 2006, Biol. Rev. 81:259 formulas on R datasets::cars, via REFERENCE_VALUES;
    // interval ends to 1e-7 because jstat's t and F quantiles are good to about 2e-8 relative
    expectRel(f.r, 0.8068949006892104, 1e-13);
    expectRel(f.slope, 4.8735080067617425, 1e-13);
    expectRel(f.intercept, -32.0720233041308, 1e-12);
    expectRel(f.slopeCI.lower, 4.1091533978828654, 1e-7);
    expectRel(f.slopeCI.upper, 5.7800422598503953, 1e-7);
    expectRel(f.interceptCI.lower, -45.7357743629291, 1e-7);
    expectRel(f.interceptCI.upper, -18.4082722453326, 1e-7);
  });

  it('sma(x, y) is the geometric mean of the y-on-x and inverted x-on-y OLS slopes (property)', () => {
    const f = sma(speed, dist);
    // b_SMA = b_yx / |r|; equivalently √(b_yx · 1/b_xy) (Warton et al. 2006, §II)
    const n = speed.length;
    const mx = speed.reduce((s, v) => s + v, 0) / n;
    const my = dist.reduce((s, v) => s + v, 0) / n;
    let sxy = 0;
    let sxx = 0;
    let syy = 0;
    for (let i = 0; i < n; i++) {
      sxy += (speed[i] - mx) * (dist[i] - my);
      sxx += (speed[i] - mx) ** 2;
      syy += (dist[i] - my) ** 2;
    }
    expectRel(f.slope, Math.sqrt((sxy / sxx) * (syy / sxy)), 1e-13);
  });

  it('sma(x, −y) has a negative slope with a mirrored interval', () => {
    const f = sma(speed, dist);
    const g = sma(
      speed,
      dist.map((d) => -d),
    );
    expectRel(g.slope, -f.slope, 1e-13);
    expectRel(g.slopeCI.lower, -f.slopeCI.upper, 1e-12);
    expectRel(g.slopeCI.upper, -f.slopeCI.lower, 1e-12);
    expect(g.r).toBeLessThan(0);
  });
});

import { describe, it } from 'vitest';
import { tQuantile } from '../../lib/stats/distributions.js';
import { ols } from '../../lib/stats/ols.js';
import { olsBand } from '../../lib/stats/ols-band.js';
import { dist, speed } from './cars.js';
import { expectRel } from './close.js';

describe('olsBand', () => {
  it('olsBand(fit, [x̄, 0]) gives the textbook half-widths t·s·√(1/n) and the intercept interval', () => {
    const f = ols(speed, dist);
    const t = tQuantile(0.975, 48);
    const c = olsBand(f, [f.meanX, 0], { kind: 'confidence' });
    const p = olsBand(f, [f.meanX], { kind: 'prediction' });
    // Draper & Smith 1998, §1.4: var(ŷ0) = s²(1/n + (x0 − x̄)²/Sxx); prediction adds s²
    expectRel(c.upper[0] - c.fit[0], t * f.residualSE * Math.sqrt(1 / 50), 1e-12);
    expectRel(p.upper[0] - p.fit[0], t * f.residualSE * Math.sqrt(1 + 1 / 50), 1e-12);
    // at x0 = 0 the confidence band is the intercept interval (R confint, via REFERENCE_VALUES; jstat t to ~2e-8)
    expectRel(c.lower[1], -31.16784960238858, 1e-7);
    expectRel(c.upper[1], -3.99034017863321, 1e-7);
  });
});

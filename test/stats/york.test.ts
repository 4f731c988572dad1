import { describe, expect, it } from 'vitest';
import { york } from '../../lib/stats/york.js';
import { expectRel } from './close.js';

// Pearson (1901) data with York (1966) weights, w = 1/σ² (York et al. 2004, Am. J. Phys. 72:367, Table I)
const X = [0, 0.9, 1.8, 2.6, 3.3, 4.4, 5.2, 6.1, 6.5, 7.4];
const Y = [5.9, 5.4, 4.4, 4.6, 3.5, 3.7, 2.8, 2.8, 2.4, 1.5];
const wX = [1000, 1000, 500, 800, 200, 80, 60, 20, 1.8, 1];
const wY = [1, 1.8, 4, 8, 20, 20, 70, 70, 100, 500];
const sX = wX.map((w) => 1 / Math.sqrt(w));
const sY = wY.map((w) => 1 / Math.sqrt(w));

describe('york', () => {
  it('york(x, y, sx, sy) recovers the Pearson–York slope', () => {
    const f = york(X, Y, sX, sY);
    // York et al. 2004, Am. J. Phys. 72:367, Table II; Cantrell 2008, ACP 8:5477 (full precision via REFERENCE_VALUES)
    expectRel(f.slope, -0.4805334074462021, 1e-12);
    expectRel(f.intercept, 5.479910224032864, 1e-12);
    expectRel(f.slopeSE, 0.05798500900077448, 1e-10);
    expectRel(f.interceptSE, 0.29497073549310865, 1e-10);
    expectRel(f.mswd, 1.4832941492576828, 1e-10);
    expectRel(f.slopeSEScaled, 0.07062026952877104, 1e-10);
    expectRel(f.interceptSEScaled, 0.359246522551112, 1e-10);
    expect(f.converged).toBe(true);
    expect(f.df).toBe(8);
  });

  it('york(x, y, sx, sy, 0) equals york without r, and an array of zeros too (property)', () => {
    const a = york(X, Y, sX, sY);
    const b = york(X, Y, sX, sY, 0);
    const c = york(X, Y, sX, sY, X.map(() => 0));
    expect(b).toEqual(a);
    expect(c).toEqual(a);
  });

  it('york with positive error correlation on a negative-slope line moves the estimate (property, not a reference)', () => {
    // Property: with r > 0 the error ellipses tilt along a positive direction; for a line of negative slope
    // this changes W and so the estimate; the direction is checked against a small r, where the change is smooth.
    const a = york(X, Y, sX, sY, 0);
    const b = york(X, Y, sX, sY, 0.2);
    const c = york(X, Y, sX, sY, 0.4);
    expect(b.slope).not.toBeCloseTo(a.slope, 6);
    // monotone in r over this range: the two steps move the slope the same way
    expect(Math.sign(c.slope - b.slope)).toBe(Math.sign(b.slope - a.slope));
    expect(b.converged && c.converged).toBe(true);
  });

  it('york with equal tiny x errors approaches weighted ols of y on x (property)', () => {
    const tiny = X.map(() => 1e-9);
    const f = york(X, Y, tiny, sY);
    let sw = 0;
    let swx = 0;
    let swy = 0;
    for (let i = 0; i < X.length; i++) {
      sw += wY[i];
      swx += wY[i] * X[i];
      swy += wY[i] * Y[i];
    }
    const mx = swx / sw;
    const my = swy / sw;
    let sxy = 0;
    let sxx = 0;
    for (let i = 0; i < X.length; i++) {
      sxy += wY[i] * (X[i] - mx) * (Y[i] - my);
      sxx += wY[i] * (X[i] - mx) ** 2;
    }
    expectRel(f.slope, sxy / sxx, 1e-8);
    // York's σ_slope then equals the weighted-LS 1/√Sxx (known-variance form)
    expectRel(f.slopeSE, 1 / Math.sqrt(sxx), 1e-7);
  });
});

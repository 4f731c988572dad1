import { describe, expect, it } from 'vitest';
import { aicc } from '../../lib/stats/aicc.js';
import { ols } from '../../lib/stats/ols.js';
import { dist, speed } from './cars.js';
import { expectRel } from './close.js';

describe('aicc', () => {
  it('aicc(rss, n, 3) of lm(dist ~ speed) matches R AIC up to the likelihood constant', () => {
    const f = ols(speed, dist);
    const ic = aicc(f.rss, 50, 3);
    // R AIC(lm(dist ~ speed)) = 419.1569 (from memory); R's AIC adds n·(ln 2π + 1) = 50·2.837877...
    const rConstant = 50 * (Math.log(2 * Math.PI) + 1);
    expect(ic.aic + rConstant).toBeCloseTo(419.1569, 3);
    // Burnham & Anderson 2002, eq. 2.14: AICc = AIC + 2k(k+1)/(n−k−1)
    expectRel(ic.aicc - ic.aic, (2 * 3 * 4) / 46, 1e-12);
  });

  it('aicc is NaN when n ≤ k + 1', () => {
    expect(aicc(1, 4, 3).aicc).toBeNaN();
  });
});

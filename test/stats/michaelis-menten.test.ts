import { describe, expect, it } from 'vitest';
import { michaelisMenten } from '../../lib/stats/michaelis-menten.js';
import { expectRel } from './close.js';

// R datasets::Puromycin, state "treated" (Treloar 1974; Bates & Watts 1988, Nonlinear Regression Analysis, App. A1.3)
const conc = [0.02, 0.02, 0.06, 0.06, 0.11, 0.11, 0.22, 0.22, 0.56, 0.56, 1.1, 1.1];
const rate = [76, 47, 97, 107, 123, 139, 159, 152, 191, 201, 207, 200];

describe('michaelisMenten', () => {
  it('michaelisMenten(conc, rate) reproduces the tightly converged Puromycin fit', () => {
    const f = michaelisMenten(conc, rate);
    if (!f.converged) throw new Error(f.reason);
    // Tightly converged nls on Puromycin treated (Treloar 1974; Bates & Watts 1988), via REFERENCE_VALUES, "about 1e-7 relative"
    expectRel(f.qmax, 212.683742917199, 1e-7);
    expectRel(f.k, 0.0641212813614261, 1e-7);
    expectRel(f.qmaxSE, 6.94715526978892, 1e-7);
    expectRel(f.kSE, 0.0082809496969275, 1e-7);
    expectRel(f.residualSE, 10.9336581912888, 1e-10);
    expectRel(f.rss, 1195.44881443936, 1e-10);
    expect(f.df).toBe(10);
    // Own high-precision check (not a published value): profiling out Vm and solving dRSS/dK = 0 with mpmath
    // at 40 digits gives K = 0.064121281681567072, Vm = 212.68374314253607; the reference row above agrees to ~1e-9.
    expectRel(f.k, 0.064121281681567072, 1e-11);
    expectRel(f.qmax, 212.68374314253607, 1e-11);
  });

  it('michaelisMenten converges to the same optimum from a poor start', () => {
    const a = michaelisMenten(conc, rate);
    const b = michaelisMenten(conc, rate, { initial: { qmax: 1, k: 10 } });
    if (!a.converged || !b.converged) throw new Error('not converged');
    expect(b.start).toBe('given');
    expectRel(b.qmax, a.qmax, 1e-10);
    expectRel(b.k, a.k, 1e-10);
  });

  it('michaelisMenten(x, y) returns {converged: false, reason} on data with no saturation', () => {
    // A falling response has no positive asymptote: the fit must refuse rather than report nonsense.
    const x = [1, 2, 3, 4, 5, 6];
    const y = [10, 8, 6, 5, 3, 1];
    const f = michaelisMenten(x, y);
    expect(f.converged).toBe(false);
    if (f.converged) return;
    expect(f.reason).toMatch(/^michaelisMenten drove k to its lower bound/);
  });

  it('michaelisMenten reports a singular JᵀJ when the data are a straight line through 0 (k → ∞)', () => {
    const f = michaelisMenten([1, 2, 3, 4, 5, 6], [1, 2, 3, 4, 5, 6.1]);
    expect(f).toEqual({
      converged: false,
      n: 6,
      reason: 'michaelisMenten: the design is singular (parameters not identifiable from these data)',
    });
  });

  it('michaelisMenten refuses non-positive x with a named reason', () => {
    const f = michaelisMenten([0, 1, 2, 3], [0, 1, 1.5, 1.7]);
    expect(f).toEqual({ converged: false, n: 4, reason: 'x must be a positive finite number, got 0' });
  });

  it('michaelisMenten(x, y, {scale: "log10"}) recovers exact parameters from noise-free data', () => {
    const x = [0.05, 0.1, 0.2, 0.4, 0.8, 1.6, 3.2];
    const y = x.map((v) => (30 * v) / (0.3 + v));
    const f = michaelisMenten(x, y, { scale: 'log10' });
    if (!f.converged) throw new Error(f.reason);
    expectRel(f.qmax, 30, 1e-9);
    expectRel(f.k, 0.3, 1e-9);
  });

  it('michaelisMenten with weights 2 everywhere gives the unweighted estimates', () => {
    const a = michaelisMenten(conc, rate);
    const b = michaelisMenten(conc, rate, { weights: conc.map(() => 2) });
    if (!a.converged || !b.converged) throw new Error('not converged');
    expectRel(b.qmax, a.qmax, 1e-10);
    // σ² doubles with the weights while JᵀWJ doubles too: the SEs are unchanged
    expectRel(b.qmaxSE, a.qmaxSE, 1e-8);
  });
});

// lightenSpec: reference rules read one row, per-mark ARIA is off, the input spec is not mutated.
import { describe, expect, it } from 'vitest';
import type { TopLevelSpec } from 'vega-lite';
import { lightenSpec } from '../../../lib/site/figures/render-spec.js';

describe('lightenSpec(spec)', () => {
  const spec = {
    data: { values: [{ x: 1 }, { x: 2 }, { x: 3 }] },
    layer: [
      { mark: 'rule', encoding: { y: { datum: 0 } } },
      { mark: 'point', encoding: { x: { field: 'x', type: 'quantitative' } } },
    ],
  } as unknown as TopLevelSpec;

  it('gives a datum-only rule layer a single row and leaves data layers alone', () => {
    const light = lightenSpec(spec) as { layer: { data?: unknown }[]; config: { aria: boolean } };
    expect(light.layer[0].data).toEqual({ values: [{}] });
    expect(light.layer[1].data).toBeUndefined();
    expect(light.config.aria).toBe(false);
  });

  it('does not mutate its input', () => {
    const before = JSON.stringify(spec);
    lightenSpec(spec);
    expect(JSON.stringify(spec)).toBe(before);
  });
});

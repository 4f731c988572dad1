import { describe, expect, it } from 'vitest';
import { renderFormula } from '../../../lib/site/methods/index.js';

describe('renderFormula(tex)', () => {
  it('renders display MathML without script', () => {
    const m = renderFormula(String.raw`\log_{10} C = a + b \log_{10} V`);
    expect(m.startsWith('<math')).toBe(true);
    expect(m).toContain('display="block"');
    expect(m).not.toMatch(/<script/i);
  });

  it('throws on malformed TeX so a bad formula fails the build', () => {
    expect(() => renderFormula(String.raw`\frac{a`)).toThrow();
  });
});

import { describe, expect, it } from 'vitest';
import { decorativeSvg } from '../../content/_lib/decorative-svg.js';

describe('decorativeSvg', () => {
  it('decorativeSvg(svg) hides the SVG and drops per-mark roles and labels', () => {
    const out = decorativeSvg('<svg width="2"><g role="graphics-object" aria-roledescription="group mark container"><path role="graphics-symbol" aria-label="x: 1" d="M0"/></g></svg>');
    expect(out).toBe('<svg aria-hidden="true" focusable="false" width="2"><g><path d="M0"/></g></svg>');
  });
});

import { describe, expect, it } from 'vitest';
import { REFERENCES, referencesCslJson } from '../../../lib/site/methods/index.js';

describe('referencesCslJson(refs)', () => {
  it('is a JSON array with one item per reference and DOI fields where known', () => {
    const refs = Object.values(REFERENCES);
    const items = JSON.parse(referencesCslJson(refs)) as Record<string, unknown>[];
    expect(items).toHaveLength(refs.length);
    expect(items.map((i) => i.id)).toEqual(refs.map((r) => r.id));
    const bh = items.find((i) => i.id === 'benjamini1995')!;
    // Benjamini & Hochberg 1995, J. R. Stat. Soc. B 57:289–300.
    expect(bh).toMatchObject({ type: 'article-journal', DOI: '10.1111/j.2517-6161.1995.tb02031.x', volume: '57', page: '289–300', issued: { 'date-parts': [[1995]] } });
    expect(items.filter((i) => 'DOI' in i).length).toBe(refs.filter((r) => r.doi).length);
  });

  it('writes an organisation as a literal name and keeps the no-DOI note', () => {
    const [ioc] = JSON.parse(referencesCslJson([REFERENCES.ioc2013])) as Record<string, unknown>[];
    expect(ioc.author).toEqual([{ literal: 'IOC' }]);
    expect(ioc.note).toBe('DOI not given');
    expect('DOI' in ioc).toBe(false);
  });

  it('gives the same text for the same references', () => {
    expect(referencesCslJson([REFERENCES.york2004])).toBe(referencesCslJson([REFERENCES.york2004]));
  });
});

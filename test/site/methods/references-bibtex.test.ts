import { describe, expect, it } from 'vitest';
import { REFERENCES, referencesBibtex, userReference } from '../../../lib/site/methods/index.js';

const all = Object.values(REFERENCES);

describe('referencesBibtex(refs)', () => {
  it('writes one entry per reference keyed by its id', () => {
    const bib = referencesBibtex(all);
    expect(bib.match(/^@/gm)?.length).toBe(all.length);
    for (const r of all) expect(bib).toContain(`{${r.id},`);
  });

  it('parses back the basic fields of an article', () => {
    const bib = referencesBibtex([REFERENCES.york2004]);
    const fields = Object.fromEntries([...bib.matchAll(/^ {2}(\w+) = \{(.*)\},?$/gm)].map((m) => [m[1], m[2]]));
    expect(bib.startsWith('@article{york2004,')).toBe(true);
    expect(fields).toMatchObject({ year: '2004', journal: 'American Journal of Physics', volume: '72', pages: '367--375', doi: '10.1119/1.1632486' });
  });

  it('writes the note of a work without a DOI and escapes BibTeX specials', () => {
    const bib = referencesBibtex([REFERENCES.redfield1963, userReference('carbon-factor', 'Smith & Jones {2001} 50% of C_org')]);
    expect(bib).toContain('note = {No DOI: book chapter}');
    expect(bib).toContain('title = {Smith \\& Jones 2001 50\\% of C\\_org}');
    expect(bib).not.toMatch(/doi = /);
  });

  it('writes nothing for no references', () => {
    expect(referencesBibtex([])).toBe('');
  });
});

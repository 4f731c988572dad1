import { describe, expect, it } from 'vitest';
import { methodsFiles, REFERENCES, type MethodsSection } from '../../../lib/site/methods/index.js';

describe('methodsFiles(section)', () => {
  it('writes supplement/references.bib and supplement/references.json of the section references', () => {
    const section: MethodsSection = { stages: [], references: [REFERENCES.warton2006], files: { bibtex: 'supplement/references.bib', cslJson: 'supplement/references.json' } };
    const files = methodsFiles(section);
    expect(files.map((f) => f.path)).toEqual(['supplement/references.bib', 'supplement/references.json']);
    expect(String(files[0].data)).toContain('@article{warton2006,');
    expect(JSON.parse(String(files[1].data))).toMatchObject([{ id: 'warton2006', DOI: '10.1017/S1464793106007007' }]);
  });
});

import { describe, expect, it } from 'vitest';
import { data, render } from '../../../content/methods.11ty.js';
import type { ReportModel } from '../../../lib/site/report-model.js';
import { REFERENCES, renderFormula, type MethodsSection } from '../../../lib/site/methods/index.js';
import { reportStub } from '../../helpers/report-stub.js';

const HOSTILE = 'cells/"><script>alert(1)</script>.csv';

const section: MethodsSection = {
  stages: [
    {
      id: 'load',
      title: 'Inputs read',
      text: ['Files were read.'],
      parameters: [{ name: 'Region file', value: HOSTILE }],
      tables: [{ caption: 'Rows read per file', columns: ['Table', 'File', 'Rows read'], rows: [['cells', HOSTILE, '3']] }],
      formulas: [{ id: 'fe-c', label: 'Fe:C quota', tex: 'x', mathml: renderFormula(String.raw`\frac{\mathrm{Fe}}{C}`) }],
      references: ['york2004', 'redfield1963'],
    },
  ],
  references: [REFERENCES.york2004, REFERENCES.redfield1963],
  files: { bibtex: 'supplement/references.bib', cslJson: 'supplement/references.json' },
};

const report = (methods: unknown): ReportModel => reportStub('methods.html', 'methods', methods);

describe('content/methods.11ty.ts', () => {
  it('data.permalink is methods.html', () => {
    expect(data.permalink).toBe('methods.html');
  });

  it('render(report) escapes a hostile file name in parameters and tables', () => {
    const page = render({ report: report(section) });
    expect(page).not.toContain('<script>');
    expect(page).toContain('cells/&quot;&gt;&lt;script&gt;alert(1)&lt;/script&gt;.csv');
  });

  it('render(report) inlines the MathML and links DOIs and the reference files', () => {
    const page = render({ report: report(section) });
    expect(page).toContain('<math xmlns="http://www.w3.org/1998/Math/MathML" display="block"');
    expect(page).toContain('<a href="https://doi.org/10.1119/1.1632486">https://doi.org/10.1119/1.1632486</a>');
    expect(page).toContain('No DOI: book chapter.');
    expect(page).toContain('<a href="supplement/references.bib">BibTeX</a>');
    expect(page).toContain('<a href="#ref-york2004">[1]</a>, <a href="#ref-redfield1963">[2]</a>');
  });

  it('render(report) without a methods section says so', () => {
    expect(render({ report: report(undefined) })).toContain('<p>No method notes in this build.</p>');
  });
});

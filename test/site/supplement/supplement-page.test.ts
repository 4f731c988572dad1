import { describe, expect, it } from 'vitest';
import { data, render } from '../../../content/supplement.11ty.js';
import type { ReportModel } from '../../../lib/site/report-model.js';
import type { SupplementSection } from '../../../lib/site/supplement/index.js';
import { reportStub } from '../../helpers/report-stub.js';

const HOSTILE = 'supplement/figures/"><img src=x onerror=alert(1)>.svg';

const section: SupplementSection = {
  figures: [{ id: 'fec-vs-dfe', title: 'Fe:C <against> dFe', caption: 'Cells & fits.', files: [{ path: HOSTILE, label: 'SVG', bytes: 2048 }] }],
  data: [{ path: 'supplement/merged-cells.csv', label: 'Merged cell table (CSV)', bytes: 999 }],
  zip: { path: 'supplement/basinquota-supplement.zip', label: 'All supplement files (zip)', bytes: 2_500_000 },
};

const report = (supplement: unknown): ReportModel => reportStub('supplement.html', 'supplement', supplement);

describe('content/supplement.11ty.ts', () => {
  it('data.permalink is supplement.html', () => {
    expect(data.permalink).toBe('supplement.html');
  });

  it('render(report) escapes a hostile file name and figure text', () => {
    const page = render({ report: report(section) });
    expect(page).not.toContain('<img');
    expect(page).toContain('href="supplement/figures/&quot;&gt;&lt;img src=x onerror=alert(1)&gt;.svg"');
    expect(page).toContain('<th scope="row">Fe:C &lt;against&gt; dFe</th><td>Cells &amp; fits.</td>');
  });

  it('render(report) lists the data files and the zip with sizes', () => {
    const page = render({ report: report(section) });
    expect(page).toContain('<a href="supplement/merged-cells.csv">Merged cell table (CSV)</a> <span class="size">(999 bytes)</span>');
    expect(page).toContain('<a href="supplement/basinquota-supplement.zip">All supplement files (zip)</a> <span class="size">(2.5 MB)</span>');
    expect(page).toContain('(2.0 kB)');
  });

  it('render(report) without a supplement section says so', () => {
    expect(render({ report: report(undefined) })).toContain('<p>No supplement in this build.</p>');
  });
});

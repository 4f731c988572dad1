import { describe, expect, it } from 'vitest';
import { render, data } from '../../content/changes.11ty.js';
import type { ReportModel } from '../../lib/site/report-model.js';
import { diffSnapshots, firstVersionChanges } from '../../lib/version/index.js';
import { snapshotV1, snapshotV2 } from './snapshots.js';
import { reportStub } from '../helpers/report-stub.js';

const report = (changes: unknown): ReportModel => reportStub('changes.html', 'changes', changes, { title: 'Test <report>', version: 2 });

describe('content/changes.11ty.ts', () => {
  it('data.permalink is changes.html', () => {
    expect(data.permalink).toBe('changes.html');
  });

  it('render(report) of a first version says there is nothing to compare with', () => {
    const page = render({ report: report(firstVersionChanges(snapshotV1())) });
    expect(page).toContain('<p>This is the first version; there is nothing to compare with.</p>');
    expect(page).not.toContain('<table>');
  });

  it('render(report) without a changes section falls back to the first-version sentence', () => {
    expect(render({ report: report(undefined) })).toContain('This is the first version; there is nothing to compare with.');
  });

  it('render(report) shows added data, moved parameters and region changes in tables', () => {
    const page = render({ report: report(diffSnapshots(snapshotV1(), snapshotV2())) });
    expect(page).toContain('<title>Changes · Test &lt;report&gt; · v2</title>');
    expect(page).toContain('<td data-change="cruises-added">KX-03</td>');
    expect(page).toContain('<tr><td>Stations of KX-01</td><td>S3</td><td>—</td></tr>');
    expect(page).toContain('<td data-change="cells-added">7: c06, c07, c08, c09, c10 and 2 more</td>');
    expect(page).toContain('<tr><td>diatom</td><td>ols</td><td>slope</td><td class="num">0.52 [0.41, 0.63]</td><td class="num">0.71 [0.6, 0.82]</td><td data-beyond="yes">yes</td></tr>');
    expect(page).toContain('<td data-beyond="no">no</td>');
    expect(page).toContain('<td data-region-change="newly-flagged">newly flagged</td><td>none (fold 1.05)</td><td>lower-than-fit (fold 0.55)</td>');
    expect(page).toContain('<td data-region-change="cleared">cleared</td>');
    expect(page).toContain('<tr><td>samples</td><td>excluded</td><td><code>flag-bad</code></td><td class="num">3</td><td class="num">5</td></tr>');
    expect(page).toContain('<a href="versions/v1/index.html">Version 1 as it was published</a>');
  });

  it('render(report) escapes ids that look like markup', () => {
    const v2 = { ...snapshotV2(), cruises: [...snapshotV2().cruises, { cruise: '<b>x</b>', stations: [], samples: 1, cells: 0 }] };
    const page = render({ report: report(diffSnapshots(snapshotV1(), v2)) });
    expect(page).toContain('<td data-change="cruises-added">&lt;b&gt;x&lt;/b&gt;, KX-03</td>');
    expect(page).not.toContain('<b>x</b>');
  });
});

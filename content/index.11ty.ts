// Overview page: title, version, authors, headline counts and key findings.
import { html } from './_lib/html.js';
import { layout } from './_lib/layout.js';
import type { ReportModel } from '../lib/site/report-model.js';

export const data = { permalink: 'index.html' };

/** Render the Overview. */
export function render({ report }: { report: ReportModel }): string {
  const c = report.counts;
  const body = html`
<p class="lede">${report.meta.programme ? html`${report.meta.programme}. ` : ''}Synthesis of ${c.cruises} cruises: ${c.stations} stations, ${c.samples} bottle samples and ${c.cells} analysed cells. Built ${report.meta.date}.</p>
${report.findings.length ? html`<section aria-labelledby="findings">
<h2 id="findings">Key findings</h2>
<ul class="findings">
${report.findings.map((f) => html`<li>${f.text} (<a href="${f.href}">${f.linkText}</a>)</li>`)}
</ul>
</section>` : ''}
<section aria-labelledby="counts">
<h2 id="counts">Holdings</h2>
<dl class="counts">
<div><dt>Cruises</dt><dd data-count="cruises">${c.cruises}</dd></div>
<div><dt>Stations</dt><dd data-count="stations">${c.stations}</dd></div>
<div><dt>Bottle samples</dt><dd data-count="samples">${c.samples}</dd></div>
<div><dt>Cells</dt><dd data-count="cells">${c.cells}</dd></div>
</dl>
<table>
<caption>Cells by phytoplankton class</caption>
<thead><tr><th scope="col">Class</th><th scope="col" class="num">Cells</th></tr></thead>
<tbody>
${c.cellsByClass.map((row) => html`<tr><td>${row.value}</td><td class="num" data-class-count="${row.value}">${row.count}</td></tr>`)}
</tbody>
</table>
</section>
<section aria-labelledby="authors">
<h2 id="authors">Authors</h2>
<p>${report.meta.authors.join(', ')}${report.meta.contact ? html` · contact: ${report.meta.contact}` : ''}</p>
</section>`;
  return layout(report, { title: 'Overview', href: 'index.html', body });
}

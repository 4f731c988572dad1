// Supplement page: figures with captions and their files, the data files and the zip of all.
import { html } from './_lib/html.js';
import { layout } from './_lib/layout.js';
import type { ReportModel } from '../lib/site/report-model.js';
import type { SupplementFile, SupplementSection } from '../lib/site/supplement/index.js';

/** Eleventy data: the page's output path. */
export const data = { permalink: 'supplement.html' };

/** File size in words: bytes, kB or MB (1 kB = 1000 bytes). */
function size(bytes: number): string {
  if (bytes < 1000) return `${bytes} bytes`;
  if (bytes < 1e6) return `${(bytes / 1e3).toFixed(1)} kB`;
  return `${(bytes / 1e6).toFixed(1)} MB`;
}

function link(f: SupplementFile) {
  return html`<a href="${f.path}">${f.label}</a> <span class="size">(${size(f.bytes)})</span>`;
}

/** Render the Supplement page from report.sections.supplement. */
export function render({ report }: { report: ReportModel }): string {
  const s = report.sections.supplement as SupplementSection | undefined;
  if (!s) return layout(report, { title: 'Supplement', href: 'supplement.html', body: html`<p>No supplement in this build.</p>` });
  const body = html`
<p class="lede">Every figure as SVG and PNG with its data and specification, the merged cell table, the results and the ledger. <a href="${s.zip.path}">${s.zip.label}</a> <span class="size">(${size(s.zip.bytes)})</span>.</p>
<section aria-labelledby="figures">
<h2 id="figures">Figures</h2>
<table>
<caption>Supplementary figures</caption>
<thead><tr><th scope="col">Figure</th><th scope="col">Caption</th><th scope="col">Files</th></tr></thead>
<tbody>
${s.figures.map((f) => html`<tr id="figure-${f.id}"><th scope="row">${f.title}</th><td>${f.caption}</td><td><ul>${f.files.map((x) => html`<li>${link(x)}</li>`)}</ul></td></tr>`)}
</tbody>
</table>
</section>
<section aria-labelledby="data-files">
<h2 id="data-files">Data files</h2>
<ul>
${s.data.map((f) => html`<li>${link(f)}</li>`)}
<li>${link(s.zip)}</li>
</ul>
</section>`;
  return layout(report, { title: 'Supplement', href: 'supplement.html', body });
}

// Methods page: every stage that ran, its parameters and formulas, and the references with DOI links.
import { html, raw } from './_lib/html.js';
import { layout } from './_lib/layout.js';
import type { ReportModel } from '../lib/site/report-model.js';
import { doiUrl, formatReference, type MethodStage, type MethodsSection } from '../lib/site/methods/index.js';

/** Eleventy data: the page's output path. */
export const data = { permalink: 'methods.html' };

function stage(s: MethodStage, numbers: Map<string, number>) {
  return html`<section aria-labelledby="stage-${s.id}" id="${s.id}">
<h2 id="stage-${s.id}">${s.title}</h2>
${s.text.map((p) => html`<p>${p}</p>`)}
${s.parameters.length ? html`<table class="parameters">
<caption>Parameters</caption>
<tbody>
${s.parameters.map((p) => html`<tr><th scope="row">${p.name}</th><td>${p.value}</td></tr>`)}
</tbody>
</table>` : ''}
${s.tables.map((t) => html`<table>
<caption>${t.caption}</caption>
<thead><tr>${t.columns.map((c) => html`<th scope="col">${c}</th>`)}</tr></thead>
<tbody>
${t.rows.map((r) => html`<tr>${r.map((c) => html`<td>${c}</td>`)}</tr>`)}
</tbody>
</table>`)}
${s.formulas.map((f) => html`<figure class="formula" id="formula-${f.id}">
${raw(f.mathml)}
<figcaption>${f.label}</figcaption>
</figure>`)}
${s.references.length ? html`<p class="cites">References: ${s.references.map((id, i) => html`${i ? ', ' : ''}<a href="#ref-${id}">[${numbers.get(id) ?? '?'}]</a>`)}</p>` : ''}
</section>`;
}

/** Render the Methods page from report.sections.methods. */
export function render({ report }: { report: ReportModel }): string {
  const m = report.sections.methods as MethodsSection | undefined;
  if (!m) return layout(report, { title: 'Methods', href: 'methods.html', body: html`<p>No method notes in this build.</p>` });
  const numbers = new Map(m.references.map((r, i) => [r.id, i + 1]));
  const body = html`
<p class="lede">Generated from the project config and the results of this build: every stage that ran, with its parameters and formulas.</p>
${m.stages.map((s) => stage(s, numbers))}
<section aria-labelledby="references">
<h2 id="references">References</h2>
<ol class="references">
${m.references.map((r) => html`<li id="ref-${r.id}">${formatReference(r)} ${r.doi ? html`<a href="${doiUrl(r.doi)}">${doiUrl(r.doi)}</a>` : html`${r.url ? html`<a href="${r.url}">${r.url}</a>. ` : ''}${r.doiNote ?? 'DOI not given'}.`}</li>`)}
</ol>
<p>Download: <a href="${m.files.bibtex}">BibTeX</a> · <a href="${m.files.cslJson}">CSL-JSON</a></p>
</section>`;
  return layout(report, { title: 'Methods', href: 'methods.html', body });
}

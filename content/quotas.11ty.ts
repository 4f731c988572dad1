// Quotas page: fits of Fe:C on dFe per class with intervals, class-difference tests, and the quota figures.
import { html, type SafeHtml } from './_lib/html.js';
import { layout } from './_lib/layout.js';
import { figureBlocks } from './_lib/figure-block.js';
import type { ReportModel } from '../lib/site/report-model.js';
import { pText, sig, type ModelRow, type ParameterRow, type QuotasSection } from '../lib/site/figures/index.js';

export const data = { permalink: 'quotas.html' };

const interval = (p: ParameterRow | null): SafeHtml => (p ? html`${sig(p.estimate)} <span class="ci">(${sig(p.lower)}–${sig(p.upper)})</span>` : html`–`);

function modelCells(m: ModelRow): SafeHtml {
  if (!m.fitted) return html`<td colspan="5">not fitted: ${m.reason ?? ''}</td>`;
  return html`<td class="num">${interval(m.exponent)}</td><td class="num">${interval(m.log10Coefficient)}</td><td class="num">${interval(m.qmax)}</td><td class="num">${interval(m.k)}</td><td class="num">${m.aicc === null ? '–' : sig(m.aicc, 4)}</td>`;
}

function fitsTable(q: QuotasSection): SafeHtml {
  const pct = `${sig(q.level * 100, 2)} %`;
  return html`<table class="fits">
<caption>Fits of log10 Fe:C on log10 dFe per class with ${pct} intervals: power laws (exponent b, log10 coefficient a in log10 µmol mol⁻¹ at 1 nmol kg⁻¹) and the saturating model (Qmax in µmol mol⁻¹, K in nmol kg⁻¹). The primary model is marked ★.</caption>
<thead><tr><th scope="col">Class</th><th scope="col" class="num">Cells</th><th scope="col" class="num">Stations</th><th scope="col">Model</th><th scope="col" class="num">Exponent b</th><th scope="col" class="num">log10 a</th><th scope="col" class="num">Qmax</th><th scope="col" class="num">K</th><th scope="col" class="num">AICc</th></tr></thead>
<tbody>
${q.classes.map((c) =>
  c.fitted
    ? c.models.map((m, i) => html`<tr${m.primary ? html` class="primary"` : ''}>${i === 0 ? html`<th scope="rowgroup" rowspan="${c.models.length}">${c.phytoClass}</th><td class="num" rowspan="${c.models.length}">${c.nCells}</td><td class="num" rowspan="${c.models.length}">${c.nStations}</td>` : ''}<td>${m.model}${m.primary ? ' ★' : ''}</td>${modelCells(m)}</tr>`)
    : html`<tr><th scope="row">${c.phytoClass}</th><td class="num">${c.nCells}</td><td class="num">${c.nStations}</td><td colspan="6">not fitted: ${c.reason ?? ''}</td></tr>`,
)}
</tbody>
</table>
${q.classes.filter((c) => c.primary).map((c) => html`<p class="note">${c.phytoClass}: primary model ${c.primary?.model ?? ''} — ${c.primary?.reason ?? ''}</p>`)}`;
}

function testsBlock(q: QuotasSection): SafeHtml {
  const a = q.ancova;
  return html`${a
    ? html`<table>
<caption>ANCOVA of log10 Fe:C on log10 dFe across classes (common slope ${sig(a.commonSlope)})</caption>
<thead><tr><th scope="col">Test</th><th scope="col" class="num">F</th><th scope="col" class="num">df</th><th scope="col" class="num">p</th></tr></thead>
<tbody>
<tr><td>Equal slopes</td><td class="num">${sig(a.equalSlopes.f)}</td><td class="num">${a.equalSlopes.df1}, ${a.equalSlopes.df2}</td><td class="num">${pText(a.equalSlopes.p)}</td></tr>
<tr><td>Equal intercepts (common slope)</td><td class="num">${sig(a.equalIntercepts.f)}</td><td class="num">${a.equalIntercepts.df1}, ${a.equalIntercepts.df2}</td><td class="num">${pText(a.equalIntercepts.p)}</td></tr>
</tbody>
</table>`
    : html`<p>Fewer than two classes were fitted, so the classes were not compared.</p>`}
${q.pairwise.length
  ? html`<table>
<caption>Pairwise slope differences (unadjusted ${sig(q.level * 100, 2)} % intervals)</caption>
<thead><tr><th scope="col">Classes</th><th scope="col" class="num">Difference in exponent</th><th scope="col" class="num">p</th></tr></thead>
<tbody>
${q.pairwise.map((d) => html`<tr><td>${d.classA} − ${d.classB}</td><td class="num">${sig(d.difference)} (${sig(d.lower)}–${sig(d.upper)})</td><td class="num">${pText(d.p)}</td></tr>`)}
</tbody>
</table>`
  : ''}
${q.notes.map((n) => html`<p class="note">${n}</p>`)}`;
}

/** Render the Quotas page from report.sections.quotas and the quotas figures. */
export function render({ report }: { report: ReportModel }): string {
  const q = report.sections.quotas as QuotasSection | null | undefined;
  const body = html`
<p class="lede">Cellular iron quotas (Fe:C) against ambient dissolved iron, per phytoplankton class.</p>
<section aria-labelledby="fits">
<h2 id="fits">Fits per class</h2>
${q ? fitsTable(q) : html`<p>The fits did not run in this build.</p>`}
</section>
<section aria-labelledby="differences">
<h2 id="differences">Do the classes differ?</h2>
${q ? testsBlock(q) : ''}
</section>
<section aria-labelledby="quota-figures">
<h2 id="quota-figures">Figures</h2>
${figureBlocks(report.sections.figures, 'quotas')}
</section>`;
  return layout(report, { title: 'Quotas', href: 'quotas.html', body });
}

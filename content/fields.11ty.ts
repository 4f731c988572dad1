// Nutrient fields page: the grids used, dFe and nitrate maps with stations and the HNLC outline, Fe*, profiles.
import { html } from './_lib/html.js';
import { layout } from './_lib/layout.js';
import { figureBlocks } from './_lib/figure-block.js';
import type { ReportModel } from '../lib/site/report-model.js';
import type { FieldsSection } from '../lib/site/figures/index.js';

export const data = { permalink: 'fields.html' };

/** Render the Nutrient fields page from report.sections.fields and the fields figures. */
export function render({ report }: { report: ReportModel }): string {
  const fields = report.sections.fields as FieldsSection | undefined;
  const grids = fields?.grids ?? [];
  const body = html`
<p class="lede">Gridded fields read for this report and the maps drawn from them, with every bottle station overlaid.</p>
<section aria-labelledby="grids">
<h2 id="grids">Grids used</h2>
${grids.length
  ? html`<table>
<thead><tr><th scope="col">File</th><th scope="col">Variable</th><th scope="col">Quantity</th><th scope="col">Units</th><th scope="col" class="num">Lattice (lon × lat × depth × time)</th></tr></thead>
<tbody>
${grids.map((g) => html`<tr><td>${g.file}</td><td>${g.variable}</td><td>${g.quantity}</td><td>${g.units}</td><td class="num">${g.nLon} × ${g.nLat} × ${g.nDepth} × ${g.nTime}</td></tr>`)}
</tbody>
</table>`
  : html`<p>No gridded fields were configured.</p>`}
</section>
<section aria-labelledby="maps">
<h2 id="maps">Maps and profiles</h2>
${figureBlocks(report.sections.figures, 'fields')}
</section>`;
  return layout(report, { title: 'Nutrient fields', href: 'fields.html', body });
}

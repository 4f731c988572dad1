// Anomalies page: region × class departures from the fit, the flagged regions, and the fit diagnostics.
import { html } from './_lib/html.js';
import { layout } from './_lib/layout.js';
import { figureBlocks } from './_lib/figure-block.js';
import type { ReportModel } from '../lib/site/report-model.js';
import { pText, sig, type AnomaliesSection, type AnomalyRow } from '../lib/site/figures/index.js';

export const data = { permalink: 'anomalies.html' };

const FLAG_TEXT: Record<string, string> = { 'lower-than-fit': 'lower than fit ↓', 'higher-than-fit': 'higher than fit ↑', none: 'none', 'not-tested': 'not tested' };

function row(r: AnomalyRow) {
  return html`<tr${r.flagged ? html` class="flagged"` : ''} data-region="${r.region}" data-class="${r.phytoClass}">
<td>${r.regionName}</td><td>${r.phytoClass}</td><td class="num">${r.nStations}</td><td class="num">${r.nCells}</td>
<td class="num">${sig(r.meanResidual, 2)}</td><td class="num">${r.fold === null ? '–' : html`${sig(r.fold, 2)}× (${sig(r.foldLow, 2)}–${sig(r.foldHigh, 2)})`}</td>
<td class="num">${pText(r.pValue)}</td><td class="num">${pText(r.pAdjusted)}</td><td>${r.flagged ? html`<strong>${FLAG_TEXT[r.flag] ?? r.flag}</strong>` : FLAG_TEXT[r.flag] ?? r.flag}</td>
<td>${r.looStable === null ? '–' : r.looStable ? 'yes' : 'no'}</td><td>${r.mostInfluential ?? '–'}</td>
<td class="num">${r.minDetectableFold === null ? '–' : `${sig(r.minDetectableFold, 2)}×`}</td><td class="num">${r.stationsNeeded ?? '–'}</td>
</tr>`;
}

/** Render the Anomalies page from report.sections.anomalies and the anomalies figures. */
export function render({ report }: { report: ReportModel }): string {
  const a = report.sections.anomalies as AnomaliesSection | null | undefined;
  const flagged = a ? a.rows.filter((r) => r.flagged) : [];
  const body = html`
<p class="lede">Where cells hold more or less iron than their class's fit predicts, region by region.</p>
<section aria-labelledby="table">
<h2 id="table">Region × class tests</h2>
${a
  ? html`<p>${flagged.length ? `${flagged.length} region × class group${flagged.length === 1 ? ' is' : 's are'} flagged` : 'No group is flagged'} at a Benjamini–Hochberg false discovery rate of ${sig(a.fdrQ, 2)}; groups with fewer than ${a.minStations} stations are not tested. Folds are 10 to the mean station residual, with ${sig(a.level * 100, 2)} % intervals; the last two columns give the smallest fold the current stations can detect and the stations needed to detect a ${sig(a.targetFold, 2)}-fold difference.</p>
<table class="anomalies">
<thead><tr><th scope="col">Region</th><th scope="col">Class</th><th scope="col" class="num">Stations</th><th scope="col" class="num">Cells</th><th scope="col" class="num">Mean residual (log10)</th><th scope="col" class="num">Fold (CI)</th><th scope="col" class="num">p</th><th scope="col" class="num">BH p</th><th scope="col">Flag</th><th scope="col">Stable without any one station?</th><th scope="col">Most influential station</th><th scope="col" class="num">Detectable fold</th><th scope="col" class="num">Stations needed</th></tr></thead>
<tbody>
${a.rows.map(row)}
</tbody>
</table>`
  : html`<p>The anomaly tests did not run in this build.</p>`}
</section>
<section aria-labelledby="anomaly-figures">
<h2 id="anomaly-figures">Residual map and diagnostics</h2>
${figureBlocks(report.sections.figures, 'anomalies')}
</section>`;
  return layout(report, { title: 'Anomalies', href: 'anomalies.html', body });
}

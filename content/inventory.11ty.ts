// Inventory page: per-cruise holdings, per-file accounting and what the ledger excluded, converted or flagged.
import { html } from './_lib/html.js';
import { layout } from './_lib/layout.js';
import type { ReportModel } from '../lib/site/report-model.js';

export const data = { permalink: 'inventory.html' };

const ACTION_TITLES: Record<string, string> = {
  excluded: 'Rows excluded',
  converted: 'Values converted or substituted',
  flagged: 'Rows flagged (kept)',
};

const METHOD_WORDS: Record<string, string> = {
  factor: 'unit factor',
  'eos80-density': 'per litre → per kg with EOS-80 density from T, S, p',
  'default-density': 'per litre → per kg with the default density (T or S missing)',
  'molar-mass': 'mass of carbon → amount (12.011 g mol⁻¹)',
  'depth-from-pressure': 'depth from pressure (UNESCO 1983)',
};

/** Render the Inventory. */
export function render({ report }: { report: ReportModel }): string {
  const actions = ['excluded', 'converted', 'flagged'].filter((a) => report.ledger.some((g) => g.action === a));
  const body = html`
<section aria-labelledby="cruises">
<h2 id="cruises">Cruises</h2>
<table>
<thead><tr><th scope="col">Cruise</th><th scope="col" class="num">Stations</th><th scope="col" class="num">Samples</th><th scope="col" class="num">Cells</th><th scope="col">First date</th><th scope="col">Last date</th></tr></thead>
<tbody>
${report.inventory.map((c) => html`<tr><td>${c.cruise}</td><td class="num">${c.stations}</td><td class="num">${c.samples}</td><td class="num">${c.cells}</td><td>${c.firstDate ?? '—'}</td><td>${c.lastDate ?? '—'}</td></tr>`)}
</tbody>
</table>
</section>
<section aria-labelledby="files">
<h2 id="files">Input files</h2>
<p>Every row read is either used or recorded in the ledger with its reason.</p>
<table>
<thead><tr><th scope="col">Table</th><th scope="col">File</th><th scope="col" class="num">Rows read</th><th scope="col" class="num">Used</th><th scope="col" class="num">Excluded</th></tr></thead>
<tbody>
${report.files.map((f) => html`<tr><td>${f.table}</td><td><code>${f.file}</code></td><td class="num">${f.rowsRead}</td><td class="num">${f.rowsUsed}</td><td class="num">${f.rowsExcluded}</td></tr>`)}
</tbody>
</table>
</section>
<section aria-labelledby="conversions">
<h2 id="conversions">Unit conversions</h2>
${report.conversions.length === 0 ? html`<p>Every value was already in its canonical unit.</p>` : html`<table>
<thead><tr><th scope="col">File</th><th scope="col">Column</th><th scope="col">From</th><th scope="col">To</th><th scope="col">How</th><th scope="col" class="num">Rows</th></tr></thead>
<tbody>
${report.conversions.map((c) => html`<tr><td><code>${c.file}</code></td><td>${c.column}</td><td>${c.from}</td><td>${c.to}</td><td>${METHOD_WORDS[c.method] ?? c.method}</td><td class="num">${c.rows}</td></tr>`)}
</tbody>
</table>`}
</section>
<section aria-labelledby="matching">
<h2 id="matching">Ambient iron for each cell</h2>
<p>Where each cell's ambient dissolved Fe came from (nearest bottle of its station within the depth tolerance, interpolation between two bracketing bottles, the gridded field, or none).</p>
<table>
<thead><tr><th scope="col">Source</th><th scope="col" class="num">Cells</th></tr></thead>
<tbody>
${report.matchSources.map((m) => html`<tr><td>${m.value}</td><td class="num" data-match-source="${m.value}">${m.count}</td></tr>`)}
</tbody>
</table>
</section>
<section aria-labelledby="crossover">
<h2 id="crossover">Cross-cruise consistency</h2>
<p>Dissolved Fe below ${report.crossoverSettings.minDepthM} m at station pairs of different cruises within ${report.crossoverSettings.maxDistanceKm} km, compared at common depths. Offsets are reported, never applied; a pair is flagged when its offset exceeds ${report.crossoverSettings.thresholdNmolKg} nmol kg⁻¹ and twice its standard error.</p>
${report.crossover.length === 0 ? html`<p>No station pairs of different cruises lie close enough to compare.</p>` : html`<table>
<thead><tr><th scope="col">Cruise A</th><th scope="col">Cruise B</th><th scope="col" class="num">Offset A − B (nmol kg⁻¹)</th><th scope="col" class="num">SE</th><th scope="col" class="num">Depths</th><th scope="col" class="num">Station pairs</th><th scope="col">Flagged</th></tr></thead>
<tbody>
${report.crossover.map((c) => html`<tr><td>${c.cruiseA}</td><td>${c.cruiseB}</td><td class="num">${c.offset.toFixed(3)}</td><td class="num">${Number.isFinite(c.se) ? c.se.toFixed(3) : '—'}</td><td class="num">${c.nDepths}</td><td class="num">${c.nPairs}</td><td>${c.flagged ? 'yes' : 'no'}</td></tr>`)}
</tbody>
</table>`}
</section>
<section aria-labelledby="ledger">
<h2 id="ledger">Ledger</h2>
<p>The full ledger, one row per entry with file and line: <a href="supplement/ledger.csv">ledger.csv</a>.</p>
${actions.length === 0 ? html`<p>The ledger is empty: every row was used as read.</p>` : ''}
${actions.map(
  (action) => html`<h3>${ACTION_TITLES[action]}</h3>
<table>
<thead><tr><th scope="col">Table</th><th scope="col">Reason</th><th scope="col" class="num">Rows</th><th scope="col">Examples</th></tr></thead>
<tbody>
${report.ledger.filter((g) => g.action === action).map((g) => html`<tr><td>${g.table}</td><td><code>${g.reason}</code></td><td class="num">${g.count}</td><td><ul class="examples">${g.examples.map((e) => html`<li>${e}</li>`)}</ul></td></tr>`)}
</tbody>
</table>`,
)}
</section>`;
  return layout(report, { title: 'Inventory', href: 'inventory.html', body });
}

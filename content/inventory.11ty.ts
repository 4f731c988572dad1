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

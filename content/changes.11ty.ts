// Changes page: against the previous version, data added or removed, fit parameters that moved, regions newly flagged or cleared.
import { html, type SafeHtml } from './_lib/html.js';
import { layout } from './_lib/layout.js';
import type { ReportModel } from '../lib/site/report-model.js';
import { beyond, CHANGE_SIG_FIGS, formatNumber, formatParameterValue, REGION_CHANGE_LABELS, versionMessages, type ChangesSection, type VersionRef } from '../lib/version/index.js';

export const data = { permalink: 'changes.html' };

const dash = (text: string): string => (text === '-' ? '—' : text);
const list = (items: string[]): string => (items.length ? items.join(', ') : '—');
const flag = (value: string | null, fold: number | null): string => (value === null ? 'absent' : fold === null ? value : `${value} (fold ${formatNumber(fold, CHANGE_SIG_FIGS)})`);

/** Render the Changes page from report.sections.changes (absent or without a previous version: the first-version sentence). */
export function render({ report }: { report: ReportModel }): string {
  const changes = report.sections.changes as ChangesSection | undefined;
  const body = !changes || changes.previous === null ? html`<p>${versionMessages.firstVersion()}</p>` : comparison(changes, changes.previous);
  return layout(report, { title: 'Changes', href: 'changes.html', body });
}

function comparison(c: ChangesSection, p: VersionRef): SafeHtml {
  return html`
<p class="lede">Version ${c.current.version} (${c.current.date}) compared with version ${p.version} (${p.date}). <a href="versions/v${p.version}/index.html">Version ${p.version} as it was published</a>.</p>
<section aria-labelledby="data">
<h2 id="data">Data added or removed</h2>
<table>
<thead><tr><th scope="col">What</th><th scope="col">Added</th><th scope="col">Removed</th></tr></thead>
<tbody>
<tr><td>Cruises</td><td data-change="cruises-added">${list(c.cruises.added)}</td><td data-change="cruises-removed">${list(c.cruises.removed)}</td></tr>
${c.stations.map((s) => html`<tr><td>Stations of ${s.cruise}</td><td>${list(s.added)}</td><td>${list(s.removed)}</td></tr>`)}
<tr><td>Cells (${c.cells.before} → ${c.cells.after})</td><td data-change="cells-added">${cellIds(c.cells.added, c.cells.addedIds)}</td><td data-change="cells-removed">${cellIds(c.cells.removed, c.cells.removedIds)}</td></tr>
</tbody>
</table>
${
  c.holdings.length
    ? html`<table>
<caption>Samples and cells per cruise that changed</caption>
<thead><tr><th scope="col">Cruise</th><th scope="col" class="num">Samples before</th><th scope="col" class="num">Samples now</th><th scope="col" class="num">Cells before</th><th scope="col" class="num">Cells now</th></tr></thead>
<tbody>
${c.holdings.map((h) => html`<tr><td>${h.cruise}</td><td class="num">${h.samplesBefore}</td><td class="num">${h.samplesAfter}</td><td class="num">${h.cellsBefore}</td><td class="num">${h.cellsAfter}</td></tr>`)}
</tbody>
</table>`
    : ''
}
</section>
<section aria-labelledby="parameters">
<h2 id="parameters">Fit parameters</h2>
${
  c.parameters.length === 0
    ? html`<p>Neither version has fitted parameters.</p>`
    : html`<p>Estimates with their confidence intervals. A new estimate outside the old interval is a change beyond what the old data could pin down.</p>
<table>
<thead><tr><th scope="col">Class</th><th scope="col">Model</th><th scope="col">Parameter</th><th scope="col">Old [interval]</th><th scope="col">New [interval]</th><th scope="col">Moved beyond the old interval?</th></tr></thead>
<tbody>
${c.parameters.map((q) => html`<tr><td>${q.class}</td><td>${q.model}</td><td>${q.parameter}</td><td class="num">${dash(formatParameterValue(q.before))}</td><td class="num">${dash(formatParameterValue(q.after))}</td><td data-beyond="${q.outsideOldInterval ? 'yes' : 'no'}">${dash(beyond(q.before, q.after, q.outsideOldInterval))}</td></tr>`)}
</tbody>
</table>`
}
</section>
<section aria-labelledby="regions">
<h2 id="regions">Regions newly flagged or cleared</h2>
${
  c.regions.length === 0
    ? html`<p>No region changed its flag.</p>`
    : html`<table>
<thead><tr><th scope="col">Region</th><th scope="col">Class</th><th scope="col">Change</th><th scope="col">Before</th><th scope="col">Now</th></tr></thead>
<tbody>
${c.regions.map((r) => html`<tr><td>${r.region}</td><td>${r.class}</td><td data-region-change="${r.change}">${REGION_CHANGE_LABELS[r.change]}</td><td>${flag(r.before, r.foldBefore)}</td><td>${flag(r.after, r.foldAfter)}</td></tr>`)}
</tbody>
</table>`
}
</section>
<section aria-labelledby="ledger">
<h2 id="ledger">Ledger counts</h2>
${
  c.ledger.length === 0
    ? html`<p>The ledger counts by reason are unchanged.</p>`
    : html`<table>
<thead><tr><th scope="col">Table</th><th scope="col">Action</th><th scope="col">Reason</th><th scope="col" class="num">Before</th><th scope="col" class="num">Now</th></tr></thead>
<tbody>
${c.ledger.map((l) => html`<tr><td>${l.table}</td><td>${l.action}</td><td><code>${l.reason}</code></td><td class="num">${l.before}</td><td class="num">${l.after}</td></tr>`)}
</tbody>
</table>`
}
</section>`;
}

function cellIds(count: number, shown: string[]): SafeHtml {
  if (count === 0) return html`—`;
  return html`${count}: ${shown.join(', ')}${count > shown.length ? html` and ${count - shown.length} more` : ''}`;
}

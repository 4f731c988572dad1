// One report figure as HTML: the inline SVG, its caption, its caution and links to its supplement files.
import { decorativeSvg } from './decorative-svg.js';
import { html, raw, type SafeHtml } from './html.js';
import type { FigureEntry, FigurePage } from '../../lib/site/figure-entry.js';

/** `<figure>` with the renderer's SVG inline (trusted), an escaped caption, the caution when set and the file links. */
export function figureBlock(entry: FigureEntry, root = ''): SafeHtml {
  return html`<figure id="fig-${entry.id}" aria-labelledby="fig-${entry.id}-caption">
<div class="figure-svg" role="img" aria-label="${entry.alt}">${raw(decorativeSvg(entry.svg))}</div>
<figcaption id="fig-${entry.id}-caption"><strong>${entry.title}.</strong> ${entry.caption}</figcaption>
${entry.caution ? html`<p class="caution">${entry.caution}</p>` : ''}
${entry.files.length ? html`<p class="figure-files">Files: ${entry.files.map((f, i) => html`${i ? ', ' : ''}<a href="${root}${f.href}">${f.label}</a>`)}</p>` : ''}
</figure>
`;
}

/** The figures of one page from report.sections.figures (absent or malformed: none), in build order. */
export function pageFigures(figures: unknown, page: FigurePage): FigureEntry[] {
  return Array.isArray(figures) ? (figures as FigureEntry[]).filter((f) => f.page === page) : [];
}

/** Every figure of a page as blocks, or a sentence saying there are none. */
export function figureBlocks(figures: unknown, page: FigurePage): SafeHtml {
  const list = pageFigures(figures, page);
  return list.length ? html`${list.map((f) => figureBlock(f))}` : html`<p>No figures were built for this page.</p>`;
}

// The page frame shared by every report page: head, navigation, footer.
import { html, raw, type SafeHtml } from './html.js';
import type { ReportModel } from '../../lib/site/report-model.js';

/** One navigation entry. */
interface NavItem {
  href: string;
  label: string;
}

/** Site navigation, in reading order. */
export const NAV: NavItem[] = [
  { href: 'index.html', label: 'Overview' },
  { href: 'inventory.html', label: 'Inventory' },
  { href: 'fields.html', label: 'Nutrient fields' },
  { href: 'quotas.html', label: 'Quotas' },
  { href: 'anomalies.html', label: 'Anomalies' },
  { href: 'methods.html', label: 'Methods' },
  { href: 'changes.html', label: 'Changes' },
  { href: 'supplement.html', label: 'Supplement' },
];

/** Content-Security-Policy: nothing may load from outside the site and no script runs; inline style attributes (MathML, SVG) are allowed. */
export const CSP = "default-src 'none'; img-src 'self' data:; style-src 'self' 'unsafe-inline'; font-src 'self'; script-src 'none'; base-uri 'none'; form-action 'none'";

/** Wrap a page body in the report frame; `root` is the relative path back to the site root ('' or '../../'). */
export function layout(report: ReportModel, page: { title: string; href: string; body: SafeHtml; root?: string }): string {
  const root = page.root ?? '';
  const nav = NAV.filter((item) => report.pages.includes(item.href));
  return html`<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta http-equiv="Content-Security-Policy" content="${CSP}">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${page.title} · ${report.meta.title} · v${report.meta.version}</title>
<link rel="stylesheet" href="${root}assets/report.css">
</head>
<body>
<a class="skip" href="#main">Skip to content</a>
<header class="masthead">
<p class="masthead-title"><a href="${root}index.html">${report.meta.title}</a></p>
<p class="masthead-version">Version ${report.meta.version} · ${report.meta.date}</p>
<nav aria-label="Report sections"><ul>
${nav.map((item) => html`<li><a href="${root}${item.href}"${item.href === page.href ? raw(' aria-current="page"') : ''}>${item.label}</a></li>`)}
</ul></nav>
</header>
<main id="main">
<h1>${page.title}</h1>
${page.body}
</main>
<footer>
<p>${report.meta.authors.join(', ')}${report.meta.programme ? html` · ${report.meta.programme}` : ''} · licence ${report.meta.licence} · built with basinquota ${report.meta.toolVersion}</p>
</footer>
</body>
</html>
`.value;
}

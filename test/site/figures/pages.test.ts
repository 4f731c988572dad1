// figureBlock and the Nutrient fields, Quotas and Anomalies pages: markup, links, caution, escaping of data-derived text.
import { describe, expect, it } from 'vitest';
import { figureBlock } from '../../../content/_lib/figure-block.js';
import { render as renderFields } from '../../../content/fields.11ty.js';
import { render as renderQuotas } from '../../../content/quotas.11ty.js';
import { render as renderAnomalies } from '../../../content/anomalies.11ty.js';
import type { ReportModel } from '../../../lib/site/report-model.js';
import type { FigureEntry } from '../../../lib/site/figure-entry.js';
import type { AnomaliesSection, FieldsSection, QuotasSection } from '../../../lib/site/figures/index.js';

const HOSTILE = '<script>alert(1)</script>';

const entry = (page: FigureEntry['page'], extra: Partial<FigureEntry> = {}): FigureEntry => ({
  id: `${page}-fig`,
  page,
  title: `Title ${HOSTILE}`,
  caption: `Caption for ${HOSTILE} with n = 3`,
  alt: `Alt "${HOSTILE}"`,
  svg: '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><rect width="10" height="10"/></svg>',
  files: [{ label: 'SVG', href: `supplement/figures/${page}-fig.svg` }],
  caution: null,
  ...extra,
});

const param = { estimate: 0.5, lower: 0.4, upper: 0.6, bootstrap: null };
const quotas: QuotasSection = {
  level: 0.95,
  classes: [
    { phytoClass: HOSTILE, nCells: 12, nStations: 4, fitted: true, reason: null, primary: { model: 'ols', reason: `configured ${HOSTILE}` }, models: [
      { model: 'ols', fitted: true, reason: null, exponent: param, log10Coefficient: param, qmax: null, k: null, aicc: -12.345, primary: true },
      { model: 'york', fitted: false, reason: `did not converge ${HOSTILE}`, exponent: null, log10Coefficient: null, qmax: null, k: null, aicc: null, primary: false },
    ] },
  ],
  ancova: { equalSlopes: { f: 10.36, df1: 3, df2: 1480, p: 0.0000009 }, equalIntercepts: { f: 74.8, df1: 3, df2: 1483, p: 0 }, commonSlope: 0.421 },
  pairwise: [{ classA: HOSTILE, classB: 'diatom', difference: -0.25, lower: -0.35, upper: -0.16, p: 0.02 }],
  notes: [],
};
const anomalies: AnomaliesSection = {
  fdrQ: 0.05, minStations: 3, targetFold: 1.5, level: 0.95,
  rows: [{ region: 'r1', regionName: `Region ${HOSTILE}`, phytoClass: HOSTILE, status: 'tested', nStations: 10, nCells: 90, meanResidual: -0.3, fold: 0.5, foldLow: 0.41, foldHigh: 0.61, pValue: 0.0001, pAdjusted: 0.002, flag: 'lower-than-fit', flagged: true, looStable: true, mostInfluential: 'SG1 / SG1-01', minDetectableFold: 1.2, stationsNeeded: 5 }],
};
const fields: FieldsSection = { grids: [{ file: `grids/${HOSTILE}.nc`, variable: 'dfe', quantity: 'dissolved_fe', units: 'nmol/kg', nLon: 72, nLat: 36, nDepth: 10, nTime: 12 }] };

const report = (sections: Record<string, unknown>): ReportModel => ({
  meta: { title: 'T', authors: ['A'], programme: null, licence: 'CC-BY-4.0', contact: null, version: 1, date: '2026-01-01', toolVersion: '0.0.0' },
  counts: { cruises: 1, stations: 1, samples: 1, cells: 1, cellsByClass: [] },
  inventory: [], files: [], ledger: [], findings: [], conversions: [], matchSources: [], crossover: [],
  crossoverSettings: { maxDistanceKm: 100, minDepthM: 1000, thresholdNmolKg: 0.05 },
  pages: ['index.html', 'fields.html', 'quotas.html', 'anomalies.html'],
  sections,
});

describe('figureBlock(entry)', () => {
  it('inlines the SVG, escapes caption, title and alt, and links the files', () => {
    const out = figureBlock(entry('quotas')).value;
    expect(out).toContain('<figure id="fig-quotas-fig"');
    expect(out).toContain('<rect width="10" height="10"/>');
    expect(out).not.toContain(HOSTILE);
    expect(out).toContain('Caption for &lt;script&gt;alert(1)&lt;/script&gt; with n = 3');
    expect(out).toContain('aria-label="Alt &quot;&lt;script&gt;');
    expect(out).toContain('<a href="supplement/figures/quotas-fig.svg">SVG</a>');
    expect(out).not.toContain('class="caution"');
  });

  it('shows the caution when the entry has one', () => {
    expect(figureBlock(entry('quotas', { caution: 'Defer to the London Protocol.' })).value).toContain('<p class="caution">Defer to the London Protocol.</p>');
  });
});

describe('render({report}) of the three pages', () => {
  const sections = { figures: [entry('fields'), entry('quotas'), entry('anomalies')], fields, quotas, anomalies };

  it('escape a hostile class, region and file name everywhere', () => {
    for (const html of [renderFields({ report: report(sections) }), renderQuotas({ report: report(sections) }), renderAnomalies({ report: report(sections) })]) {
      expect(html).not.toContain('<script');
      expect(html).toContain('&lt;script&gt;');
    }
  });

  it("show only their own page's figures", () => {
    const html = renderQuotas({ report: report(sections) });
    expect(html).toContain('id="fig-quotas-fig"');
    expect(html).not.toContain('id="fig-fields-fig"');
    expect(html).not.toContain('id="fig-anomalies-fig"');
  });

  it('write the fit table with intervals, the primary model and the ANCOVA', () => {
    const html = renderQuotas({ report: report(sections) });
    expect(html).toContain('0.500 <span class="ci">(0.400–0.600)</span>');
    expect(html).toContain('ols ★');
    expect(html).toContain('not fitted: did not converge &lt;script&gt;');
    expect(html).toContain('<td class="num">3, 1480</td><td class="num">&lt; 0.001</td>');
  });

  it('mark flagged anomaly rows and give the fold with its interval', () => {
    const html = renderAnomalies({ report: report(sections) });
    expect(html).toContain('<tr class="flagged"');
    expect(html).toContain('0.50× (0.41–0.61)');
    expect(html).toContain('1 region × class group is flagged');
  });

  it('list the grids with their lattice size on the fields page', () => {
    expect(renderFields({ report: report(sections) })).toContain('72 × 36 × 10 × 12');
  });

  it('say so when the stages did not run', () => {
    expect(renderQuotas({ report: report({}) })).toContain('The fits did not run in this build.');
    expect(renderAnomalies({ report: report({}) })).toContain('The anomaly tests did not run in this build.');
    expect(renderFields({ report: report({}) })).toContain('No figures were built for this page.');
  });
});

// A minimal ReportModel for page-template tests: empty holdings, one section set.
import type { ReportModel } from '../../lib/site/report-model.js';

/** A report with no data, the given pages, and `sections[name] = value` when value is defined. */
export function reportStub(page: string, name: string, value: unknown, meta: Partial<ReportModel['meta']> = {}): ReportModel {
  return {
    meta: { title: 'Test report', authors: ['A. Author'], programme: null, licence: 'CC-BY-4.0', contact: null, version: 1, date: '2024-06-01', toolVersion: '0.1.0', ...meta },
    counts: { cruises: 0, stations: 0, samples: 0, cells: 0, cellsByClass: [] },
    findings: [],
    inventory: [],
    files: [],
    ledger: [],
    conversions: [],
    matchSources: [],
    crossover: [],
    crossoverSettings: { maxDistanceKm: 200, minDepthM: 1000, thresholdNmolKg: 0.1 },
    pages: ['index.html', page],
    sections: value === undefined ? {} : { [name]: value },
  };
}

// The version snapshot of a build: what the next version is compared on.
import type { PipelineResult } from '../pipeline/index.js';
import type { SnapshotParameter, SnapshotRegion, VersionSnapshot } from '../version/index.js';

const byText = (a: string, b: string): number => (a < b ? -1 : a > b ? 1 : 0);

/** Build the snapshot of one pipeline result for a version number and build date. */
export function buildSnapshot(result: PipelineResult, version: number, date: string): VersionSnapshot {
  const cruises = new Map<string, { stations: Set<string>; samples: number; cells: number }>();
  const visit = (table: PipelineResult['samples'], kind: 'samples' | 'cells'): void => {
    if (table.numRows() === 0) return;
    const cruise = table.array('cruise') as ArrayLike<string>;
    const station = table.array('station') as ArrayLike<string>;
    for (let i = 0; i < table.numRows(); i++) {
      let e = cruises.get(cruise[i]);
      if (!e) cruises.set(cruise[i], (e = { stations: new Set(), samples: 0, cells: 0 }));
      e.stations.add(station[i]);
      e[kind]++;
    }
  };
  visit(result.samples, 'samples');
  visit(result.cells, 'cells');
  const parameters: SnapshotParameter[] = [];
  for (const cls of result.fits ? [...result.fits.classes, result.fits.pooled] : []) {
    if (!cls.fitted) continue;
    for (const model of cls.models) {
      if (!model.fitted) continue;
      for (const [name, p] of Object.entries(model.parameters as Record<string, { estimate: number; interval: { lower: number; upper: number } }>)) {
        parameters.push({ class: cls.class, model: model.model, parameter: name, estimate: p.estimate, lower: p.interval.lower, upper: p.interval.upper });
      }
    }
  }
  parameters.sort((a, b) => byText(a.class, b.class) || byText(a.model, b.model) || byText(a.parameter, b.parameter));
  const regions: SnapshotRegion[] = (result.anomalies?.groups ?? []).map((g) => ({
    region: g.region,
    class: g.phytoClass,
    flag: g.status === 'not-tested' ? 'not-tested' : g.flag,
    fold: g.fold ?? NaN,
  }));
  regions.sort((a, b) => byText(a.region, b.region) || byText(a.class, b.class));
  const cellIds = result.cells.numRows() ? Array.from(result.cells.array('cell_id') as ArrayLike<string>).sort(byText) : [];
  return {
    version,
    date,
    cruises: [...cruises.entries()].sort(([a], [b]) => byText(a, b)).map(([cruise, e]) => ({ cruise, stations: [...e.stations].sort(byText), samples: e.samples, cells: e.cells })),
    cellIds,
    parameters,
    regions,
    ledger: result.ledger.countsByReason(),
  };
}

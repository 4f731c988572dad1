// Compare two versions' snapshots: what data came or went, which fits moved, which regions changed flag.
import type { ChangesSection, HoldingChange, LedgerChange, ParameterChange, ParameterValue, RegionChange, StationChange } from './changes-section.js';
import { compareText } from './compare-text.js';
import type { SnapshotParameter, SnapshotRegion, VersionSnapshot } from './snapshot.js';

/** How many added or removed cell ids are listed (the counts are always complete). */
export const CELL_ID_EXAMPLES = 5;

const FLAGGED = new Set(['lower-than-fit', 'higher-than-fit']);

/** Everything that differs from `previous` to `current`, as plain JSON in a stable order. */
export function diffSnapshots(previous: VersionSnapshot, current: VersionSnapshot): ChangesSection {
  const oldCruises = new Map(previous.cruises.map((c) => [c.cruise, c]));
  const newCruises = new Map(current.cruises.map((c) => [c.cruise, c]));
  const allCruises = union(oldCruises.keys(), newCruises.keys());

  const stations: StationChange[] = [];
  const holdings: HoldingChange[] = [];
  for (const cruise of allCruises) {
    const a = oldCruises.get(cruise);
    const b = newCruises.get(cruise);
    // A whole cruise added or removed is reported once, as a cruise, not station by station.
    if (a && b) {
      const added = minus(b.stations, a.stations);
      const removed = minus(a.stations, b.stations);
      if (added.length || removed.length) stations.push({ cruise, added, removed });
    }
    const row = { cruise, samplesBefore: a?.samples ?? 0, samplesAfter: b?.samples ?? 0, cellsBefore: a?.cells ?? 0, cellsAfter: b?.cells ?? 0 };
    if (row.samplesBefore !== row.samplesAfter || row.cellsBefore !== row.cellsAfter) holdings.push(row);
  }

  const addedIds = minus(current.cellIds, previous.cellIds);
  const removedIds = minus(previous.cellIds, current.cellIds);

  return {
    previous: { version: previous.version, date: previous.date },
    current: { version: current.version, date: current.date },
    cruises: { added: minus([...newCruises.keys()], [...oldCruises.keys()]), removed: minus([...oldCruises.keys()], [...newCruises.keys()]) },
    stations,
    holdings,
    cells: {
      before: previous.cellIds.length,
      after: current.cellIds.length,
      added: addedIds.length,
      removed: removedIds.length,
      addedIds: addedIds.slice(0, CELL_ID_EXAMPLES),
      removedIds: removedIds.slice(0, CELL_ID_EXAMPLES),
    },
    parameters: diffParameters(previous.parameters, current.parameters),
    regions: diffRegions(previous.regions, current.regions),
    ledger: diffLedger(previous.ledger, current.ledger),
  };
}

/** The section for a version with nothing before it: every list empty. */
export function firstVersionChanges(current: VersionSnapshot): ChangesSection {
  return {
    previous: null,
    current: { version: current.version, date: current.date },
    cruises: { added: [], removed: [] },
    stations: [],
    holdings: [],
    cells: { before: 0, after: current.cellIds.length, added: 0, removed: 0, addedIds: [], removedIds: [] },
    parameters: [],
    regions: [],
    ledger: [],
  };
}

function diffParameters(before: SnapshotParameter[], after: SnapshotParameter[]): ParameterChange[] {
  const key = (p: SnapshotParameter) => JSON.stringify([p.class, p.model, p.parameter]);
  const a = new Map(before.map((p) => [key(p), p]));
  const b = new Map(after.map((p) => [key(p), p]));
  return unionTuples(a.keys(), b.keys()).map((k) => {
    const [klass, model, parameter] = JSON.parse(k) as [string, string, string];
    const old = a.has(k) ? value(a.get(k)!) : null;
    const now = b.has(k) ? value(b.get(k)!) : null;
    const outside = old !== null && now !== null && old.lower !== null && old.upper !== null && now.estimate !== null && (now.estimate < old.lower || now.estimate > old.upper);
    return { class: klass, model, parameter, before: old, after: now, outsideOldInterval: outside };
  });
}

function diffRegions(before: SnapshotRegion[], after: SnapshotRegion[]): RegionChange[] {
  const key = (r: SnapshotRegion) => JSON.stringify([r.region, r.class]);
  const a = new Map(before.map((r) => [key(r), r]));
  const b = new Map(after.map((r) => [key(r), r]));
  const out: RegionChange[] = [];
  for (const k of unionTuples(a.keys(), b.keys())) {
    const old = a.get(k);
    const now = b.get(k);
    const wasFlagged = old !== undefined && FLAGGED.has(old.flag);
    const isFlagged = now !== undefined && FLAGGED.has(now.flag);
    const change = !wasFlagged && isFlagged ? 'newly-flagged' : wasFlagged && !isFlagged ? 'cleared' : wasFlagged && isFlagged && old.flag !== now.flag ? 'reversed' : null;
    if (change === null) continue;
    const [region, klass] = JSON.parse(k) as [string, string];
    out.push({ region, class: klass, change, before: old?.flag ?? null, after: now?.flag ?? null, foldBefore: finite(old?.fold), foldAfter: finite(now?.fold) });
  }
  return out;
}

function diffLedger(before: VersionSnapshot['ledger'], after: VersionSnapshot['ledger']): LedgerChange[] {
  type Row = VersionSnapshot['ledger'][number];
  const key = (r: Row) => JSON.stringify([r.table, r.action, r.reason]);
  const a = new Map(before.map((r) => [key(r), r.count]));
  const b = new Map(after.map((r) => [key(r), r.count]));
  const out: LedgerChange[] = [];
  for (const k of unionTuples(a.keys(), b.keys())) {
    const [table, action, reason] = JSON.parse(k) as [string, string, string];
    const row = { table, action, reason, before: a.get(k) ?? 0, after: b.get(k) ?? 0 };
    if (row.before !== row.after) out.push(row);
  }
  return out;
}

function value(p: SnapshotParameter): ParameterValue {
  return { estimate: finite(p.estimate), lower: finite(p.lower), upper: finite(p.upper) };
}

/** NaN in memory and null after a JSON round trip both mean "none". */
function finite(x: number | null | undefined): number | null {
  return typeof x === 'number' && Number.isFinite(x) ? x : null;
}

/** Sorted distinct union of plain ids. */
function union(a: Iterable<string>, b: Iterable<string>): string[] {
  return [...new Set([...a, ...b])].sort(compareText);
}

/** Distinct union of JSON-encoded tuples, sorted field by field (the encoded text would not sort that way: '"a"' vs '"a b"'). */
function unionTuples(a: Iterable<string>, b: Iterable<string>): string[] {
  const keys = [...new Set([...a, ...b])].map((k) => ({ k, t: JSON.parse(k) as string[] }));
  keys.sort((x, y) => {
    for (let i = 0; i < x.t.length; i++) {
      const c = compareText(x.t[i], y.t[i]);
      if (c !== 0) return c;
    }
    return 0;
  });
  return keys.map((x) => x.k);
}

/** Sorted members of `a` not in `b`. */
function minus(a: readonly string[], b: readonly string[]): string[] {
  const drop = new Set(b);
  return [...new Set(a.filter((x) => !drop.has(x)))].sort(compareText);
}

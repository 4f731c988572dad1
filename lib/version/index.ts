// The version stage: manifests, version numbers, snapshots and what changed between versions.
export { canonicalJson, prettyJson } from './canonical-json.js';
export { sha256 } from './sha256.js';
export { compareText } from './compare-text.js';
export { buildManifest, inputsHash, type Manifest, type ManifestFile, type ManifestInput } from './manifest.js';
export { parseManifest } from './parse-manifest.js';
export { parseSnapshot } from './parse-snapshot.js';
export { nextVersion, type ArchivedManifest, type NextVersion } from './next-version.js';
export type { VersionSnapshot, SnapshotParameter, SnapshotRegion } from './snapshot.js';
export type { ChangesSection, VersionRef, ParameterValue, ParameterChange, RegionChange, RegionChangeKind, StationChange, HoldingChange, LedgerChange } from './changes-section.js';
export { diffSnapshots, firstVersionChanges, CELL_ID_EXAMPLES } from './diff-snapshots.js';
export { formatChanges, formatParameterValue, beyond, REGION_CHANGE_LABELS, CHANGE_SIG_FIGS } from './format-changes.js';
export { formatNumber } from './format-number.js';
export { formatTable } from './format-table.js';
export * as versionMessages from './messages.js';

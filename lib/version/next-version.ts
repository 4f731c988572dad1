// Report version numbering: a number changes only when what the report was built from changed.
import { inputsHash, type Manifest } from './manifest.js';

/** An archived version as nextVersion needs it. */
export interface ArchivedManifest {
  /** Version number (1, 2, …). */
  version: number;
  /** Its manifest. */
  manifest: Manifest;
}

/** The version this build gets and the one its Changes page compares with. */
export interface NextVersion {
  /** Report version number of this build. */
  version: number;
  /** True when this build is a new version (nothing archived yet, or inputs differ from the latest). */
  changed: boolean;
  /** The archived version to compare with (the highest below `version`); absent for version 1. */
  previous?: number;
  /** Inputs match the latest version but the results hash does not (e.g. another Node gave other floats). */
  resultsDiffer: boolean;
}

/**
 * Compare the manifest with the latest archived one: same inputsHash keeps its number (so the site
 * rebuilds to the same bytes), otherwise latest + 1. Older archived versions are not searched: going
 * back to earlier inputs is a new version too.
 */
export function nextVersion(manifest: Manifest, archived: readonly ArchivedManifest[]): NextVersion {
  if (archived.length === 0) return { version: 1, changed: true, resultsDiffer: false };
  const sorted = [...archived].sort((a, b) => a.version - b.version);
  const latest = sorted[sorted.length - 1];
  if (inputsHash(latest.manifest) === inputsHash(manifest)) {
    const below = sorted.filter((a) => a.version < latest.version);
    const previous = below.length > 0 ? below[below.length - 1].version : undefined;
    return { version: latest.version, changed: false, ...(previous !== undefined ? { previous } : {}), resultsDiffer: latest.manifest.resultsSha256 !== manifest.resultsSha256 };
  }
  return { version: latest.version + 1, changed: true, previous: latest.version, resultsDiffer: false };
}

import { describe, expect, it } from 'vitest';
import { buildManifest, nextVersion, type ManifestInput } from '../../lib/version/index.js';

const manifest = (over: Partial<ManifestInput> = {}) =>
  buildManifest({ configText: 'fits: {}', files: [{ path: 'cells.csv', bytes: 'id\nc1\n' }], packageVersion: '0.1.0', nodeVersion: 'v20.0.0', results: { n: 1 }, ...over });

describe('nextVersion', () => {
  it('nextVersion(manifest, []) is version 1 with nothing to compare with', () => {
    expect(nextVersion(manifest(), [])).toEqual({ version: 1, changed: true, resultsDiffer: false });
  });

  it('nextVersion(manifest, archive) keeps the number when nothing changed', () => {
    expect(nextVersion(manifest(), [{ version: 1, manifest: manifest() }])).toEqual({ version: 1, changed: false, resultsDiffer: false });
  });

  it('nextVersion(manifest, archive) keeps the number and still names the version before it', () => {
    const archive = [
      { version: 2, manifest: manifest() },
      { version: 1, manifest: manifest({ configText: 'old' }) },
    ];
    expect(nextVersion(manifest(), archive)).toEqual({ version: 2, changed: false, previous: 1, resultsDiffer: false });
  });

  it('nextVersion(manifest, archive) adds one when the config changed', () => {
    expect(nextVersion(manifest({ configText: 'fits: { primary: ols }' }), [{ version: 1, manifest: manifest() }])).toEqual({ version: 2, changed: true, previous: 1, resultsDiffer: false });
  });

  it('nextVersion(manifest, archive) adds one when an input file changed', () => {
    expect(nextVersion(manifest({ files: [{ path: 'cells.csv', bytes: 'id\nc1\nc2\n' }] }), [{ version: 1, manifest: manifest() }]).version).toBe(2);
  });

  it('nextVersion(manifest, archive) adds one when the package version changed', () => {
    expect(nextVersion(manifest({ packageVersion: '0.2.0' }), [{ version: 1, manifest: manifest() }]).version).toBe(2);
  });

  it('nextVersion(manifest, archive) keeps the number when only the Node version changed, and says if results differ', () => {
    const other = manifest({ nodeVersion: 'v22.1.0', results: { n: 1.0000000000000002 } });
    expect(nextVersion(other, [{ version: 1, manifest: manifest() }])).toEqual({ version: 1, changed: false, resultsDiffer: true });
  });

  it('nextVersion(manifest, archive) compares with the latest version only: reverting to v1 inputs is a new version', () => {
    const archive = [
      { version: 1, manifest: manifest() },
      { version: 2, manifest: manifest({ configText: 'v2' }) },
    ];
    expect(nextVersion(manifest(), archive)).toEqual({ version: 3, changed: true, previous: 2, resultsDiffer: false });
  });
});

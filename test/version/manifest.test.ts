import { describe, expect, it } from 'vitest';
import { buildManifest, canonicalJson, inputsHash, sha256, type ManifestInput } from '../../lib/version/index.js';

// FIPS 180-2, Appendix B.1 and B.2: the SHA-256 of "abc" and of the 448-bit two-block message.
const SHA256_ABC = 'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad';
const SHA256_TWO_BLOCK = '248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1';

const input = (over: Partial<ManifestInput> = {}): ManifestInput => ({
  configText: 'abc',
  files: [
    { path: 'data/b.csv', bytes: new TextEncoder().encode('abc') },
    { path: 'data/a.csv', bytes: 'x,y\n1,2\n' },
  ],
  packageVersion: '0.1.0',
  nodeVersion: 'v20.11.0',
  results: { fits: [1, 2], anomalies: { n: 3 } },
  ...over,
});

describe('sha256', () => {
  it('sha256(text) matches the FIPS 180-2 examples', () => {
    expect(sha256('abc')).toBe(SHA256_ABC);
    expect(sha256('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq')).toBe(SHA256_TWO_BLOCK);
  });
});

describe('buildManifest', () => {
  it('buildManifest(input) hashes the config text and every file, sorted by path', () => {
    const m = buildManifest(input());
    expect(m.configSha256).toBe(SHA256_ABC);
    expect(m.files.map((f) => f.path)).toEqual(['data/a.csv', 'data/b.csv']);
    expect(m.files[1]).toEqual({ path: 'data/b.csv', bytes: 3, sha256: SHA256_ABC });
    expect(m.files[0].bytes).toBe(8);
    expect(m.packageVersion).toBe('0.1.0');
    expect(m.nodeVersion).toBe('v20.11.0');
  });

  it('buildManifest(input) hashes the canonical JSON of the results, so key order does not matter', () => {
    const a = buildManifest(input({ results: { b: 1, a: 2 } }));
    const b = buildManifest(input({ results: { a: 2, b: 1 } }));
    expect(a.resultsSha256).toBe(sha256('{"a":2,"b":1}'));
    expect(b.resultsSha256).toBe(a.resultsSha256);
    expect(sha256(canonicalJson({ b: 1, a: 2 }))).toBe(a.resultsSha256);
  });

  it('buildManifest(input) does not mutate its input', () => {
    const given = input();
    const before = given.files.map((f) => f.path);
    buildManifest(given);
    expect(given.files.map((f) => f.path)).toEqual(before);
  });
});

describe('inputsHash', () => {
  const base = inputsHash(buildManifest(input()));

  it('inputsHash(manifest) ignores the Node version and the results', () => {
    expect(inputsHash(buildManifest(input({ nodeVersion: 'v22.0.0' })))).toBe(base);
    expect(inputsHash(buildManifest(input({ results: { other: true } })))).toBe(base);
  });

  it('inputsHash(manifest) ignores the order the files were listed in', () => {
    expect(inputsHash(buildManifest(input({ files: [...input().files].reverse() })))).toBe(base);
  });

  it('inputsHash(manifest) changes with the config, a file, a file name or the package version', () => {
    expect(inputsHash(buildManifest(input({ configText: 'abd' })))).not.toBe(base);
    expect(inputsHash(buildManifest(input({ files: [{ path: 'data/a.csv', bytes: 'x,y\n1,3\n' }, input().files[0]] })))).not.toBe(base);
    expect(inputsHash(buildManifest(input({ files: [{ path: 'data/c.csv', bytes: 'x,y\n1,2\n' }, input().files[0]] })))).not.toBe(base);
    expect(inputsHash(buildManifest(input({ packageVersion: '0.2.0' })))).not.toBe(base);
  });
});

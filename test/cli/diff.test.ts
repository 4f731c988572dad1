import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { archivedSiteFiles, ArchiveError, readArchive, writeArchiveVersion } from '../../lib/cli/archive.js';
import { diffCommand, parseVersionArgument } from '../../lib/cli/diff-command.js';
import { buildManifest, diffSnapshots, formatChanges, type Manifest } from '../../lib/version/index.js';
import { snapshotV1, snapshotV2 } from '../version/snapshots.js';

const manifest = (config: string, results: unknown = { n: 1 }): Manifest =>
  buildManifest({ configText: config, files: [{ path: 'cells.csv', bytes: 'id\nc1\n' }], packageVersion: '0.1.0', nodeVersion: 'v20.0.0', results });

let project: string;
beforeEach(() => {
  project = mkdtempSync(join(tmpdir(), 'basinquota-archive-'));
});
afterEach(() => {
  rmSync(project, { recursive: true, force: true });
});

/** A built site as writeSite leaves it, including its own versions/ folder. */
function fakeSite(name: string): string {
  const site = join(project, name);
  mkdirSync(join(site, 'assets'), { recursive: true });
  mkdirSync(join(site, 'versions', 'v0'), { recursive: true });
  writeFileSync(join(site, 'index.html'), `<p>${name}</p>`);
  writeFileSync(join(site, 'assets', 'report.css'), 'body{}');
  writeFileSync(join(site, 'versions', 'v0', 'index.html'), 'older');
  return site;
}

describe('archive', () => {
  it('readArchive(dir) is empty for a project without an archive', () => {
    expect(readArchive(project)).toEqual([]);
  });

  it('writeArchiveVersion(dir, 1, entry) stores pretty sorted JSON that readArchive reads back', () => {
    const m = manifest('a');
    expect(writeArchiveVersion(project, 1, { manifest: m, snapshot: snapshotV1(), results: { z: 1, a: [NaN] } })).toBe(true);
    expect(readFileSync(join(project, 'archive', 'v1', 'results.json'), 'utf8')).toBe('{\n  "a": [\n    null\n  ],\n  "z": 1\n}\n');
    const [back] = readArchive(project);
    expect(back.version).toBe(1);
    expect(back.manifest).toEqual(m);
    // NaN intervals come back as null; the diff treats both as "no interval".
    expect(back.snapshot).toEqual(JSON.parse(JSON.stringify(snapshotV1())));
    expect(readdirSync(join(project, 'archive'))).toEqual(['v1']);
  });

  it('writeArchiveVersion(dir, n, entry) rewrites nothing when vN holds the same inputs', () => {
    writeArchiveVersion(project, 1, { manifest: manifest('a'), snapshot: snapshotV1(), results: { first: true } });
    expect(writeArchiveVersion(project, 1, { manifest: manifest('a', { other: 1 }), snapshot: snapshotV1(), results: { first: false } })).toBe(false);
    expect(readFileSync(join(project, 'archive', 'v1', 'results.json'), 'utf8')).toBe('{\n  "first": true\n}\n');
  });

  it('writeArchiveVersion(dir, n, entry) refuses to overwrite vN built from other inputs', () => {
    writeArchiveVersion(project, 1, { manifest: manifest('a'), snapshot: snapshotV1(), results: {} });
    const target = join(project, 'archive', 'v1');
    const write = () => writeArchiveVersion(project, 1, { manifest: manifest('b'), snapshot: snapshotV1(), results: {} });
    expect(write).toThrow(ArchiveError);
    expect(write).toThrow(`${target} already exists and was built from other inputs; a changed build must get a new version number`);
  });

  it('writeArchiveVersion(dir, n, {siteDir}) keeps the built site without its versions/ folder', () => {
    writeArchiveVersion(project, 1, { manifest: manifest('a'), snapshot: snapshotV1(), results: {}, siteDir: fakeSite('_site') });
    expect(readdirSync(join(project, 'archive', 'v1', 'site')).sort()).toEqual(['assets', 'index.html']);
  });

  it('archivedSiteFiles(dir, below) lists archived sites under versions/vN/, sorted, only below the given version', () => {
    writeArchiveVersion(project, 1, { manifest: manifest('a'), snapshot: snapshotV1(), results: {}, siteDir: fakeSite('one') });
    writeArchiveVersion(project, 2, { manifest: manifest('b'), snapshot: snapshotV2(), results: {}, siteDir: fakeSite('two') });
    expect(archivedSiteFiles(project).map((f) => f.path)).toEqual(['versions/v1/assets/report.css', 'versions/v1/index.html', 'versions/v2/assets/report.css', 'versions/v2/index.html']);
    const below2 = archivedSiteFiles(project, 2);
    expect(below2.map((f) => f.path)).toEqual(['versions/v1/assets/report.css', 'versions/v1/index.html']);
    expect(Buffer.from(below2[1].data).toString('utf8')).toBe('<p>one</p>');
  });

  it('readArchive(dir) ignores folders and files that are not vN', () => {
    writeArchiveVersion(project, 2, { manifest: manifest('a'), snapshot: snapshotV2(), results: {} });
    for (const name of ['v0', 'v01', 'notes', '.v3.tmp-1']) mkdirSync(join(project, 'archive', name));
    writeFileSync(join(project, 'archive', 'v4'), 'a file');
    expect(readArchive(project).map((a) => a.version)).toEqual([2]);
  });

  it('readArchive(dir) names a corrupt manifest', () => {
    mkdirSync(join(project, 'archive', 'v1'), { recursive: true });
    const file = join(project, 'archive', 'v1', 'manifest.json');
    writeFileSync(file, '{"configSha256": "abc"');
    expect(() => readArchive(project)).toThrow(`archived file ${file} is corrupt: it is not valid JSON; restore it from version control or remove its version folder`);
    writeFileSync(file, '{"configSha256": "abc"}');
    expect(() => readArchive(project)).toThrow(`archived file ${file} is corrupt: "configSha256" must be 64 lower-case hex digits; restore it from version control or remove its version folder`);
  });

  it('readArchive(dir) names a snapshot that sits in the wrong version folder', () => {
    writeArchiveVersion(project, 3, { manifest: manifest('a'), snapshot: snapshotV2(), results: {} });
    const file = join(project, 'archive', 'v3', 'snapshot.json');
    expect(() => readArchive(project)).toThrow(`archived file ${file} is corrupt: it says version 2 but lives in the folder of version 3; restore it from version control or remove its version folder`);
  });
});

describe('diffCommand', () => {
  const run = (a: string, b: string) => {
    const logged: string[] = [];
    let printed = '';
    const code = diffCommand(project, a, b, (line) => logged.push(line), (text) => (printed += text));
    return { code, logged, printed };
  };
  const archiveTwo = () => {
    writeArchiveVersion(project, 1, { manifest: manifest('a'), snapshot: snapshotV1(), results: {} });
    writeArchiveVersion(project, 2, { manifest: manifest('b'), snapshot: snapshotV2(), results: {} });
  };

  it('parseVersionArgument(text) reads v3, V3 and 3, and nothing else', () => {
    expect([parseVersionArgument('v3'), parseVersionArgument('V3'), parseVersionArgument('3')]).toEqual([3, 3, 3]);
    expect([parseVersionArgument('v0'), parseVersionArgument('03'), parseVersionArgument('latest'), parseVersionArgument('v1.2')]).toEqual([null, null, null, null]);
  });

  it('diffCommand(dir, "v1", "2") prints the changes and exits 0', () => {
    archiveTwo();
    const { code, logged, printed } = run('v1', '2');
    expect(code).toBe(0);
    expect(logged).toEqual([]);
    expect(printed).toBe(formatChanges(diffSnapshots(JSON.parse(JSON.stringify(snapshotV1())), JSON.parse(JSON.stringify(snapshotV2())))));
    expect(printed).toContain('  diatom  ols         slope      0.52 [0.41, 0.63]  0.71 [0.6, 0.82]  yes\n');
  });

  it('diffCommand(dir, va, vb) exits 2 on an unknown version and lists the archived ones', () => {
    archiveTwo();
    expect(run('v1', 'v5')).toEqual({ code: 2, logged: ['version 5 is not archived; archived versions: v1, v2'], printed: '' });
  });

  it('diffCommand(dir, va, vb) exits 2 when nothing is archived yet', () => {
    expect(run('1', '2')).toEqual({ code: 2, logged: [`version 1 is not archived: ${join(project, 'archive')} holds no versions yet (run basinquota build first)`], printed: '' });
  });

  it('diffCommand(dir, va, vb) exits 2 on an argument that is not a version', () => {
    expect(run('latest', 'v2')).toEqual({ code: 2, logged: ['"latest" is not a version; write it as v1 or 1'], printed: '' });
  });

  it('diffCommand(dir, va, vb) exits 1 on a corrupt archive and names the file', () => {
    archiveTwo();
    const file = join(project, 'archive', 'v2', 'manifest.json');
    writeFileSync(file, '[]');
    expect(run('v1', 'v2')).toEqual({ code: 1, logged: [`archived file ${file} is corrupt: expected a JSON object; restore it from version control or remove its version folder`], printed: '' });
  });
});

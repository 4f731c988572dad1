// The version archive inside a synthesis project: archive/vN/{manifest,snapshot,results}.json and the built site/, for the user to commit.
import { copyFileSync, existsSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { compareText, inputsHash, parseManifest, parseSnapshot, prettyJson, versionMessages as msg, type Manifest, type VersionSnapshot } from '../version/index.js';
import type { ExtraFile } from './write-site.js';

/** Folder names of archived versions: v1, v2, … (no leading zeros, so each number has one folder). */
const VERSION_FOLDER = /^v([1-9]\d*)$/;

/** The built site's own folder of earlier versions, left out of each archived site so archives do not nest. */
const SITE_VERSIONS = 'versions';

/** One archived version as read back. */
export interface ArchivedVersion {
  /** Version number. */
  version: number;
  /** Its manifest. */
  manifest: Manifest;
  /** Its snapshot. */
  snapshot: VersionSnapshot;
}

/** What one version stores. */
export interface ArchiveEntry {
  /** Manifest of the build. */
  manifest: Manifest;
  /** Snapshot the next version is compared with. */
  snapshot: VersionSnapshot;
  /** Full results, for the record. */
  results: unknown;
  /** Folder of the freshly built site to keep as archive/vN/site (its versions/ folder is left out). */
  siteDir?: string;
}

/** A corrupt archive file; the message names it. */
export class ArchiveError extends Error {
  override readonly name = 'ArchiveError';
}

/** The archive folder of a project. */
export function archiveDir(projectDir: string): string {
  return join(projectDir, 'archive');
}

/** Archived version numbers, ascending, from the folder names alone. */
export function archivedVersionNumbers(projectDir: string): number[] {
  const dir = archiveDir(projectDir);
  if (!existsSync(dir)) return [];
  return readdirSync(dir, { withFileTypes: true })
    .filter((e) => e.isDirectory())
    .map((e) => VERSION_FOLDER.exec(e.name))
    .filter((m): m is RegExpExecArray => m !== null)
    .map((m) => Number(m[1]))
    .sort((a, b) => a - b);
}

/** Every archived version, ascending; other folders are ignored; a corrupt manifest or snapshot throws an ArchiveError naming the file. */
export function readArchive(projectDir: string): ArchivedVersion[] {
  return archivedVersionNumbers(projectDir).map((version) => {
    const folder = join(archiveDir(projectDir), `v${version}`);
    const manifestFile = join(folder, 'manifest.json');
    const parsedManifest = parseManifest(readJson(manifestFile));
    if ('problem' in parsedManifest) throw new ArchiveError(msg.corruptArchiveFile(manifestFile, parsedManifest.problem));
    const snapshotFile = join(folder, 'snapshot.json');
    const parsedSnapshot = parseSnapshot(readJson(snapshotFile));
    if ('problem' in parsedSnapshot) throw new ArchiveError(msg.corruptArchiveFile(snapshotFile, parsedSnapshot.problem));
    if (parsedSnapshot.snapshot.version !== version) throw new ArchiveError(msg.corruptArchiveFile(snapshotFile, msg.snapshotVersionMismatch(version, parsedSnapshot.snapshot.version)));
    return { version, manifest: parsedManifest.manifest, snapshot: parsedSnapshot.snapshot };
  });
}

/**
 * Store version `version` atomically (written to a hidden temporary folder, then renamed into place).
 * Returns false, having written nothing, when archive/vN already holds a build of the same inputs;
 * throws an ArchiveError when it holds a build of other inputs.
 */
export function writeArchiveVersion(projectDir: string, version: number, entry: ArchiveEntry): boolean {
  const root = archiveDir(projectDir);
  const target = join(root, `v${version}`);
  if (existsSync(target)) {
    const manifestFile = join(target, 'manifest.json');
    const existing = parseManifest(readJson(manifestFile));
    if ('problem' in existing) throw new ArchiveError(msg.corruptArchiveFile(manifestFile, existing.problem));
    if (inputsHash(existing.manifest) === inputsHash(entry.manifest)) return false;
    throw new ArchiveError(msg.archiveConflict(target));
  }
  // A dot name never matches VERSION_FOLDER, so a crash mid-write leaves nothing readArchive would read.
  const tmp = join(root, `.v${version}.tmp-${process.pid}`);
  rmSync(tmp, { recursive: true, force: true });
  mkdirSync(tmp, { recursive: true });
  try {
    writeFileSync(join(tmp, 'manifest.json'), prettyJson(entry.manifest));
    writeFileSync(join(tmp, 'snapshot.json'), prettyJson(entry.snapshot));
    writeFileSync(join(tmp, 'results.json'), prettyJson(entry.results));
    if (entry.siteDir !== undefined) {
      for (const rel of listFiles(entry.siteDir)) {
        if (rel.split('/')[0] === SITE_VERSIONS) continue;
        const to = join(tmp, 'site', ...rel.split('/'));
        mkdirSync(join(to, '..'), { recursive: true });
        copyFileSync(join(entry.siteDir, ...rel.split('/')), to);
      }
    }
    renameSync(tmp, target);
  } catch (error) {
    rmSync(tmp, { recursive: true, force: true });
    throw error;
  }
  return true;
}

/** The archived sites of versions below `below` (all by default) as site files under versions/vN/, sorted by version then path. */
export function archivedSiteFiles(projectDir: string, below = Infinity): ExtraFile[] {
  const out: ExtraFile[] = [];
  for (const version of archivedVersionNumbers(projectDir)) {
    if (version >= below) continue;
    const site = join(archiveDir(projectDir), `v${version}`, 'site');
    for (const rel of listFiles(site)) out.push({ path: `versions/v${version}/${rel}`, data: readFileSync(join(site, ...rel.split('/'))) });
  }
  return out;
}

/** Regular files under `dir`, relative with forward slashes, sorted by code unit; [] when `dir` is absent. */
export function listFiles(dir: string): string[] {
  if (!existsSync(dir)) return [];
  const out: string[] = [];
  const walk = (rel: string): void => {
    for (const e of readdirSync(join(dir, ...rel.split('/').filter(Boolean)), { withFileTypes: true })) {
      const path = rel ? `${rel}/${e.name}` : e.name;
      if (e.isDirectory()) walk(path);
      else if (e.isFile()) out.push(path);
    }
  };
  walk('');
  return out.sort(compareText);
}

function readJson(file: string): unknown {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (error) {
    throw new ArchiveError(msg.corruptArchiveFile(file, 'it cannot be read'), { cause: error });
  }
  try {
    return JSON.parse(text) as unknown;
  } catch (error) {
    throw new ArchiveError(msg.corruptArchiveFile(file, 'it is not valid JSON'), { cause: error });
  }
}

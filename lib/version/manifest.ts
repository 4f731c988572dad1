// The manifest of one build: what went in (config, files, tool) and a fingerprint of what came out.
import { canonicalJson } from './canonical-json.js';
import { compareText } from './compare-text.js';
import { sha256 } from './sha256.js';

/** One input file's fingerprint. */
export interface ManifestFile {
  /** Path inside the project, forward slashes. */
  path: string;
  /** Size in bytes. */
  bytes: number;
  /** SHA-256 of the content, lower-case hex. */
  sha256: string;
}

/** Everything a report version was built from, plus the hash of its results. */
export interface Manifest {
  /** SHA-256 of the config file text (UTF-8). */
  configSha256: string;
  /** Input files, sorted by path. */
  files: ManifestFile[];
  /** basinquota package version. */
  packageVersion: string;
  /** Node.js version that built it (recorded, not part of inputsHash). */
  nodeVersion: string;
  /** SHA-256 of canonicalJson(results). */
  resultsSha256: string;
}

/** What buildManifest needs: the shell reads the bytes, this only hashes them. */
export interface ManifestInput {
  /** Config file text. */
  configText: string;
  /** Every input file with its content. */
  files: { path: string; bytes: Uint8Array | string }[];
  /** basinquota package version. */
  packageVersion: string;
  /** Node.js version (process.version). */
  nodeVersion: string;
  /** The build's results, any JSON-able value. */
  results: unknown;
}

/** Hash the config, every input file (sorted by path) and the canonical JSON of the results. */
export function buildManifest(input: ManifestInput): Manifest {
  const files = input.files
    .map((f) => ({ path: f.path, bytes: typeof f.bytes === 'string' ? Buffer.byteLength(f.bytes, 'utf8') : f.bytes.byteLength, sha256: sha256(f.bytes) }))
    .sort((a, b) => compareText(a.path, b.path));
  return {
    configSha256: sha256(input.configText),
    files,
    packageVersion: input.packageVersion,
    nodeVersion: input.nodeVersion,
    resultsSha256: sha256(canonicalJson(input.results)),
  };
}

/**
 * One hash over the config hash, each file's path and hash, and the package version.
 * The Node version is left out on purpose: rebuilding the same inputs with another Node
 * must not bump the report version (a float difference would show in resultsSha256 instead).
 */
export function inputsHash(manifest: Manifest): string {
  const files = [...manifest.files].sort((a, b) => compareText(a.path, b.path)).map((f) => [f.path, f.sha256]);
  return sha256(canonicalJson({ config: manifest.configSha256, files, packageVersion: manifest.packageVersion }));
}

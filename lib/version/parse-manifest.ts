// Check a manifest read back from an archive: a hand-edited or truncated one must fail loudly, not compare as "changed".
import type { Manifest } from './manifest.js';

const HEX64 = /^[0-9a-f]{64}$/;

/** The value as a Manifest, or a sentence saying what is wrong with it. */
export function parseManifest(value: unknown): { manifest: Manifest } | { problem: string } {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return { problem: 'expected a JSON object' };
  const m = value as Record<string, unknown>;
  for (const key of ['configSha256', 'resultsSha256'] as const) {
    if (typeof m[key] !== 'string' || !HEX64.test(m[key])) return { problem: `"${key}" must be 64 lower-case hex digits` };
  }
  for (const key of ['packageVersion', 'nodeVersion'] as const) {
    if (typeof m[key] !== 'string') return { problem: `"${key}" must be a string` };
  }
  if (!Array.isArray(m.files)) return { problem: '"files" must be a list' };
  for (const [i, f] of m.files.entries()) {
    const file = f as Record<string, unknown> | null;
    if (typeof file !== 'object' || file === null || typeof file.path !== 'string' || typeof file.bytes !== 'number' || typeof file.sha256 !== 'string' || !HEX64.test(file.sha256)) {
      return { problem: `"files[${i}]" must have a path, a byte count and a 64-digit sha256` };
    }
  }
  return { manifest: value as Manifest };
}

// Read a built site as a map from relative path to bytes, to compare sites byte for byte.
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative, sep } from 'node:path';

/** Every file under `root` as `relative/posix/path → bytes`, paths sorted. */
export function readTree(root: string): Map<string, Buffer> {
  const files = new Map<string, Buffer>();
  const walk = (dir: string): void => {
    for (const entry of readdirSync(dir, { withFileTypes: true }).sort((a, b) => (a.name < b.name ? -1 : 1))) {
      const path = join(dir, entry.name);
      if (entry.isDirectory()) walk(path);
      else files.set(relative(root, path).split(sep).join('/'), readFileSync(path));
    }
  };
  walk(root);
  return files;
}

/** Paths whose bytes differ between two trees, or that exist in only one of them. */
export function treeDifferences(a: Map<string, Buffer>, b: Map<string, Buffer>): string[] {
  const paths = new Set([...a.keys(), ...b.keys()]);
  return [...paths].filter((p) => {
    const x = a.get(p);
    const y = b.get(p);
    return !x || !y || !x.equals(y);
  }).sort();
}

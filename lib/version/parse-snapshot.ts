// Check a snapshot read back from an archive before comparing with it.
import type { VersionSnapshot } from './snapshot.js';

const LISTS = ['cruises', 'cellIds', 'parameters', 'regions', 'ledger'] as const;

/** The value as a VersionSnapshot, or a sentence saying what is wrong with it. */
export function parseSnapshot(value: unknown): { snapshot: VersionSnapshot } | { problem: string } {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return { problem: 'expected a JSON object' };
  const s = value as Record<string, unknown>;
  if (typeof s.version !== 'number' || !Number.isInteger(s.version) || s.version < 1) return { problem: '"version" must be a whole number from 1' };
  if (typeof s.date !== 'string') return { problem: '"date" must be a string' };
  for (const key of LISTS) if (!Array.isArray(s[key])) return { problem: `"${key}" must be a list` };
  return { snapshot: value as unknown as VersionSnapshot };
}

/** Class taxonomy: raw phytoplankton class labels to canonical class names through aliases. */
import type { ClassSpec } from './quota-options.js';
import { duplicateAlias } from './messages.js';

/** Normalise a label for matching: trimmed, lower case. */
function labelKey(label: string): string {
  return label.trim().toLowerCase();
}

/**
 * Build a resolver from raw label to canonical class name (null when unknown).
 * Throws when one alias is claimed by two classes, since the choice would be a guess.
 */
export function classResolver(classes: Record<string, ClassSpec>): (label: string) => string | null {
  const byKey = new Map<string, string>();
  for (const name of Object.keys(classes).sort()) {
    for (const alias of [name, ...classes[name].aliases]) {
      const key = labelKey(alias);
      const prior = byKey.get(key);
      if (prior !== undefined && prior !== name) throw new Error(duplicateAlias(alias, prior, name));
      byKey.set(key, name);
    }
  }
  return (label: string) => byKey.get(labelKey(label)) ?? null;
}

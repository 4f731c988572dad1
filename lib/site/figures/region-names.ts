// Region id → display name from the pipeline's region scheme.
import type { RegionCollection } from '../../geo/regions/index.js';

/** A lookup giving each region id its display name (the id itself when unknown, 'no region' for ''). */
export function regionNames(regions: RegionCollection | null): (id: string) => string {
  const names = new Map((regions?.features ?? []).map((f) => [f.id, f.properties.name]));
  return (id) => (id === '' ? 'no region' : names.get(id) ?? id);
}

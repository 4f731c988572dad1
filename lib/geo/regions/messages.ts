/** User-facing messages of the region schemes; tests assert the exact text. */

/** The regions file is not valid JSON. */
export function invalidJson(file: string, detail: string): string {
  return `${file}: not valid JSON (${detail})`;
}

/** The top-level object is not a FeatureCollection. */
export function notFeatureCollection(file: string, found: string): string {
  return `${file}: expected a GeoJSON FeatureCollection, found ${found}`;
}

/** A feature whose geometry is not a polygon. */
export function notPolygon(file: string, index: number, found: string): string {
  return `${file}: feature ${index}: geometry is ${found}; expected Polygon or MultiPolygon`;
}

/** A feature with neither an id nor a name. */
export function missingIdOrName(file: string, index: number): string {
  return `${file}: feature ${index}: has no id (feature id or properties.id) and no properties.name`;
}

/** Two features with the same id. */
export function duplicateId(file: string, index: number, id: string, first: number): string {
  return `${file}: feature ${index}: id "${id}" is already used by feature ${first}`;
}

/** A ring whose first and last positions differ. */
export function openRing(file: string, index: number, ring: string, first: number[], last: number[]): string {
  return `${file}: feature ${index}: ${ring} is not closed (first position [${first.join(', ')}], last [${last.join(', ')}]); GeoJSON rings repeat their first position at the end`;
}

/** A ring with fewer than four positions. */
export function shortRing(file: string, index: number, ring: string, count: number): string {
  return `${file}: feature ${index}: ${ring} has ${count} positions; a closed ring needs at least 4`;
}

/** A position that is not [longitude, latitude] in range. */
export function badPosition(file: string, index: number, ring: string, position: number, value: string): string {
  return `${file}: feature ${index}: ${ring} position ${position} is ${value}; expected [longitude −180..180, latitude −90..90]`;
}

/** A file with no polygon features at all. */
export function noPolygons(file: string): string {
  return `${file}: no Polygon or MultiPolygon features; a regions file needs at least one`;
}

/** A box size that does not tile the globe. */
export function badBoxSize(size: number): string {
  return `lat-lon box size must divide 180 evenly and be at most 90 degrees, got ${size}`;
}

/** User-facing messages of the harmonise stage (ledger details and errors); tests assert the exact text. */

/** Ledger detail: a fill value read as missing. */
export function fillValue(columns: { column: string; value: number }[]): string {
  return `fill value read as missing: ${columns.map((c) => `${c.column} = ${c.value}`).join(', ')}`;
}

/** Ledger detail: latitude or longitude outside the allowed range. */
export function positionOutOfRange(lat: number, lon: number): string {
  return `position out of range: lat ${lat} (expected −90 to 90), lon ${lon} (expected −360 to 360)`;
}

/** Ledger detail: a negative depth. */
export function negativeDepth(depth: number): string {
  return `negative depth ${depth} m (depth is positive down)`;
}

/** Ledger detail: given depth and depth from pressure disagree. */
export function depthPressureMismatch(depth: number, pressure: number, computed: number, tolerance: number): string {
  return `depth ${depth} m differs from ${round(computed)} m computed from pressure ${pressure} dbar by more than ${tolerance} m; the given depth is kept`;
}

/** Ledger detail: the same cruise/station/cast/bottle seen twice. */
export function duplicateBottle(key: string, firstLine: number, line: number): string {
  return `duplicate bottle ${key} on line ${line} (first on line ${firstLine}); the later row is excluded`;
}

/** Ledger detail: position on land, with a hint when swapping latitude and longitude would put it at sea. */
export function positionOnLand(lat: number, lon: number, swapHint: boolean): string {
  const base = `position lat ${lat}, lon ${lon} is on land`;
  return swapHint ? `${base}; swapping latitude and longitude would put it at sea (columns swapped?)` : base;
}

/** Ledger detail: density default used for a per-volume conversion. */
export function defaultDensity(columns: string[], density: number, missing: string[]): string {
  return `${columns.join(', ')} converted per volume → per mass with default density ${density} kg/m3 (${missing.join(', ')} missing)`;
}

/** Ledger detail: a raw flag that is not in the scheme. */
export function unknownFlag(column: string, raw: string, scheme: string): string {
  return `${column} = "${raw}" is not a flag of the ${scheme} scheme; the value is not used`;
}

/** Ledger detail: a value present but its flag cell empty. */
export function missingFlag(column: string): string {
  return `${column} is empty while the value is present; the value is marked questionable`;
}

/** Ledger detail: a value whose quality is not accepted. */
export function flagNotAccepted(quantity: string, quality: string): string {
  return `${quantity} has quality ${quality}, which is not accepted; the value is not used`;
}

/** Ledger detail: a below-detection value substituted. */
export function belowDetectionSubstituted(quantity: string, limit: number, value: number, policy: string): string {
  return `${quantity} below detection limit ${round(limit)}: set to ${round(value)} (policy ${policy})`;
}

/** Ledger detail: a below-detection value removed by policy, or because no limit is known. */
export function belowDetectionExcluded(quantity: string, reason: 'policy' | 'not-accepted' | 'no-limit'): string {
  if (reason === 'policy') return `${quantity} below detection limit: not used (policy exclude)`;
  if (reason === 'not-accepted') return `${quantity} below detection limit: not used (below_detection is not an accepted quality)`;
  return `${quantity} below detection limit but no limit is known (no ${quantity}_dl, no value, no default): not used`;
}

/** Error: the same cell id twice in one file. */
export function duplicateCellId(file: string, id: string, firstLine: number, line: number): string {
  return `${file}:${line}: duplicate cell id "${id}" (first on line ${firstLine}); cell ids must be unique within a file`;
}

/** Error: a required column is absent from the table. */
export function missingColumn(file: string, column: string): string {
  return `${file}: column ${column} is missing from the loaded table (expected from the loader)`;
}

function round(x: number): string {
  return String(Number(x.toPrecision(6)));
}

/** Ledger detail: latitude or longitude missing, so the row cannot be mapped or checked against land. */
export function positionMissing(lat: number, lon: number): string {
  return `position missing (lat ${lat}, lon ${lon}); the row is kept but cannot be mapped or checked against land`;
}

/** A concentration or content column with values but no unit in the config. */
export function unitMissing(file: string, column: string, canonical: string): string {
  return `${file}: no unit given for column ${column}; add it to the file's units in the config (e.g. ${column}: ${canonical}) — units are never assumed`;
}

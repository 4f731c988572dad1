/** User-facing messages of the anomalies stage; tests assert the exact text. */

/** A cell without a usable position. */
export function noPosition(lon: number, lat: number): string {
  return `cell has no usable position (lon ${lon}, lat ${lat}); it is left out of the regional anomaly tests`;
}

/** A cell in none of the regions. */
export function outsideRegions(lon: number, lat: number): string {
  return `cell at lon ${lon}, lat ${lat} lies in none of the regions; it is left out of the regional anomaly tests`;
}

/** A cell without a residual from the fits stage. */
export function noResidual(phytoClass: string): string {
  return `cell of class ${phytoClass} has no residual from the fit; it is left out of the regional anomaly tests`;
}

/** An option outside its allowed range. */
export function badOption(name: string, value: number, expected: string): string {
  return `anomalies.${name} must be ${expected}, got ${value}`;
}

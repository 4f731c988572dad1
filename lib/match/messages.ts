/** User-facing messages of the match stage; tests assert the exact text. */

/** A cell without position whose station has no positioned bottle. */
export function noPosition(cruise: string, station: string): string {
  return `cell has no lat/lon and station ${station} of cruise ${cruise} has no positioned bottle in the samples; cell excluded`;
}

/** A cell that took its station's mean bottle position. */
export function stationPosition(cruise: string, station: string, lat: number, lon: number): string {
  return `cell has no lat/lon; used the mean bottle position of station ${station} of cruise ${cruise} (${lat.toFixed(4)}, ${lon.toFixed(4)})`;
}

/** A cell left without an ambient value of one quantity; the cell stays in the table. */
export function noAmbient(quantity: string, why: string): string {
  return `no ambient ${quantity}: ${why}; cell kept with ${quantity} missing`;
}

/** Why no bottle matched: nothing usable at the station. */
export function noBottleAtStation(cruise: string, station: string): string {
  return `no usable bottle at station ${station} of cruise ${cruise}`;
}

/** Why no bottle matched: the cell's cast is not among the station's casts. */
export function castNotFound(cast: string): string {
  return `no usable bottle of cast ${cast}`;
}

/** Why no bottle matched: the nearest bottle is outside the tolerance. */
export function outsideTolerance(offsetM: number, toleranceM: number): string {
  return `nearest bottle ${offsetM.toFixed(1)} m away (tolerance ${toleranceM.toFixed(1)} m)`;
}

/** Why no bottle matched: the cell has no depth. */
export function noCellDepth(): string {
  return 'cell depth missing';
}

/** Why no grid value was used. */
export function noGridValue(maxDistanceKm: number, gridCount: number): string {
  return gridCount === 0 ? 'no grid given' : `no grid value within ${String(maxDistanceKm)} km`;
}

/** Grids given without a sampler to read them. */
export function noSampler(): string {
  return 'matchCells was given grids but no sampleGrid function';
}

/** An approved crossover offset applied to one sample. */
export function offsetApplied(cruise: string, offset: number, before: number, after: number): string {
  return `dissolved_fe of cruise ${cruise} corrected by −(${String(offset)}) nmol/kg: ${String(before)} → ${String(after)}`;
}

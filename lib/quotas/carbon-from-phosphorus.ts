/** Cellular carbon from cellular phosphorus by a C:P ratio. */

/** Redfield C:P = 106 mol/mol; Redfield (1963), in The Sea vol. 2, ed. Hill, pp. 26–77. */
export const REDFIELD_C_TO_P = 106;

/** Carbon in mol/cell from phosphorus in mol/cell: C = P · (C:P); default Redfield 106 (Redfield 1963). NaN for non-positive P. */
export function carbonFromPhosphorus(phosphorusMol: number, carbonToPhosphorus: number = REDFIELD_C_TO_P): number {
  if (!Number.isFinite(phosphorusMol) || phosphorusMol <= 0) return Number.NaN;
  return phosphorusMol * carbonToPhosphorus;
}

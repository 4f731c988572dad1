/** A two-sided interval, lower ≤ upper, in the units of the quantity it bounds. */
export interface Interval {
  /** Lower bound. */
  lower: number;
  /** Upper bound. */
  upper: number;
}

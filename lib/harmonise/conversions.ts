import { canonicalUnit, unitConversion, type UnitConversion } from '../units/index.js';
import { unitMissing } from './messages.js';

/** Resolve the configured units of a file (throws naming file and column on a bad unit); `<q>_dl` and `<el>_sigma` follow their quantity unless set. */
export function resolveConversions(units: Record<string, string> | undefined, file: string, followers: Record<string, string>): Map<string, UnitConversion> {
  const out = new Map<string, UnitConversion>();
  const given = units ?? {};
  for (const column of Object.keys(given).sort()) out.set(column, unitConversion(column, given[column], file));
  for (const [follower, leader] of Object.entries(followers)) {
    if (!Object.hasOwn(given, follower) && Object.hasOwn(given, leader)) out.set(follower, unitConversion(follower, given[leader], file));
  }
  return out;
}

/** True when a conversion changes values (not the identity). */
export function isIdentity(c: UnitConversion | undefined): boolean {
  return c === undefined || (c.factor === 1 && !c.perVolume);
}

/** Unit kinds that are never assumed: a concentration or content without a stated unit is ambiguous (nM vs nmol/kg, fmol vs mol). */
const MUST_STATE = new Set(['concentration', 'content', 'carbon']);

/** Throw (naming file and column) when a concentration or content column holds values but the config gives it no unit. */
export function requireStatedUnits(columns: readonly string[], hasValues: (column: string) => boolean, conversions: Map<string, UnitConversion>, file: string): void {
  for (const column of columns) {
    const kind = canonicalUnit(column)?.kind;
    if (kind === undefined || !MUST_STATE.has(kind) || conversions.has(column) || /_(dl|sigma)$/.test(column)) continue;
    if (hasValues(column)) throw new Error(unitMissing(file, column, canonicalUnit(column)!.unit));
  }
}

import { unitConversion, type UnitConversion } from '../units/index.js';

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

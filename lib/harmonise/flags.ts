import type { QualityFlag } from '../types.js';

/** A flag scheme: a published one by name, 'none' (no flags), or a user mapping {raw: internal}. */
export type FlagScheme = 'ioc' | 'woce' | 'none' | Record<string, QualityFlag>;

/**
 * IOC/IODE 0–9 scheme onto the internal scale. Codes 1, 2, 3, 4, 9 are the IODE primary level
 * (IOC Manuals and Guides 54 vol. 3, 2013: 1 good, 2 not evaluated/not available/unknown,
 * 3 questionable/suspect, 4 bad, 9 missing); 0, 5, 6, 7, 8 are the extended 0–9 codes
 * (0 no QC performed, 5 value changed, 6 below detection, 7 value in excess, 8 interpolated).
 */
export const IOC_FLAGS: Readonly<Record<string, QualityFlag>> = {
  // Not checked: used, but marked, rather than trusted as good.
  '0': 'questionable',
  '1': 'good',
  // Read as "not evaluated" (IODE primary level) or as "probably good"; either way not confirmed good, so marked questionable.
  '2': 'questionable',
  '3': 'questionable',
  '4': 'bad',
  // The value differs from what was measured; kept but marked.
  '5': 'questionable',
  '6': 'below_detection',
  // Above the measuring range: the number is only a lower bound, so it cannot enter as a value.
  '7': 'bad',
  // Not measured at this point.
  '8': 'questionable',
  '9': 'missing',
};

/**
 * WOCE water-sample quality codes onto the internal scale (Joyce & Corry 1994, WOCE Operations Manual,
 * WHP Office Report 90-1, bottle parameter codes: 1 drawn but not received / not calibrated, 2 acceptable,
 * 3 questionable, 4 bad, 5 not reported, 6 mean of replicates, 7 manual chromatographic peak,
 * 8 irregular digital peak integration, 9 not sampled).
 */
export const WOCE_FLAGS: Readonly<Record<string, QualityFlag>> = {
  // No final value; a number that does appear is uncalibrated.
  '1': 'questionable',
  '2': 'good',
  '3': 'questionable',
  '4': 'bad',
  '5': 'missing',
  // The replicate mean is an acceptable measurement.
  '6': 'good',
  // Peak integrated by hand or irregularly: usable but marked.
  '7': 'questionable',
  '8': 'questionable',
  '9': 'missing',
};

/** The raw → internal table of a scheme; 'none' has no table (every present value is good). */
export function flagTable(scheme: FlagScheme): Readonly<Record<string, QualityFlag>> | null {
  if (scheme === 'ioc') return IOC_FLAGS;
  if (scheme === 'woce') return WOCE_FLAGS;
  if (scheme === 'none') return null;
  return scheme;
}

/** Raw flag text as compared with a table: trimmed, and "2.0" read as "2" (spreadsheets write integers as decimals). */
export function normaliseRawFlag(raw: string): string {
  const s = raw.trim();
  return /^-?\d+\.0+$/.test(s) ? s.replace(/\.0+$/, '') : s;
}

/** Internal quality of a raw flag under a scheme: the flag, or undefined when the value is not in the scheme (never guessed). */
export function mapFlag(raw: string, scheme: FlagScheme): QualityFlag | undefined {
  const table = flagTable(scheme);
  if (table === null) return 'good';
  const key = normaliseRawFlag(raw);
  return Object.hasOwn(table, key) ? table[key] : undefined;
}

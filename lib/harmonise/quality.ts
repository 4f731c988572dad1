import type { QualityFlag } from '../types.js';
import { mapFlag, type FlagScheme } from './flags.js';
import {
  belowDetectionExcluded,
  belowDetectionSubstituted,
  flagNotAccepted,
  missingFlag,
  unknownFlag,
} from './messages.js';
import type { DetectionLimitPolicy } from './options.js';
import type { RowLedger } from './rowLedger.js';

/** Inputs of one quantity's quality step, values and limits already in canonical units. */
export interface QuantityColumns {
  /** Canonical quantity name, e.g. 'dissolved_fe'. */
  quantity: string;
  /** Values, replaced in place (substituted, or NaN when not used). */
  values: Float64Array;
  /** Per-row detection limits (NaN when none). */
  limits: Float64Array;
  /** Raw flags, or null when the file has no flag column. */
  flags: (string | null)[] | null;
  /** 1 where the loader saw a detection-limit marker. */
  belowDl: Uint8Array;
}

/** Settings of the quality step. */
export interface QualitySettings {
  /** Flag scheme. */
  scheme: FlagScheme;
  /** Qualities whose values enter. */
  accept: readonly QualityFlag[];
  /** Below-detection policy. */
  policy: DetectionLimitPolicy;
  /** Default limit in canonical units, or NaN. */
  defaultLimit: number;
}

function schemeName(scheme: FlagScheme): string {
  return typeof scheme === 'string' ? scheme : 'user';
}

/** Quality of one value before detection-limit handling; null when the raw flag is not in the scheme (ledgered, never guessed). */
function rowQuality(c: QuantityColumns, i: number, s: QualitySettings, rows: RowLedger): QualityFlag | null {
  const below = c.belowDl[i] === 1;
  const present = Number.isFinite(c.values[i]);
  const raw = c.flags?.[i] ?? null;
  if (s.scheme === 'none' || c.flags === null) return below ? 'below_detection' : present ? 'good' : 'missing';
  if (raw === null || raw.trim() === '') {
    if (below) return 'below_detection';
    if (!present) return 'missing';
    // A value without its flag is neither trusted nor thrown away: it enters marked.
    rows.add(i, 'flagged', 'missing-flag', missingFlag(`${c.quantity}_flag`));
    return 'questionable';
  }
  const mapped = mapFlag(raw, s.scheme);
  if (mapped === undefined) {
    rows.add(i, 'flagged', 'unknown-flag', unknownFlag(`${c.quantity}_flag`, raw, schemeName(s.scheme)));
    return null;
  }
  if (below && mapped !== 'bad') return 'below_detection';
  if ((mapped === 'good' || mapped === 'questionable') && !present) return 'missing';
  return mapped;
}

/**
 * Map one quantity's flags to the internal scale and apply the detection-limit policy, in place.
 * Below-detection values become DL/2 ('half', common practice) or DL ('limit'); the limit is the row's `<q>_dl`,
 * else the reported value (IOC flag 6 reports the limit as the value), else the default; they enter only when
 * 'below_detection' is accepted. Returns the quality column
 * and the number of substitutions.
 */
export function applyQuality(c: QuantityColumns, s: QualitySettings, rows: RowLedger, kept: number[]): { quality: (QualityFlag | null)[]; substituted: number } {
  const quality: (QualityFlag | null)[] = new Array(c.values.length).fill(null);
  let substituted = 0;
  for (const i of kept) {
    const q = rowQuality(c, i, s, rows);
    quality[i] = q;
    if (q === null) {
      c.values[i] = NaN;
      continue;
    }
    if (q === 'below_detection') {
      if (s.policy === 'exclude' || !s.accept.includes('below_detection')) {
        c.values[i] = NaN;
        rows.add(i, 'flagged', 'below-detection-excluded', belowDetectionExcluded(c.quantity, s.policy === 'exclude' ? 'policy' : 'not-accepted'));
        continue;
      }
      const limit = Number.isFinite(c.limits[i]) ? c.limits[i] : Number.isFinite(c.values[i]) ? c.values[i] : s.defaultLimit;
      if (!Number.isFinite(limit)) {
        c.values[i] = NaN;
        rows.add(i, 'flagged', 'below-detection-no-limit', belowDetectionExcluded(c.quantity, 'no-limit'));
        continue;
      }
      c.values[i] = s.policy === 'half' ? limit / 2 : limit;
      substituted++;
      rows.add(i, 'converted', 'below-detection-substituted', belowDetectionSubstituted(c.quantity, limit, c.values[i], s.policy));
      continue;
    }
    // 'missing' never enters: a number under a "not sampled" flag is not a measurement.
    if (q === 'missing' || !s.accept.includes(q)) {
      if (Number.isFinite(c.values[i])) rows.add(i, 'flagged', 'flag-not-accepted', flagNotAccepted(c.quantity, q));
      c.values[i] = NaN;
    }
  }
  return { quality, substituted };
}

// ISO 8601 dates and date-times to epoch milliseconds (UTC).

const ISO = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})?)?$/;

/** Parsed time: epoch ms (NaN when not ISO 8601 or not a real calendar date) and whether a zone was missing. */
export interface ParsedTime {
  /** Milliseconds since 1970-01-01T00:00Z. */
  ms: number;
  /** True for a date-time written without Z or an offset (read as UTC). */
  zoneless: boolean;
}

/** Parse an ISO 8601 calendar date or date-time (ISO 8601-1:2019 extended format); date-only is midnight UTC. */
export function parseIsoTime(text: string): ParsedTime {
  const m = ISO.exec(text);
  if (!m) return { ms: NaN, zoneless: false };
  const [, y, mo, d, h, mi, s, frac, zone] = m;
  const year = Number(y);
  const month = Number(mo);
  const day = Number(d);
  const hour = h === undefined ? 0 : Number(h);
  const minute = mi === undefined ? 0 : Number(mi);
  const second = s === undefined ? 0 : Number(s);
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month) || hour > 23 || minute > 59 || second > 60) return { ms: NaN, zoneless: false };
  let ms = Date.UTC(year, month - 1, day, hour, minute, Math.min(second, 59)) + (frac ? Math.round(Number(frac) * 1000) : 0);
  if (zone && zone !== 'Z') {
    const sign = zone[0] === '-' ? -1 : 1;
    const digits = zone.slice(1).replace(':', '');
    ms -= sign * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2, 4))) * 60_000;
  }
  return { ms, zoneless: h !== undefined && !zone };
}

function daysInMonth(year: number, month: number): number {
  return new Date(Date.UTC(year, month, 0)).getUTCDate();
}

import { badTimeUnits, julianReference, unsupportedCalendar } from './messages.js';

const MS_PER_DAY = 86_400_000;

/** Length of one unit in milliseconds; month and year as UDUNITS defines them (CF Conventions 1.10 §4.4). */
const UNIT_MS: Record<string, number> = {
  second: 1000,
  minute: 60_000,
  hour: 3_600_000,
  day: MS_PER_DAY,
  year: 365.242198781 * MS_PER_DAY,
  month: (365.242198781 / 12) * MS_PER_DAY,
};

const UNIT_ALIASES: Record<string, string> = {
  s: 'second', sec: 'second', secs: 'second', second: 'second', seconds: 'second',
  min: 'minute', mins: 'minute', minute: 'minute', minutes: 'minute',
  h: 'hour', hr: 'hour', hrs: 'hour', hour: 'hour', hours: 'hour',
  d: 'day', day: 'day', days: 'day',
  month: 'month', months: 'month',
  yr: 'year', year: 'year', years: 'year',
};

/** Cumulative days before each month in a 365-day year. */
const CUM_DAYS = [0, 31, 59, 90, 120, 151, 181, 212, 243, 273, 304, 334, 365];

const REFERENCE = /^(-?\d{1,4})-(\d{1,2})(?:-(\d{1,2}))?(?:[T\s]+(\d{1,2}):(\d{1,2})(?::(\d{1,2}(?:\.\d*)?))?)?\s*(Z|UTC|GMT|[+-]\d{1,2}(?::?\d{2})?)?$/i;

/** A parsed "<unit> since <date>" string. */
interface TimeUnits {
  unitMs: number;
  year: number;
  month: number;
  day: number;
  /** Milliseconds into the reference day, time zone already removed. */
  msOfDay: number;
}

function utcMs(year: number, month: number, day: number): number {
  // Date.UTC maps years 0..99 to 1900..1999; setUTCFullYear does not.
  const d = new Date(0);
  d.setUTCFullYear(year, month - 1, day);
  return d.getTime();
}

function parseUnits(units: string): TimeUnits | undefined {
  const m = /^\s*([A-Za-z]+)\s+since\s+(.+?)\s*$/i.exec(units);
  if (!m) return undefined;
  const unit = UNIT_ALIASES[m[1].toLowerCase()];
  const ref = REFERENCE.exec(m[2]);
  if (!unit || !ref) return undefined;
  let zoneMs = 0;
  const zone = ref[7];
  if (zone && /^[+-]/.test(zone)) {
    const z = /^([+-])(\d{1,2}):?(\d{2})?$/.exec(zone);
    if (!z) return undefined;
    zoneMs = (z[1] === '-' ? -1 : 1) * (Number(z[2]) * 60 + Number(z[3] ?? 0)) * 60_000;
  }
  const month = Number(ref[2]);
  const day = Number(ref[3] ?? 1);
  if (month < 1 || month > 12 || day < 1 || day > 31) return undefined;
  const msOfDay = (Number(ref[4] ?? 0) * 3600 + Number(ref[5] ?? 0) * 60 + Number(ref[6] ?? 0)) * 1000 - zoneMs;
  return { unitMs: UNIT_MS[unit], year: Number(ref[1]), month, day, msOfDay };
}

/** True when the units text reads as a CF time unit "<unit> since <date>". */
export function isTimeUnits(units: string): boolean {
  return parseUnits(units) !== undefined;
}

/** Where an error concerns: file and variable. */
export interface TimeContext {
  /** Input file name. */
  file: string;
  /** Time coordinate variable name. */
  variable: string;
}

/**
 * Decodes CF time coordinates to milliseconds since 1970-01-01T00:00Z (CF Conventions 1.10 §4.4.1).
 * standard/gregorian (after 1582-10-15) and proleptic_gregorian use the Gregorian calendar;
 * noleap/365_day count 365-day years, and the resulting dates are placed on the real calendar.
 */
export function decodeCfTime(values: ArrayLike<number>, units: string, calendar: string | undefined, where: TimeContext): Float64Array {
  const parsed = parseUnits(units);
  if (!parsed) throw new Error(badTimeUnits(where.file, where.variable, units));
  const cal = (calendar ?? 'standard').trim().toLowerCase();
  const out = new Float64Array(values.length);
  if (cal === 'standard' || cal === 'gregorian' || cal === 'proleptic_gregorian') {
    const refMs = utcMs(parsed.year, parsed.month, parsed.day) + parsed.msOfDay;
    for (let i = 0; i < values.length; i++) out[i] = Math.round(refMs + values[i] * parsed.unitMs);
    if (cal !== 'proleptic_gregorian') {
      const switchMs = utcMs(1582, 10, 15);
      if (refMs < switchMs || out.some((ms) => ms < switchMs)) throw new Error(julianReference(where.file, where.variable, units));
    }
    return out;
  }
  if (cal === 'noleap' || cal === '365_day') {
    if (parsed.month === 2 && parsed.day === 29) throw new Error(badTimeUnits(where.file, where.variable, units));
    // Integer milliseconds on a 365-day year line keep day boundaries exact.
    const refMs = (parsed.year * 365 + CUM_DAYS[parsed.month - 1] + parsed.day - 1) * MS_PER_DAY + parsed.msOfDay;
    for (let i = 0; i < values.length; i++) {
      const total = Math.round(refMs + values[i] * parsed.unitMs);
      const dayNumber = Math.floor(total / MS_PER_DAY);
      const year = Math.floor(dayNumber / 365);
      const dayOfYear = dayNumber - year * 365;
      let month = 1;
      while (CUM_DAYS[month] <= dayOfYear) month++;
      out[i] = utcMs(year, month, dayOfYear - CUM_DAYS[month - 1] + 1) + (total - dayNumber * MS_PER_DAY);
    }
    return out;
  }
  throw new Error(unsupportedCalendar(where.file, where.variable, calendar ?? ''));
}

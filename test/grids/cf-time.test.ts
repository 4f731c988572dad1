import { describe, expect, it } from 'vitest';
import { decodeCfTime } from '../../lib/grids/index.js';

const where = { file: 'f.nc', variable: 'time' };

describe('decodeCfTime', () => {
  it('decodeCfTime(values, "days since 1990-1-1 0:0:0") counts days from the reference', () => {
    // CF Conventions 1.10 §4.4 example reference "1990-1-1 0:0:0"; 365 days later is 1991-01-01 (1990 is not a leap year).
    expect([...decodeCfTime([0, 1.5, 365], 'days since 1990-1-1 0:0:0', undefined, where)]).toEqual([
      Date.UTC(1990, 0, 1),
      Date.UTC(1990, 0, 2, 12),
      Date.UTC(1991, 0, 1),
    ]);
  });

  it('decodeCfTime(values, "hours since ... -6:00") removes the time zone offset', () => {
    // CF Conventions 1.10 §4.4: "1990-1-1 0:0:0 -6:00" is 06:00 UTC.
    expect([...decodeCfTime([0, 2], 'hours since 1990-1-1 0:0:0 -6:00', 'standard', where)]).toEqual([Date.UTC(1990, 0, 1, 6), Date.UTC(1990, 0, 1, 8)]);
  });

  it('decodeCfTime(values, units, "noleap") skips 29 February; proleptic_gregorian keeps it', () => {
    // CF Conventions 1.10 §4.4.1: noleap/365_day years have 365 days (hand-computed day counts).
    expect([...decodeCfTime([59, 365, 730], 'days since 2000-01-01', 'noleap', where)]).toEqual([Date.UTC(2000, 2, 1), Date.UTC(2001, 0, 1), Date.UTC(2002, 0, 1)]);
    expect([...decodeCfTime([59, 365], 'days since 2000-01-01', '365_day', where)]).toEqual([Date.UTC(2000, 2, 1), Date.UTC(2001, 0, 1)]);
    expect([...decodeCfTime([59, 365], 'days since 2000-01-01', 'proleptic_gregorian', where)]).toEqual([Date.UTC(2000, 1, 29), Date.UTC(2000, 11, 31)]);
    // 86400·59 s in a noleap calendar: seconds are integral, so day boundaries stay exact.
    expect([...decodeCfTime([86400 * 59 - 1], 'seconds since 2000-01-01', 'noleap', where)]).toEqual([Date.UTC(2000, 1, 28, 23, 59, 59)]);
  });

  it('decodeCfTime(values, bad units or calendar) names the file, variable and attribute', () => {
    expect(() => decodeCfTime([0], 'days after 1990-01-01', undefined, where)).toThrow(
      'f.nc: variable time attribute units = "days after 1990-01-01" is not a CF time unit; expected "<days|hours|minutes|seconds> since <yyyy-mm-dd [hh:mm:ss]>"',
    );
    expect(() => decodeCfTime([0], 'days since 1990-01-01', '360_day', where)).toThrow(
      'f.nc: variable time attribute calendar = "360_day" is not supported; expected standard, gregorian, proleptic_gregorian, noleap or 365_day',
    );
    expect(() => decodeCfTime([0], 'days since 1500-01-01', 'gregorian', where)).toThrow(
      'f.nc: variable time attribute units = "days since 1500-01-01" reaches before 1582-10-15 in the standard (mixed Julian/Gregorian) calendar; use proleptic_gregorian',
    );
  });
});

import { describe, expect, it } from 'vitest';
import { IOC_FLAGS, WOCE_FLAGS, flagTable, mapFlag, normaliseRawFlag } from '../../lib/harmonise/flags.js';

describe('IOC_FLAGS', () => {
  it('maps the IODE primary-level codes 1, 2, 3, 4, 9', () => {
    // IOC Manuals and Guides 54 vol. 3 (2013), primary level: 1 good, 2 not evaluated/not available/unknown,
    // 3 questionable/suspect, 4 bad, 9 missing. 2 enters marked (decision documented in flags.ts).
    expect(IOC_FLAGS['1']).toBe('good');
    expect(IOC_FLAGS['2']).toBe('questionable');
    expect(IOC_FLAGS['3']).toBe('questionable');
    expect(IOC_FLAGS['4']).toBe('bad');
    expect(IOC_FLAGS['9']).toBe('missing');
  });

  it('maps the extended codes 0, 5, 6, 7, 8', () => {
    // Extended 0–9 scheme as given in the task: 0 no QC performed, 5 value changed, 6 below detection,
    // 7 value in excess, 8 interpolated (same codes in SeaDataNet L20, from memory).
    expect(IOC_FLAGS['0']).toBe('questionable');
    expect(IOC_FLAGS['5']).toBe('questionable');
    expect(IOC_FLAGS['6']).toBe('below_detection');
    expect(IOC_FLAGS['7']).toBe('bad');
    expect(IOC_FLAGS['8']).toBe('questionable');
  });

  it('has exactly the ten codes 0–9', () => {
    expect(Object.keys(IOC_FLAGS).sort()).toEqual(['0', '1', '2', '3', '4', '5', '6', '7', '8', '9']);
  });
});

describe('WOCE_FLAGS', () => {
  it('maps the WOCE water-sample codes', () => {
    // WHP Office Report WHPO 90-1 (Joyce & Corry 1994), water sample quality codes: 1 drawn, analysis not received
    // (CTD: not calibrated), 2 acceptable, 3 questionable, 4 bad, 5 not reported, 6 mean of replicates,
    // 7 manual chromatographic peak, 8 irregular digital peak integration, 9 not sampled.
    expect(WOCE_FLAGS).toEqual({
      '1': 'questionable',
      '2': 'good',
      '3': 'questionable',
      '4': 'bad',
      '5': 'missing',
      '6': 'good',
      '7': 'questionable',
      '8': 'questionable',
      '9': 'missing',
    });
  });
});

describe('mapFlag(raw, scheme)', () => {
  it('mapFlag("2", "woce") is good and mapFlag("2", "ioc") is questionable', () => {
    expect(mapFlag('2', 'woce')).toBe('good');
    expect(mapFlag('2', 'ioc')).toBe('questionable');
  });

  it('mapFlag reads " 2.0 " as "2" (spreadsheet integers)', () => {
    expect(normaliseRawFlag(' 2.0 ')).toBe('2');
    expect(mapFlag(' 2.0 ', 'woce')).toBe('good');
    expect(normaliseRawFlag('2.5')).toBe('2.5');
  });

  it('mapFlag returns undefined for a value outside the scheme (never guessed)', () => {
    expect(mapFlag('0', 'woce')).toBeUndefined();
    expect(mapFlag('A', 'ioc')).toBeUndefined();
    expect(mapFlag('10', 'ioc')).toBeUndefined();
  });

  it('mapFlag uses a user mapping as given', () => {
    const user = { A: 'good', B: 'bad' } as const;
    expect(mapFlag('A', user)).toBe('good');
    expect(mapFlag('B', user)).toBe('bad');
    expect(mapFlag('C', user)).toBeUndefined();
    expect(flagTable(user)).toBe(user);
  });

  it('mapFlag(anything, "none") is good', () => {
    expect(mapFlag('whatever', 'none')).toBe('good');
    expect(flagTable('none')).toBeNull();
  });
});

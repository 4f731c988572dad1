import { describe, expect, it } from 'vitest';
import { canonicalJson, prettyJson } from '../../lib/version/index.js';

describe('canonicalJson', () => {
  it('canonicalJson(value) sorts keys at every depth and writes no whitespace', () => {
    expect(canonicalJson({ b: 1, a: { d: [3, { z: 1, y: 2 }], c: 'x' } })).toBe('{"a":{"c":"x","d":[3,{"y":2,"z":1}]},"b":1}');
  });

  it('canonicalJson(value) gives the same text whatever the insertion order', () => {
    expect(canonicalJson({ x: 1, y: 2 })).toBe(canonicalJson({ y: 2, x: 1 }));
  });

  it('canonicalJson(value) writes NaN and ±Infinity as null, and -0 as 0', () => {
    expect(canonicalJson([NaN, Infinity, -Infinity, -0])).toBe('[null,null,null,0]');
    expect(canonicalJson({ lower: NaN })).toBe('{"lower":null}');
  });

  it('canonicalJson(value) writes numbers in their shortest round-trip form', () => {
    expect(canonicalJson([0.1 + 0.2, 1e21, 1.5e-7, 100])).toBe('[0.30000000000000004,1e+21,1.5e-7,100]');
  });

  it('canonicalJson(value) drops undefined members, nulls undefined items, and lists typed arrays', () => {
    expect(canonicalJson({ a: undefined, b: [undefined], c: new Float64Array([1.5, NaN]) })).toBe('{"b":[null],"c":[1.5,null]}');
  });

  it('canonicalJson(value) escapes strings as JSON does and sorts keys by code unit', () => {
    expect(canonicalJson({ 'é': '"q"\n', Z: 1, a: 2 })).toBe('{"Z":1,"a":2,"é":"\\"q\\"\\n"}');
  });

  it('canonicalJson(value) uses toJSON (dates as ISO strings)', () => {
    expect(canonicalJson({ t: new Date(Date.UTC(2024, 0, 2)) })).toBe('{"t":"2024-01-02T00:00:00.000Z"}');
  });

  it('canonicalJson(value) refuses a cycle rather than recursing forever', () => {
    const a: Record<string, unknown> = {};
    a.self = a;
    expect(() => canonicalJson(a)).toThrow('canonicalJson cannot serialise a cyclic structure');
  });

  it('prettyJson(value) indents by two spaces, sorts keys and ends in a newline', () => {
    expect(prettyJson({ b: [1, 2], a: {}, c: [] })).toBe('{\n  "a": {},\n  "b": [\n    1,\n    2\n  ],\n  "c": []\n}\n');
  });

  it('prettyJson(value) parses back to the same data as canonicalJson', () => {
    const value = { z: [1, { q: null }], a: 'x' };
    expect(JSON.parse(prettyJson(value))).toEqual(JSON.parse(canonicalJson(value)));
  });
});

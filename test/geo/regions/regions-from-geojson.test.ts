import { readFileSync } from 'node:fs';
import { randomLcg, randomUniform } from 'd3-random';
import { describe, expect, it } from 'vitest';
import { regionsFromGeoJson, RegionInputError } from '../../../lib/geo/regions/regions-from-geojson.js';
import { regionIndex } from '../../../lib/geo/regions/region-index.js';
import type { InputText } from '../../../lib/types.js';

const fixture = (name: string): InputText => ({
  name: `regions/${name}`,
  text: readFileSync(new URL(`../../fixtures/regions/${name}`, import.meta.url), 'utf8'),
});

function problemsOf(input: InputText): string[] {
  try {
    regionsFromGeoJson(input);
  } catch (error) {
    expect(error).toBeInstanceOf(RegionInputError);
    return (error as RegionInputError).problems.map((p) => p.message);
  }
  throw new Error('expected a RegionInputError');
}

describe('regionsFromGeoJson', () => {
  it('regionsFromGeoJson(file) reads ids and names', () => {
    const regions = regionsFromGeoJson(fixture('rfc-winding.geojson'));
    expect(regions.features.map((f) => f.properties)).toEqual([
      { id: 'patch', name: 'Test patch' },
      { id: 'dateline', name: 'Across the dateline' },
    ]);
  });

  it('regionsFromGeoJson(file) gives the same membership for RFC 7946 and d3 winding', () => {
    const rfc = regionIndex(regionsFromGeoJson(fixture('rfc-winding.geojson')));
    const d3 = regionIndex(regionsFromGeoJson(fixture('d3-winding.geojson')));
    expect(rfc.assign(-145, -41)).toBe('patch');
    expect(rfc.assign(-140, -45)).toBeNull(); // in the hole
    expect(rfc.assign(-100, -45)).toBeNull();
    expect(rfc.assign(179, 15)).toBe('dateline');
    expect(rfc.assign(-175, 15)).toBe('dateline');
    expect(rfc.assign(2, 2)).toBe('dateline');
    const rnd = randomUniform.source(randomLcg(0.7))(0, 1);
    for (let k = 0; k < 2000; k++) {
      const lon = rnd() < 0.5 ? -155 + 30 * rnd() : 165 + 30 * rnd();
      const lat = rnd() < 0.5 ? -55 + 20 * rnd() : 5 + 20 * rnd();
      expect(rfc.assign(lon, lat)).toBe(d3.assign(lon, lat));
    }
  });

  it('regionsFromGeoJson(file) names the file and feature of an open ring', () => {
    expect(problemsOf(fixture('open-ring.geojson'))).toEqual([
      'regions/open-ring.geojson: feature 1: ring 0 is not closed (first position [10, 0], last [10, 1]); GeoJSON rings repeat their first position at the end',
    ]);
  });

  it('regionsFromGeoJson(file) reports every bad feature', () => {
    expect(problemsOf(fixture('mixed-problems.geojson'))).toEqual([
      'regions/mixed-problems.geojson: feature 0: geometry is Point; expected Polygon or MultiPolygon',
      'regions/mixed-problems.geojson: feature 1: has no id (feature id or properties.id) and no properties.name',
      'regions/mixed-problems.geojson: feature 3: id "x" is already used by feature 2',
      'regions/mixed-problems.geojson: feature 4: ring 0 position 1 is [200,0]; expected [longitude −180..180, latitude −90..90]',
    ]);
  });

  it('regionsFromGeoJson(file) refuses a file with no polygons', () => {
    expect(problemsOf(fixture('no-polygons.geojson'))).toEqual([
      'regions/no-polygons.geojson: no Polygon or MultiPolygon features; a regions file needs at least one',
    ]);
  });

  it('regionsFromGeoJson(file) refuses invalid JSON and keeps the cause', () => {
    const input = fixture('not-json.geojson');
    const messages = problemsOf(input);
    expect(messages).toHaveLength(1);
    expect(messages[0].startsWith('regions/not-json.geojson: not valid JSON (')).toBe(true);
    try {
      regionsFromGeoJson(input);
    } catch (error) {
      expect((error as Error).cause).toBeInstanceOf(SyntaxError);
    }
  });

  it('regionsFromGeoJson(text) refuses a geometry that is not a FeatureCollection', () => {
    expect(problemsOf({ name: 'r.json', text: '{"type":"Feature"}' })).toEqual(['r.json: expected a GeoJSON FeatureCollection, found Feature']);
    expect(problemsOf({ name: 'r.json', text: '[1]' })).toEqual(['r.json: expected a GeoJSON FeatureCollection, found an array']);
  });

  it('regionsFromGeoJson(input) does not mutate its input text', () => {
    const input = fixture('rfc-winding.geojson');
    const before = input.text;
    regionsFromGeoJson(input);
    expect(input.text).toBe(before);
  });
});

import type { MultiPolygon, Polygon, Position } from 'geojson';
import type { InputText, Problem } from '../../types.js';
import * as msg from './messages.js';
import type { RegionCollection, RegionFeature } from './region-types.js';
import { rewindPolygon } from './rewind.js';

/** A regions file that cannot be used; carries every problem found (file and feature index in each). */
export class RegionInputError extends Error {
  /** All problems, in file order. */
  readonly problems: Problem[];

  constructor(problems: Problem[], options?: { cause?: unknown }) {
    super(problems.map((p) => p.message).join('\n'), options);
    this.name = 'RegionInputError';
    this.problems = problems;
  }
}

/**
 * Regions from a user GeoJSON FeatureCollection of Polygon/MultiPolygon features, each with an id
 * (feature id, properties.id) or properties.name; rings rewound to d3-geo's winding whichever convention
 * the file used (RFC 7946 §3.1.6 or d3). Throws RegionInputError listing every problem.
 */
export function regionsFromGeoJson(input: InputText): RegionCollection {
  const file = input.name;
  const problem = (message: string): Problem => ({ file, line: 0, col: 0, message, severity: 'error' });
  let root: unknown;
  try {
    root = JSON.parse(input.text);
  } catch (error) {
    throw new RegionInputError([problem(msg.invalidJson(file, (error as Error).message))], { cause: error });
  }
  if (!isObject(root) || root.type !== 'FeatureCollection' || !Array.isArray(root.features)) {
    const found = isObject(root) ? (typeof root.type === 'string' ? root.type : 'an object without "type"') : describe(root);
    throw new RegionInputError([problem(msg.notFeatureCollection(file, found))]);
  }
  const problems: Problem[] = [];
  const features: RegionFeature[] = [];
  const firstUse = new Map<string, number>();
  root.features.forEach((raw: unknown, index: number) => {
    const feature = isObject(raw) ? raw : {};
    const geometry = isObject(feature.geometry) ? feature.geometry : null;
    const type = geometry && typeof geometry.type === 'string' ? geometry.type : 'missing';
    if (type !== 'Polygon' && type !== 'MultiPolygon') {
      problems.push(problem(msg.notPolygon(file, index, type)));
      return;
    }
    const props = isObject(feature.properties) ? feature.properties : {};
    const idValue = [feature.id, props.id, props.name].find((v) => (typeof v === 'string' && v !== '') || typeof v === 'number');
    if (idValue === undefined) {
      problems.push(problem(msg.missingIdOrName(file, index)));
      return;
    }
    const id = String(idValue);
    const name = typeof props.name === 'string' && props.name !== '' ? props.name : id;
    if (firstUse.has(id)) {
      problems.push(problem(msg.duplicateId(file, index, id, firstUse.get(id) as number)));
      return;
    }
    firstUse.set(id, index);
    const polygons = (type === 'Polygon' ? [geometry?.coordinates] : (geometry?.coordinates as unknown[])) ?? [];
    const before = problems.length;
    const rewound: Position[][][] = [];
    (Array.isArray(polygons) ? polygons : [polygons]).forEach((rings: unknown, p: number) => {
      const where = (r: number) => (type === 'Polygon' ? `ring ${r}` : `polygon ${p} ring ${r}`);
      if (!Array.isArray(rings) || rings.length === 0) {
        problems.push(problem(msg.shortRing(file, index, where(0), 0)));
        return;
      }
      const checked = rings.map((ring: unknown, r: number) => checkRing(ring, (m) => problems.push(problem(m)), file, index, where(r)));
      if (checked.every((ring): ring is Position[] => ring !== null)) rewound.push(rewindPolygon(checked));
    });
    if (problems.length > before) return;
    const geom: Polygon | MultiPolygon = type === 'Polygon' ? { type, coordinates: rewound[0] } : { type, coordinates: rewound };
    features.push({ type: 'Feature', id, properties: { id, name }, geometry: geom });
  });
  if (problems.length === 0 && features.length === 0) problems.push(problem(msg.noPolygons(file)));
  if (problems.length > 0) throw new RegionInputError(problems);
  return { type: 'FeatureCollection', features };
}

function checkRing(ring: unknown, report: (m: string) => void, file: string, index: number, where: string): Position[] | null {
  if (!Array.isArray(ring) || ring.length < 4) {
    report(msg.shortRing(file, index, where, Array.isArray(ring) ? ring.length : 0));
    return null;
  }
  for (let k = 0; k < ring.length; k++) {
    const pos: unknown = ring[k];
    const ok = Array.isArray(pos) && pos.length >= 2 && isFiniteNumber(pos[0]) && isFiniteNumber(pos[1]) && Math.abs(pos[0]) <= 180 && Math.abs(pos[1]) <= 90;
    if (!ok) {
      report(msg.badPosition(file, index, where, k, JSON.stringify(pos) ?? 'missing'));
      return null;
    }
  }
  const first = ring[0] as number[];
  const last = ring[ring.length - 1] as number[];
  if (first[0] !== last[0] || first[1] !== last[1]) {
    report(msg.openRing(file, index, where, first.slice(0, 2), last.slice(0, 2)));
    return null;
  }
  return ring as Position[];
}

function isObject(v: unknown): v is Record<string, unknown> & { [k: string]: unknown } {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function isFiniteNumber(v: unknown): v is number {
  return typeof v === 'number' && Number.isFinite(v);
}

function describe(v: unknown): string {
  return Array.isArray(v) ? 'an array' : v === null ? 'null' : `a ${typeof v}`;
}

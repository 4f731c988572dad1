import { geoContains } from 'd3-geo';
import { densifyPath, wrapLon, type LonLat } from './densify.js';
import type { RegionCollection, RegionFeature } from './region-types.js';

/** One basin of the built-in partition, as a methods page prints it. */
export interface BasinRule {
  /** Stable region id. */
  id: string;
  /** Display name. */
  name: string;
  /** Plain-text rule of what belongs to the basin. */
  rule: string;
  /** A point well inside the basin (label position, orientation check), [lon, lat] degrees. */
  label: LonLat;
}

// Boundary lines between basins (our own coarse partition). Vertices are joined by straight lines on a
// lon/lat map; land crossings are chosen so that ocean on either side falls in the basin named.
const ATLANTIC_PACIFIC_SOUTH: LonLat[] = [[-70, -45], [-70, 0]];
const ATLANTIC_PACIFIC_NORTH: LonLat[] = [
  [-70, 0], [-70, 7], [-77.2, 7], [-77.7, 8.4], [-78.8, 9.1], [-79.7, 9.2], [-80.5, 8.6], [-81.5, 8.4],
  [-82.7, 8.8], [-84, 10.3], [-85.5, 11.5], [-87, 14], [-89.5, 15.2], [-92, 16.5], [-95, 17.2], [-98, 18.5],
  [-105, 30], [-105, 66.5],
];
const ATLANTIC_INDIAN_SOUTH: LonLat[] = [[20, -45], [20, 0]];
const ATLANTIC_INDIAN_NORTH: LonLat[] = [[20, 0], [20, 30.5]];
const ATLANTIC_INDIAN_TOP: LonLat[] = [[20, 30.5], [100, 30.5]];
const ATLANTIC_PACIFIC_ASIA: LonLat[] = [[100, 30.5], [100, 66.5]];
const INDIAN_PACIFIC_SOUTH: LonLat[] = [
  [147, -45], [147, -30], [142, -30], [142, -9], [127.3, -8.4], [116, -8.6], [114.4, -8.3], [106, -6.6],
  [104.5, -5], [103.8, 0],
];
const INDIAN_PACIFIC_NORTH: LonLat[] = [
  [103.8, 0], [103.6, 1.6], [102, 3.5], [101.2, 6], [99.6, 8], [98.9, 10.3], [99.3, 12.5], [99, 16], [100, 22],
  [100, 30.5],
];
// Longitudes past 180 are unwrapped so a parallel is walked eastward across the antimeridian.
const S45_ATLANTIC: LonLat[] = [[-70, -45], [20, -45]];
const S45_INDIAN: LonLat[] = [[20, -45], [147, -45]];
const S45_PACIFIC: LonLat[] = [[147, -45], [290, -45]];
const EQUATOR_ATLANTIC: LonLat[] = [[-70, 0], [20, 0]];
const EQUATOR_PACIFIC: LonLat[] = [[103.8, 0], [290, 0]];
const N66_ATLANTIC: LonLat[] = [[-105, 66.5], [100, 66.5]];
const N66_PACIFIC: LonLat[] = [[100, 66.5], [255, 66.5]];
const N66_ALL: LonLat[] = [[-180, 66.5], [180, 66.5]];
const S45_ALL: LonLat[] = [[-180, -45], [180, -45]];

/** Degrees between inserted points along boundary lines (great-circle edges then follow the parallel within ~25 m). */
export const BASIN_DENSIFY_DEG = 0.5;

/** The rules of the built-in basin partition, in output order (plain text for the methods page). */
export const builtinBasinRules: readonly BasinRule[] = [
  { id: 'arctic', name: 'Arctic Ocean', rule: 'north of 66.5°N (the Arctic Circle), all longitudes', label: [0, 80] },
  {
    id: 'north-atlantic', name: 'North Atlantic',
    rule: 'equator to 66.5°N between the Americas and 20°E (south of 30.5°N) or 100°E (north of 30.5°N); includes the Caribbean, Gulf of Mexico, Hudson Bay, Mediterranean, Black and Baltic Seas',
    label: [-35, 30],
  },
  { id: 'south-atlantic', name: 'South Atlantic', rule: '45°S to the equator between 70°W and 20°E (Cape Agulhas)', label: [-15, -25] },
  {
    id: 'indian', name: 'Indian Ocean',
    rule: '45°S to 30.5°N between 20°E and the Indian–Pacific line; includes the Red Sea, Persian Gulf, Andaman Sea, Strait of Malacca, Timor and Arafura Seas',
    label: [75, -15],
  },
  {
    id: 'north-pacific', name: 'North Pacific',
    rule: 'equator to 66.5°N between the Indian–Pacific line or 100°E and the Atlantic–Pacific line; includes the South China Sea, Gulf of Thailand, Bering Sea and Gulf of California',
    label: [-160, 30],
  },
  {
    id: 'south-pacific', name: 'South Pacific',
    rule: '45°S to the equator between the Indian–Pacific line and 70°W; includes the Java, Flores, Banda, Coral and Tasman Seas',
    label: [-130, -25],
  },
  { id: 'southern', name: 'Southern Ocean', rule: 'south of 45°S, all longitudes', label: [0, -60] },
];

/** How the boundaries between the built-in basins run (plain text for the methods page). */
export const builtinBasinBoundaries: readonly string[] = [
  'Boundaries join the listed points by straight lines on a longitude–latitude map, with points inserted every 0.5° (between them an edge along a parallel bows poleward by up to about 25 m). A point exactly on the equator, a meridian boundary or a listed point goes to the basin north or east of it.',
  'North–south: the Atlantic and Pacific are split at the equator; the Indian Ocean is not split.',
  `Atlantic–Pacific: 70°W from 45°S to 7°N, then across the Isthmus of Panama and Central America through ${formatPath(ATLANTIC_PACIFIC_NORTH.slice(2, -2))}, then (105°W, 30°N) and 105°W north to 66.5°N.`,
  'Atlantic–Indian: 20°E from 45°S to 30.5°N (Cape Agulhas, then across Africa), then 30.5°N east to 100°E (north of it: Atlantic); 100°E from 30.5°N to 66.5°N separates Atlantic and Pacific across Asia.',
  `Indian–Pacific: 147°E from 45°S to 30°S (through Tasmania), 142°E from 30°S to 9°S (across Australia and the Torres Strait), then along the Lesser Sunda Islands, Java, the Sunda Strait and Sumatra through ${formatPath(INDIAN_PACIFIC_SOUTH.slice(4))}, across the southern end of the Strait of Malacca and up the Malay Peninsula through ${formatPath(INDIAN_PACIFIC_NORTH.slice(1))}.`,
];

/** Our own coarse partition of the world ocean into seven basins (rules in builtinBasinRules); every point on the globe lies in exactly one. */
export function builtinBasins(): RegionCollection {
  // The partition is a constant: build it once, so its region index (memoised per object) is built once too. Do not mutate it.
  return (builtin ??= buildBasins());
}

let builtin: RegionCollection | undefined;

function buildBasins(): RegionCollection {
  const d = (path: LonLat[]) => densifyPath(path, BASIN_DENSIFY_DEG);
  const rev = (path: LonLat[]) => d(path).reverse();
  const rings: Record<string, LonLat[][]> = {
    arctic: [d(N66_ALL)],
    'north-atlantic': [d(ATLANTIC_PACIFIC_NORTH), d(N66_ATLANTIC), rev(ATLANTIC_PACIFIC_ASIA), rev(ATLANTIC_INDIAN_TOP), rev(ATLANTIC_INDIAN_NORTH), rev(EQUATOR_ATLANTIC)],
    'south-atlantic': [rev(ATLANTIC_PACIFIC_SOUTH), d(S45_ATLANTIC), d(ATLANTIC_INDIAN_SOUTH), rev(EQUATOR_ATLANTIC)],
    indian: [d(S45_INDIAN), d(INDIAN_PACIFIC_SOUTH), d(INDIAN_PACIFIC_NORTH), rev(ATLANTIC_INDIAN_TOP), rev(ATLANTIC_INDIAN_NORTH), rev(ATLANTIC_INDIAN_SOUTH)],
    'north-pacific': [d(INDIAN_PACIFIC_NORTH), d(ATLANTIC_PACIFIC_ASIA), d(N66_PACIFIC), rev(ATLANTIC_PACIFIC_NORTH), rev(EQUATOR_PACIFIC)],
    'south-pacific': [rev(INDIAN_PACIFIC_SOUTH), d(S45_PACIFIC), d(ATLANTIC_PACIFIC_SOUTH), rev(EQUATOR_PACIFIC)],
    southern: [d(S45_ALL)],
  };
  const features: RegionFeature[] = builtinBasinRules.map((basin) => {
    const ring = closeRing(joinPaths(rings[basin.id]).map(([lon, lat]): LonLat => [wrapLon(lon), lat]));
    return { type: 'Feature', id: basin.id, properties: { id: basin.id, name: basin.name }, geometry: { type: 'Polygon', coordinates: [orient(ring, basin.label)] } };
  });
  return { type: 'FeatureCollection', features };
}

// Consecutive paths share their junction point; keep it once.
function joinPaths(paths: LonLat[][]): LonLat[] {
  const out: LonLat[] = [];
  for (const path of paths) out.push(...(out.length > 0 ? path.slice(1) : path));
  return out;
}

function closeRing(ring: LonLat[]): LonLat[] {
  const [first, last] = [ring[0], ring[ring.length - 1]];
  const closed = wrapLon(first[0]) === wrapLon(last[0]) || Math.abs(first[0] - last[0]) === 360;
  if (closed && first[1] === last[1]) ring[ring.length - 1] = [first[0], first[1]];
  else ring.push([first[0], first[1]]);
  return ring;
}

// Orientation decided by a known interior point, not by area: several basins are large.
function orient(ring: LonLat[], inside: LonLat): LonLat[] {
  const polygon = { type: 'Polygon' as const, coordinates: [ring] };
  return geoContains(polygon, inside) ? ring : ring.slice().reverse();
}

function formatPath(path: readonly LonLat[]): string {
  return path.map(([lon, lat]) => `(${formatLon(lon)}, ${formatLat(lat)})`).join(', ');
}

function formatLon(lon: number): string {
  return lon === 0 ? '0°' : `${Math.abs(lon)}°${lon < 0 ? 'W' : 'E'}`;
}

function formatLat(lat: number): string {
  return lat === 0 ? '0°' : `${Math.abs(lat)}°${lat < 0 ? 'S' : 'N'}`;
}

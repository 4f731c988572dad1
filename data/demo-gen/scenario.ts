/** The invented demo scenario: programme, ships, cruises and their planned station positions. */

/** Ocean basin a cruise works in; decides which phytoplankton classes dominate. */
export type Basin = 'north-atlantic' | 'south-atlantic' | 'north-pacific' | 'southern-ocean' | 'indian';

/** One invented research vessel. */
export interface Ship {
  /** Two-letter code used in cruise ids. */
  code: string;
  /** Ship name as written in the report. */
  name: string;
}

/** One invented cruise and how its lab writes its files. */
export interface Cruise {
  /** Cruise id, ship code + year + month. */
  id: string;
  /** Ship code. */
  ship: string;
  /** Basin sampled. */
  basin: Basin;
  /** First station day, ISO date (UTC). */
  start: string;
  /** Planned station positions [lat, lon] in degrees, open ocean. */
  stations: readonly (readonly [number, number])[];
  /** Bottle-file layout (see sample-formats.ts). */
  sampleFormat: 'lab-a' | 'lab-b' | 'lab-b-litre';
  /** Cell-file layout (see cell-formats.ts). */
  cellFormat: 'xrf-fmol' | 'xrf-amol' | 'xrf-mol' | 'xrf-mol-positions';
  /** Only in version 2 of the demo report. */
  heldBack: boolean;
}

/** The invented programme the demo report belongs to. */
export const PROGRAMME = 'Interbasin Cellular Iron Quota Survey (ICIQS), an invented programme for this demo';

/** Report title of the demo. */
export const REPORT_TITLE = 'Phytoplankton iron quotas across ocean basins: ICIQS demo synthesis';

/** Invented authors of the demo report. */
export const AUTHORS = ['Ilse Varnhagen', 'Tomasz Ellory-Okafor', 'Ruth Kanemoto', 'Dario Fenwick-Silva'];

/** Invented contact address (the example.org domain is reserved for examples). */
export const CONTACT = 'iciqs-data@example.org';

/** The three invented ships. */
export const SHIPS: readonly Ship[] = [
  { code: 'SG', name: 'RV Saltglass' },
  { code: 'TH', name: 'RV Tern Harbinger' },
  { code: 'CR', name: 'RV Calloway Reach' },
];

/** Pairs of TH2308 stations placed within 100 km of SG2104 stations for the crossover check (0-based station indices). */
export const CROSSOVER_PAIRS: readonly { a: [string, number]; b: [string, number] }[] = [
  { a: ['SG2104', 1], b: ['TH2308', 0] },
  { a: ['SG2104', 3], b: ['TH2308', 1] },
  { a: ['SG2104', 4], b: ['TH2308', 2] },
];

/** The six cruises, oldest first; the last one arrives after version 1 of the report. */
export const CRUISES: readonly Cruise[] = [
  {
    id: 'SG2104', ship: 'SG', basin: 'north-atlantic', start: '2021-04-18', sampleFormat: 'lab-a', cellFormat: 'xrf-fmol', heldBack: false,
    // West European Basin southward past the dust plume, well west of the Azores, Madeira, the Canaries and Cape Verde.
    stations: [[52.0, -22.0], [49.0, -17.0], [46.5, -18.5], [44.0, -18.0], [41.0, -20.0], [36.0, -20.0], [32.0, -24.0], [28.0, -28.0], [24.0, -30.0], [20.0, -32.0], [16.0, -35.0]],
  },
  {
    id: 'TH2110', ship: 'TH', basin: 'south-atlantic', start: '2021-10-25', sampleFormat: 'lab-b', cellFormat: 'xrf-amol', heldBack: false,
    // Inside the low-iron box, more than 300 km from St Helena.
    stations: [[-17.5, -25.0], [-20.5, -20.0], [-23.5, -15.0], [-26.5, -10.0], [-29.5, -5.0], [-32.5, 0.0], [-32.0, -15.0], [-29.0, -22.0], [-25.0, -27.0], [-21.0, -10.0]],
  },
  {
    id: 'CR2206', ship: 'CR', basin: 'north-pacific', start: '2022-06-08', sampleFormat: 'lab-b', cellFormat: 'xrf-mol', heldBack: false,
    // North Pacific subtropical gyre east and north-east of Hawaii, far from any island.
    stations: [[32.0, -140.0], [29.0, -137.0], [26.0, -134.0], [23.0, -131.0], [20.0, -128.0], [17.0, -125.0], [20.0, -138.0], [24.0, -145.0], [28.0, -148.0], [31.0, -152.0]],
  },
  {
    id: 'SG2301', ship: 'SG', basin: 'southern-ocean', start: '2023-01-12', sampleFormat: 'lab-a', cellFormat: 'xrf-fmol', heldBack: false,
    // Atlantic–Indian sector south of 50° S, east of Bouvet Island and west of the Prince Edward Islands.
    stations: [[-51.0, 12.0], [-53.0, 15.0], [-55.0, 18.0], [-57.0, 21.0], [-58.5, 24.0], [-56.0, 27.0], [-54.0, 30.0], [-52.0, 27.0], [-51.5, 20.0], [-53.5, 24.0]],
  },
  {
    id: 'TH2308', ship: 'TH', basin: 'north-atlantic', start: '2023-08-03', sampleFormat: 'lab-b-litre', cellFormat: 'xrf-amol', heldBack: false,
    // Three reoccupations of SG2104 stations (crossover), then west across the Newfoundland Basin towards the subtropical gyre.
    stations: [[49.3, -16.6], [44.2, -18.5], [41.3, -20.3], [53.0, -35.0], [50.0, -40.0], [45.0, -42.0], [40.0, -45.0], [36.0, -50.0], [32.0, -55.0]],
  },
  {
    id: 'CR2403', ship: 'CR', basin: 'indian', start: '2024-03-05', sampleFormat: 'lab-a', cellFormat: 'xrf-mol-positions', heldBack: true,
    // Central and eastern subtropical Indian Ocean, hundreds of km from the Chagos, Mascarene and Amsterdam islands.
    stations: [[-10.0, 80.0], [-14.0, 76.0], [-18.0, 72.0], [-22.0, 68.0], [-26.0, 74.0], [-30.0, 80.0], [-26.0, 86.0], [-22.0, 90.0], [-18.0, 95.0], [-14.0, 90.0]],
  },
];

/** Basin names as the report and comments write them. */
export const BASIN_NAMES: Readonly<Record<Basin, string>> = {
  'north-atlantic': 'North Atlantic',
  'south-atlantic': 'South Atlantic',
  'north-pacific': 'North Pacific',
  'southern-ocean': 'Southern Ocean',
  indian: 'Indian Ocean',
};

/** Bottle depths of every cast (m), shallow to deep. */
export const BOTTLE_DEPTHS = [10, 25, 50, 75, 100, 150, 200, 500, 1000, 1500, 2500, 4000] as const;

/** Bottle depths that cells may be taken at (upper 100 m). */
export const CELL_DEPTHS = [10, 25, 50, 75, 100] as const;

/** Station name as written in the files: cruise id, dash, two-digit number. */
export function stationName(cruise: string, index: number): string {
  return `${cruise}-${String(index + 1).padStart(2, '0')}`;
}

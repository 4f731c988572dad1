/** User-facing messages of the grid readers; tests assert the exact text. */

/** The bytes do not start like any NetCDF format. */
export function notNetcdfMagic(file: string, firstBytes: Uint8Array): string {
  const hex = [...firstBytes.subarray(0, 4)].map((b) => b.toString(16).padStart(2, '0')).join(' ');
  return `${file}: not a NetCDF file: it starts with bytes [${hex}]; expected "CDF" followed by 0x01 or 0x02 (classic, 64-bit offset) or "\\x89HDF" (netCDF-4)`;
}

/** CDF-5 (64-bit data) files are not read. */
export function unsupportedCdf5(file: string): string {
  return `${file}: NetCDF CDF-5 (64-bit data) format is not supported; convert it with "nccopy -k nc4" to netCDF-4`;
}

/** The NetCDF library refused the file (truncated, corrupt). */
export function notNetcdf(file: string, detail: string): string {
  return `${file}: not a readable NetCDF file (${detail}); expected a complete classic, 64-bit offset or netCDF-4 file`;
}

/** A variable's data run past the end of the file. */
export function truncatedVariable(file: string, variable: string, needed: number, length: number): string {
  return `${file}: file is truncated: variable ${variable} needs ${needed} bytes but the file has ${length}`;
}

/** A netCDF-4 file shorter than its superblock says, or with an unreadable superblock. */
export function truncatedHdf5(file: string, storedEof: number | undefined, length: number): string {
  return storedEof === undefined
    ? `${file}: not a readable netCDF-4 file: the HDF5 superblock cannot be read (${length} bytes)`
    : `${file}: file is truncated: the HDF5 superblock says ${storedEof} bytes but the file has ${length}`;
}

/** No variable matches the requested name or standard_name. */
export function variableNotFound(file: string, wanted: string, available: { name: string; standardName?: string }[]): string {
  const list = available.map((v) => (v.standardName ? `${v.name} (${v.standardName})` : v.name)).join(', ');
  return `${file}: no variable ${wanted}; the file has: ${list || 'no variables'}`;
}

/** Several variables share the requested standard_name. */
export function variableAmbiguous(file: string, standardName: string, names: string[]): string {
  return `${file}: several variables have standard_name "${standardName}" (${names.join(', ')}); name one with "variable"`;
}

/** Neither a variable name nor a standard_name was given. */
export function variableNotNamed(file: string): string {
  return `${file}: no variable chosen; give "variable" or "standardName"`;
}

/** What the CF layer looks for to recognise each axis. */
export const AXIS_CLUES = {
  longitude: 'axis = "X", standard_name = "longitude" or units = "degrees_east"',
  latitude: 'axis = "Y", standard_name = "latitude" or units = "degrees_north"',
} as const;

/** A required horizontal axis is missing among the variable's dimensions. */
export function noAxis(file: string, variable: string, dims: string[], axis: keyof typeof AXIS_CLUES): string {
  return `${file}: variable ${variable}(${dims.join(', ')}) has no recognisable ${axis} axis; looked for a coordinate variable with ${AXIS_CLUES[axis]}`;
}

/** The variable's dimensions cannot be read as a lon/lat/depth/time grid. */
export function unsupportedLayout(file: string, variable: string, detail: string): string {
  return `${file}: variable ${variable} has an unsupported layout: ${detail}`;
}

/** A coordinate variable is not monotonic or has repeated values. */
export function axisNotMonotonic(file: string, variable: string, detail: string): string {
  return `${file}: coordinate variable ${variable} ${detail}; expected distinct values`;
}

/** The time units do not read as "<unit> since <date>". */
export function badTimeUnits(file: string, variable: string, units: string): string {
  return `${file}: variable ${variable} attribute units = "${units}" is not a CF time unit; expected "<days|hours|minutes|seconds> since <yyyy-mm-dd [hh:mm:ss]>"`;
}

/** A calendar the reader does not decode. */
export function unsupportedCalendar(file: string, variable: string, calendar: string): string {
  return `${file}: variable ${variable} attribute calendar = "${calendar}" is not supported; expected standard, gregorian, proleptic_gregorian, noleap or 365_day`;
}

/** A mixed Julian/Gregorian date before the 1582 switch. */
export function julianReference(file: string, variable: string, units: string): string {
  return `${file}: variable ${variable} attribute units = "${units}" reaches before 1582-10-15 in the standard (mixed Julian/Gregorian) calendar; use proleptic_gregorian`;
}

/** A climatology time axis without 12 months (or a single step). */
export function climatologyLength(file: string, variable: string, n: number): string {
  return `${file}: climatology time axis ${variable} has ${n} steps; expected 12 months or a single step`;
}

/** The data variable has no units attribute and none was configured. */
export function noUnits(file: string, variable: string): string {
  return `${file}: variable ${variable} has no units attribute; give the units in the config`;
}

/** The data variable's units cannot be converted to the canonical unit. */
export function badUnits(file: string, variable: string, detail: string): string {
  return `${file}: variable ${variable} attribute units: ${detail}`;
}

/** The quantity has no canonical unit known to the grid reader. */
export function unknownQuantity(file: string, quantity: string): string {
  return `${file}: quantity "${quantity}" has no canonical unit; expected dissolved_fe, nitrate, phosphate or silicate, or give canonicalUnits`;
}

/** Default converter: unit text it does not know. */
export function unknownGridUnit(units: string, canonical: string): string {
  return `unknown unit "${units}"; expected an amount per kg, per litre or per cubic metre convertible to ${canonical}`;
}

/** Ledger detail: a volumetric unit converted with a fixed density. */
export function densityAssumed(units: string, canonical: string, density: number): string {
  return `converted ${units} to ${canonical} with a fixed seawater density of ${density} kg/m³`;
}

/** Ledger detail: pressure levels used as depths. */
export function pressureAsDepth(variable: string, how: string): string {
  return `vertical axis ${variable} is pressure in dbar; converted to depth in m ${how}`;
}

/** Ledger detail: 12 monthly time steps read as a month-of-year climatology. */
export function monthlyAsClimatology(variable: string, year: number): string {
  return `time axis ${variable} has 12 monthly steps within ${year}; read as a month-of-year climatology`;
}

/** CSV grid: the header lacks required columns. */
export function csvHeader(file: string, found: string[]): string {
  return `${file}:1: grid header is "${found.join(',')}"; expected lon,lat,depth,value or lon,lat,depth,month,value`;
}

/** CSV grid: a cell that is not a number. */
export function csvNotNumber(file: string, line: number, column: string, text: string): string {
  return `${file}:${line}: column ${column} is "${text}"; expected a number`;
}

/** CSV grid: month outside 1..12. */
export function csvBadMonth(file: string, line: number, text: string): string {
  return `${file}:${line}: month is "${text}"; expected an integer 1..12`;
}

/** CSV grid: the same node twice. */
export function csvDuplicateNode(file: string, line: number, firstLine: number, node: string): string {
  return `${file}:${line}: node ${node} repeats line ${firstLine}`;
}

/** CSV grid: the nodes do not fill the lattice. */
export function csvMissingNode(file: string, node: string, present: number, lattice: number[]): string {
  return `${file}: node ${node} is absent; ${present} rows do not fill the ${lattice.join(' × ')} lattice (write a row with an empty value for a missing node)`;
}

/** CSV grid: the parser failed. */
export function csvParse(file: string, line: number, detail: string): string {
  return `${file}:${line}: ${detail}`;
}

/** sampleGrid: a climatology needs the month of the sample. */
export function sampleNeedsMonth(source: string, variable: string): string {
  return `${source}: grid ${variable} is a monthly climatology; the sample point needs month (1..12) or timeMs`;
}

/** sampleGrid: a time-series grid needs the time of the sample. */
export function sampleNeedsTime(source: string, variable: string): string {
  return `${source}: grid ${variable} has a time axis; the sample point needs timeMs`;
}

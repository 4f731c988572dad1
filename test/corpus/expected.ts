// Expected `check` output per corpus case: exit code, printed lines, and value-level ledger notes check does not print.
/** One case's expectation. */
export interface Expected {
  /** Exit code of check. */
  exit: 0 | 1;
  /** Lines check prints, in order. */
  lines: string[];
  /** Load/harmonise ledger rows (converted or flagged) as `file:line action reason: detail`. */
  notes?: string[];
  /** A known fault in the output (unclear message, missed fault): the exit code is still asserted, the message is a todo. */
  todo?: string;
}

/** Expectations by case name. */
export const EXPECTED: Record<string, Expected> = {
  "samples file with semicolon delimiter": {
    exit: 1,
    lines: [
      "samples.csv:1:1 the header has a single column but contains semicolons: expected fields separated by commas (set \"delimiter\" in the config)",
      "check failed: 1 error",
    ],
  },
  "tab-separated samples named .csv": {
    exit: 1,
    lines: [
      "samples.csv:1:1 the header has a single column but contains tabs: expected fields separated by commas (set \"delimiter\" in the config)",
      "check failed: 1 error",
    ],
  },
  "samples missing the required lat column": {
    exit: 1,
    lines: [
      "samples.csv:1:1 missing required column \"lat\"; the header has: cruise, station, time, lon, depth, temperature, salinity, dissolved_fe, dissolved_fe_flag, nitrate, nitrate_flag",
      "check failed: 1 error",
    ],
  },
  "cells missing the required fe column": {
    exit: 1,
    lines: [
      "cells.csv:1:1 missing required column \"fe\"; the header has: cell_id, cruise, station, depth, phyto_class, fe_sigma, carbon",
      "check failed: 1 error",
    ],
  },
  "samples missing both depth and pressure": {
    exit: 1,
    lines: [
      "samples.csv:1:1 missing required column \"depth\"; the header has: cruise, station, time, lat, lon, temperature, salinity, dissolved_fe, dissolved_fe_flag, nitrate, nitrate_flag",
      "check failed: 1 error",
    ],
  },
  "duplicate header in cells": {
    exit: 1,
    lines: [
      "cells.csv:1:9 duplicate column header \"fe\" (first at column 6)",
      "check failed: 1 error",
    ],
  },
  "ragged sample row with an extra field": {
    exit: 0,
    lines: [
      "samples.csv:4 warning: ragged-row: expected 12 fields as in the header, found 13 (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-nitrate); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "ragged cell row with fields missing": {
    exit: 0,
    lines: [
      "cells.csv:6 warning: ragged-row: expected 8 fields as in the header, found 5 (row excluded)",
      "note: 17 cells rows converted (station-position); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "unterminated quote in samples": {
    exit: 1,
    lines: [
      "samples.csv:7 CSV syntax error: Quote Not Closed: the parsing is finished with an opening quote at line 7",
      "check failed: 1 error",
    ],
  },
  "BOM at the start of samples (valid)": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed",
    ],
  },
  "mixed CRLF and LF line endings (valid)": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed",
    ],
  },
  "blank lines between rows (valid)": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed",
    ],
  },
  "invalid UTF-8 in cells": {
    exit: 1,
    lines: [
      "cells.csv:3 invalid UTF-8 at byte 97; save the file as UTF-8",
      "check failed: 1 error",
    ],
  },
  "empty samples file": {
    exit: 1,
    lines: [
      "samples.csv:1:1 file is empty; expected a header line naming the columns",
      "check failed: 1 error",
    ],
  },
  "samples file of blank lines only": {
    exit: 1,
    lines: [
      "samples.csv:1:1 file is empty; expected a header line naming the columns",
      "check failed: 1 error",
    ],
  },
  "header-only cells file": {
    exit: 0,
    lines: [
      "cells.csv:1:1 warning: file has a header but no data rows",
      "check passed with 1 warning",
    ],
  },
  "10 MB single field in cells": {
    exit: 1,
    lines: [
      "cells.csv:2 a record is longer than 100000 characters (an unclosed quote, or a field far too long for a data value)",
      "check failed: 1 error",
    ],
  },
  "column map names a header the file lacks": {
    exit: 1,
    lines: [
      "samples.csv:1:1 column \"dFe_nM\" (mapped to dissolved_fe) is not in the header",
      "check failed: 1 error",
    ],
  },
  "same file listed twice as samples": {
    exit: 1,
    lines: [
      "basinquota.yaml:15:13 inputs.samples[1].path: \"samples.csv\" is already listed as inputs.samples[0]; each file is read once",
      "check failed: 1 error",
    ],
  },
  "thousands separator in depth": {
    exit: 0,
    lines: [
      "samples.csv:3 warning: not-a-number: column \"depth\" (depth): \"1,050\" is not a number (thousands separators are not accepted) (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-nitrate); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "decimal comma in dissolved_fe": {
    exit: 0,
    lines: [
      "samples.csv:2 warning: not-a-number: column \"dissolved_fe\" (dissolved_fe): \"0,25\" is not a number (use a decimal point, not a decimal comma) (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-nitrate); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "decimal commas in a semicolon file": {
    exit: 0,
    lines: [
      "cells.csv:2 warning: no-position: cell has no lat/lon and station S1 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:3 warning: no-position: cell has no lat/lon and station S1 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:4 warning: no-position: cell has no lat/lon and station S1 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:5 warning: no-position: cell has no lat/lon and station S1 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:6 warning: no-position: cell has no lat/lon and station S1 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:7 warning: no-position: cell has no lat/lon and station S1 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:8 warning: no-position: cell has no lat/lon and station S2 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:9 warning: no-position: cell has no lat/lon and station S2 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:10 warning: no-position: cell has no lat/lon and station S2 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:11 warning: no-position: cell has no lat/lon and station S2 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:12 warning: no-position: cell has no lat/lon and station S2 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:13 warning: no-position: cell has no lat/lon and station S2 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:14 warning: no-position: cell has no lat/lon and station S3 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:15 warning: no-position: cell has no lat/lon and station S3 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:16 warning: no-position: cell has no lat/lon and station S3 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:17 warning: no-position: cell has no lat/lon and station S3 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:18 warning: no-position: cell has no lat/lon and station S3 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:19 warning: no-position: cell has no lat/lon and station S3 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "samples.csv:2 warning: not-a-number: column \"temperature\" (temperature): \"15,5\" is not a number (use a decimal point, not a decimal comma) (row excluded)",
      "samples.csv:3 warning: not-a-number: column \"temperature\" (temperature): \"15,5\" is not a number (use a decimal point, not a decimal comma) (row excluded)",
      "samples.csv:4 warning: not-a-number: column \"temperature\" (temperature): \"15,5\" is not a number (use a decimal point, not a decimal comma) (row excluded)",
      "samples.csv:5 warning: not-a-number: column \"temperature\" (temperature): \"15,5\" is not a number (use a decimal point, not a decimal comma) (row excluded)",
      "samples.csv:6 warning: not-a-number: column \"temperature\" (temperature): \"15,5\" is not a number (use a decimal point, not a decimal comma) (row excluded)",
      "samples.csv:7 warning: not-a-number: column \"temperature\" (temperature): \"15,5\" is not a number (use a decimal point, not a decimal comma) (row excluded)",
      "check passed with 24 warnings",
    ],
  },
  "text in numeric depth": {
    exit: 0,
    lines: [
      "samples.csv:4 warning: not-a-number: column \"depth\" (depth): \"deep\" is not a number (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-nitrate); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "NaN literal in cell fe": {
    exit: 0,
    lines: [
      "cells.csv:5 warning: missing-content: fe content is missing (empty, a fill value or below detection); cell excluded (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "Infinity in nitrate": {
    exit: 0,
    lines: [
      "samples.csv:4 warning: not-a-number: column \"nitrate\" (nitrate): \"Infinity\" is not a number (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-nitrate); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "fill value -999 in dissolved_fe": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "note: 1 samples row converted (fill-value); see the ledger for each row",
      "check passed",
    ],
    notes: [
      "samples.csv:2 converted fill-value: fill value read as missing: dissolved_fe = -999",
    ],
  },
  "fill value -9999 in depth": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-nitrate); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "note: 1 samples row converted (fill-value); see the ledger for each row",
      "check passed",
    ],
    notes: [
      "samples.csv:3 converted fill-value: fill value read as missing: depth = -9999",
    ],
  },
  "fill value 9.9e36 in nitrate": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-nitrate); see the ledger for each row",
      "note: 1 samples row converted (fill-value); see the ledger for each row",
      "check passed",
    ],
    notes: [
      "samples.csv:4 converted fill-value: fill value read as missing: nitrate = 9.9e+36",
    ],
  },
  "fill value -999 in cell fe": {
    exit: 0,
    lines: [
      "cells.csv:2 warning: missing-content: fe content is missing (empty, a fill value or below detection); cell excluded (row excluded)",
      "note: 1 cells row converted (fill-value); see the ledger for each row",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed with 1 warning",
    ],
    notes: [
      "cells.csv:2 converted fill-value: fill value read as missing: fe = -999",
    ],
  },
  "below-detection \"<0.02\" in dissolved_fe (substituted)": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 1 samples row converted (below-detection-substituted); see the ledger for each row",
      "check passed",
    ],
    notes: [
      "samples.csv:2 converted below-detection-substituted: dissolved_fe below detection limit 0.02: set to 0.01 (policy half)",
    ],
  },
  "below-detection \"bdl\" with no limit": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "note: 1 samples row flagged (below-detection-no-limit); see the ledger for each row",
      "check passed",
    ],
    notes: [
      "samples.csv:2 flagged below-detection-no-limit: dissolved_fe below detection limit but no limit is known (no dissolved_fe_dl, no value, no default): not used",
    ],
  },
  "below-detection \"bdl\" with a configured limit": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 1 samples row converted (below-detection-substituted); see the ledger for each row",
      "check passed",
    ],
    notes: [
      "samples.csv:2 converted below-detection-substituted: dissolved_fe below detection limit 0.02: set to 0.01 (policy half)",
    ],
  },
  "negative cell fe content": {
    exit: 0,
    lines: [
      "cells.csv:3 warning: non-positive-content: fe content -3.5e-18 mol/cell is not a positive number; cell excluded (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "zero cell fe content": {
    exit: 0,
    lines: [
      "cells.csv:4 warning: non-positive-content: fe content 0 mol/cell is not a positive number; cell excluded (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "zero cell carbon": {
    exit: 0,
    lines: [
      "cells.csv:4 warning: no-carbon: no carbon by method measured: positive carbon missing; cell excluded (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "negative depth": {
    exit: 0,
    lines: [
      "samples.csv:2 warning: negative-depth: negative depth -10 m (depth is positive down) (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-nitrate); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "lat and lon swapped onto land": {
    exit: 0,
    lines: [
      "cells.csv:2 warning: no-position: cell has no lat/lon and station S1 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:3 warning: no-position: cell has no lat/lon and station S1 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:4 warning: no-position: cell has no lat/lon and station S1 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:5 warning: no-position: cell has no lat/lon and station S1 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:6 warning: no-position: cell has no lat/lon and station S1 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "cells.csv:7 warning: no-position: cell has no lat/lon and station S1 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "samples.csv:2 warning: position-on-land: position lat 60, lon 10 is on land; swapping latitude and longitude would put it at sea (columns swapped?) (row excluded)",
      "samples.csv:3 warning: position-on-land: position lat 60, lon 10 is on land; swapping latitude and longitude would put it at sea (columns swapped?) (row excluded)",
      "note: 12 cells rows converted (station-position); see the ledger for each row",
      "check passed with 8 warnings",
    ],
  },
  "lat out of range": {
    exit: 0,
    lines: [
      "samples.csv:4 warning: position-out-of-range: position out of range: lat 95 (expected −90 to 90), lon -152 (expected −360 to 360) (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-nitrate); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "lon out of range": {
    exit: 0,
    lines: [
      "samples.csv:4 warning: position-out-of-range: position out of range: lat 32 (expected −90 to 90), lon 400 (expected −360 to 360) (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-nitrate); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "lon 0-360 (valid, normalised)": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed",
    ],
  },
  "empty lat": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 1 samples row flagged (position-missing); see the ledger for each row",
      "check passed",
    ],
    notes: [
      "samples.csv:2 flagged position-missing: position missing (lat NaN, lon -150); the row is kept but cannot be mapped or checked against land",
    ],
  },
  "cells station in no sample file and no position": {
    exit: 0,
    lines: [
      "cells.csv:2 warning: no-position: cell has no lat/lon and station S9 of cruise CR1 has no positioned bottle in the samples; cell excluded (row excluded)",
      "note: 17 cells rows converted (station-position); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "unknown unit for dissolved_fe": {
    exit: 1,
    lines: [
      "basinquota.yaml:12:23 inputs.samples[0].units.dissolved_fe: unknown unit \"nmol/furlong\" for column dissolved_fe",
      "check failed: 1 error",
    ],
  },
  "wrong-dimension unit for dissolved_fe": {
    exit: 1,
    lines: [
      "basinquota.yaml:12:23 inputs.samples[0].units.dissolved_fe: unit \"m\" has the wrong dimension for dissolved_fe (expected amount per mass or per volume)",
      "check failed: 1 error",
    ],
  },
  "wrong-dimension unit for cell fe": {
    exit: 1,
    lines: [
      "basinquota.yaml:19:13 inputs.cells[0].units.fe: unit \"µm3\" has the wrong dimension for fe (expected amount per cell)",
      "check failed: 1 error",
    ],
  },
  "per-litre dFe without temperature and salinity (default density)": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 6 samples rows converted (default-density); see the ledger for each row",
      "check passed",
    ],
    notes: [
      "samples.csv:2 converted default-density: dissolved_fe converted per volume → per mass with default density 1025 kg/m3 (temperature, salinity missing)",
      "samples.csv:3 converted default-density: dissolved_fe converted per volume → per mass with default density 1025 kg/m3 (temperature, salinity missing)",
      "samples.csv:4 converted default-density: dissolved_fe converted per volume → per mass with default density 1025 kg/m3 (temperature, salinity missing)",
      "samples.csv:5 converted default-density: dissolved_fe converted per volume → per mass with default density 1025 kg/m3 (temperature, salinity missing)",
      "samples.csv:6 converted default-density: dissolved_fe converted per volume → per mass with default density 1025 kg/m3 (temperature, salinity missing)",
      "samples.csv:7 converted default-density: dissolved_fe converted per volume → per mass with default density 1025 kg/m3 (temperature, salinity missing)",
    ],
  },
  "per-litre dFe with one row missing temperature": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 1 samples row converted (default-density); see the ledger for each row",
      "check passed",
    ],
    notes: [
      "samples.csv:2 converted default-density: dissolved_fe converted per volume → per mass with default density 1025 kg/m3 (temperature missing)",
    ],
  },
  "no unit for dissolved_fe": {
    exit: 1,
    lines: [
      "samples.csv no unit given for column dissolved_fe; add it to the file's units in the config (e.g. dissolved_fe: nmol/kg) — units are never assumed",
      "check failed: 1 error",
    ],
  },
  "unknown IOC flag value": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "note: 1 samples row flagged (unknown-flag); see the ledger for each row",
      "check passed",
    ],
    notes: [
      "samples.csv:3 flagged unknown-flag: dissolved_fe_flag = \"X\" is not a flag of the ioc scheme; the value is not used",
    ],
  },
  "bad flag excludes the value": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "note: 1 samples row flagged (flag-not-accepted); see the ledger for each row",
      "check passed",
    ],
    notes: [
      "samples.csv:3 flagged flag-not-accepted: dissolved_fe has quality bad, which is not accepted; the value is not used",
    ],
  },
  "unknown flag scheme": {
    exit: 1,
    lines: [
      "basinquota.yaml:14:14 inputs.samples[0].flags: \"argo\" is not a valid setting here (see the schema description of inputs.samples[0].flags)",
      "check failed: 1 error",
    ],
  },
  "unknown phytoplankton class": {
    exit: 0,
    lines: [
      "cells.csv:2 warning: unknown-class: phyto_class \"ciliate\" matches no configured class or alias; cell excluded (classes are never guessed) (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "class alias (valid)": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed",
    ],
  },
  "duplicate cell ids": {
    exit: 1,
    lines: [
      "cells.csv:3 duplicate cell id \"c001\" (first on line 2); cell ids must be unique within a file",
      "check failed: 1 error",
    ],
  },
  "duplicate bottles": {
    exit: 0,
    lines: [
      "samples.csv:8 warning: duplicate-bottle: duplicate bottle CR1/S1/1/2 on line 8 (first on line 2); the later row is excluded (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "same bottles in two sample files": {
    exit: 0,
    lines: [
      "samples-copy.csv:2 warning: duplicate-bottle: duplicate bottle CR1/S1/1/2, already read from samples.csv:2; this row is excluded (row excluded)",
      "samples-copy.csv:3 warning: duplicate-bottle: duplicate bottle CR1/S1/1/1, already read from samples.csv:3; this row is excluded (row excluded)",
      "samples-copy.csv:4 warning: duplicate-bottle: duplicate bottle CR1/S2/1/2, already read from samples.csv:4; this row is excluded (row excluded)",
      "samples-copy.csv:5 warning: duplicate-bottle: duplicate bottle CR1/S2/1/1, already read from samples.csv:5; this row is excluded (row excluded)",
      "samples-copy.csv:6 warning: duplicate-bottle: duplicate bottle CR1/S3/1/2, already read from samples.csv:6; this row is excluded (row excluded)",
      "samples-copy.csv:7 warning: duplicate-bottle: duplicate bottle CR1/S3/1/1, already read from samples.csv:7; this row is excluded (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed with 6 warnings",
    ],
  },
  "impossible date 2021-02-30": {
    exit: 0,
    lines: [
      "samples.csv:2 warning: bad-time: column \"time\" (time): \"2021-02-30T01:00:00Z\" is not an ISO 8601 date or date-time (e.g. 2024-03-17 or 2024-03-17T06:30:00Z) (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-nitrate); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "month 13": {
    exit: 0,
    lines: [
      "samples.csv:2 warning: bad-time: column \"time\" (time): \"2021-13-01T01:00:00Z\" is not an ISO 8601 date or date-time (e.g. 2024-03-17 or 2024-03-17T06:30:00Z) (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-nitrate); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "timezone-less time": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 1 samples row flagged (time-without-zone); see the ledger for each row",
      "check passed",
    ],
    notes: [
      "samples.csv:2 flagged time-without-zone: column \"time\" (time): \"2021-05-01T01:00:00\" has no time zone; read as UTC",
    ],
  },
  "date written day-first": {
    exit: 0,
    lines: [
      "samples.csv:2 warning: bad-time: column \"time\" (time): \"01/05/2021\" is not an ISO 8601 date or date-time (e.g. 2024-03-17 or 2024-03-17T06:30:00Z) (row excluded)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 3 cells rows flagged (no-ambient-nitrate); see the ledger for each row",
      "note: 3 cells rows flagged (no-residual); see the ledger for each row",
      "note: 3 cells rows flagged (non-finite-dfe); see the ledger for each row",
      "check passed with 1 warning",
    ],
  },
  "depth and pressure disagreeing": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 1 samples row flagged (depth-pressure-mismatch); see the ledger for each row",
      "check passed",
    ],
    notes: [
      "samples.csv:3 flagged depth-pressure-mismatch: depth 50 m differs from 495.998 m computed from pressure 500 dbar by more than 10 m; the given depth is kept",
    ],
  },
  "cell depth far from every bottle and no grid": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "note: 1 cells row flagged (no-ambient-dissolved_fe); see the ledger for each row",
      "note: 1 cells row flagged (no-ambient-nitrate); see the ledger for each row",
      "note: 1 cells row flagged (no-residual); see the ledger for each row",
      "note: 1 cells row flagged (non-finite-dfe); see the ledger for each row",
      "check passed",
    ],
  },
  "good NetCDF grid (valid)": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed",
    ],
  },
  "NetCDF without coordinate attributes": {
    exit: 1,
    lines: [
      "grid.nc variable dfe(z, y, x) has no recognisable latitude axis; looked for a coordinate variable with axis = \"Y\", standard_name = \"latitude\" or units = \"degrees_north\"",
      "check failed: 1 error",
    ],
  },
  "truncated NetCDF": {
    exit: 1,
    lines: [
      "grid.nc not a readable NetCDF file (Offset is outside the bounds of the DataView); expected a complete classic, 64-bit offset or netCDF-4 file",
      "check failed: 1 error",
    ],
  },
  "NetCDF with the variable missing": {
    exit: 1,
    lines: [
      "grid.nc no variable named \"iron\"; the file has: depth (depth), lat (latitude), lon (longitude), dfe (mole_concentration_of_dissolved_iron_in_sea_water)",
      "check failed: 1 error",
    ],
  },
  "text file named .nc": {
    exit: 1,
    lines: [
      "grid.nc not a NetCDF file: it starts with bytes [6c 6f 6e 2c]; expected \"CDF\" followed by 0x01 or 0x02 (classic, 64-bit offset) or \"\\x89HDF\" (netCDF-4)",
      "check failed: 1 error",
    ],
  },
  "CSV grid without a unit": {
    exit: 1,
    lines: [
      "grid.csv variable value has no units attribute; give the units in the config",
      "check failed: 1 error",
    ],
  },
  "config with an unknown top-level key": {
    exit: 1,
    lines: [
      "basinquota.yaml:37:1 colour: unknown key \"colour\" (expected one of: report, inputs, harmonise, match, classes, carbon, crossover, fits, anomalies, figures)",
      "check failed: 1 error",
    ],
  },
  "config with an unknown key in a samples entry": {
    exit: 1,
    lines: [
      "basinquota.yaml:15:7 inputs.samples[0].sheet: unknown key \"sheet\" (expected one of: path, cruise, delimiter, columns, units, flags, detection_limits, fill_values)",
      "check failed: 1 error",
    ],
  },
  "config with a wrong type": {
    exit: 1,
    lines: [
      "basinquota.yaml:38:10 anomalies.fdr_q: expected number, got \"high\"",
      "check failed: 1 error",
    ],
  },
  "config missing report": {
    exit: 1,
    lines: [
      "basinquota.yaml:1:1 report: missing required key \"report\"",
      "check failed: 1 error",
    ],
  },
  "config YAML syntax error": {
    exit: 1,
    lines: [
      "basinquota.yaml:4:1 YAML syntax error: Missing closing \"quote",
      "check failed: 1 error",
    ],
  },
  "config that is a list": {
    exit: 1,
    lines: [
      "basinquota.yaml:1:1 expected a mapping of settings (report, inputs, classes …) at the top level",
      "check failed: 1 error",
    ],
  },
  "empty config": {
    exit: 1,
    lines: [
      "basinquota.yaml:1:1 expected a mapping of settings (report, inputs, classes …) at the top level",
      "check failed: 1 error",
    ],
  },
  "YAML alias bomb": {
    exit: 1,
    lines: [
      "basinquota.yaml:1:1 YAML syntax error: Excessive alias count indicates a resource exhaustion attack",
      "check failed: 1 error",
    ],
  },
  "duplicate keys in config": {
    exit: 1,
    lines: [
      "basinquota.yaml:3:3 YAML syntax error: Map keys must be unique",
      "check failed: 1 error",
    ],
  },
  "path outside the project": {
    exit: 1,
    lines: [
      "basinquota.yaml:7:13 inputs.samples[0].path: path \"../samples.csv\" leaves the project folder; inputs must lie inside it",
      "check failed: 1 error",
    ],
  },
  "absolute path": {
    exit: 1,
    lines: [
      "basinquota.yaml:7:13 inputs.samples[0].path: path \"/etc/hostname\" is absolute; write it relative to the project folder",
      "check failed: 1 error",
    ],
  },
  "missing input file": {
    exit: 1,
    lines: [
      "basinquota.yaml input file \"cells/missing.csv\" does not exist",
      "check failed: 1 error",
    ],
  },
  "symlink pointing outside the project": {
    exit: 1,
    lines: [
      "basinquota.yaml path \"linked.csv\" resolves outside the project folder (through a symbolic link)",
      "check failed: 1 error",
    ],
  },
  "class id with capitals": {
    exit: 1,
    lines: [
      "basinquota.yaml:26:3 classes.Diatom: \"Diatom\" is not a valid name under classes: use lower-case letters, digits, \"_\" or \"-\", starting with a letter (put other spellings in aliases)",
      "check failed: 1 error",
    ],
  },
  "unknown region scheme": {
    exit: 1,
    lines: [
      "basinquota.yaml:22:12 inputs.regions: \"ices-areas\" is not a valid setting here (see the schema description of inputs.regions)",
      "check failed: 1 error",
    ],
  },
  "GeoJSON regions (valid)": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed",
    ],
  },
  "GeoJSON with an open ring": {
    exit: 1,
    lines: [
      "regions.geojson feature 0: ring 0 is not closed (first position [-160, 25], last [-160, 40]); GeoJSON rings repeat their first position at the end",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check failed: 1 error",
    ],
  },
  "GeoJSON with clockwise winding": {
    exit: 0,
    lines: [
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check passed",
    ],
  },
  "region file with no polygons": {
    exit: 1,
    lines: [
      "regions.geojson feature 0: geometry is Point; expected Polygon or MultiPolygon",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check failed: 1 error",
    ],
  },
  "region file that is not JSON": {
    exit: 1,
    lines: [
      "regions.geojson not valid JSON (Expected double-quoted property name in JSON at position 31)",
      "note: 18 cells rows converted (station-position); see the ledger for each row",
      "check failed: 1 error",
    ],
  },
};

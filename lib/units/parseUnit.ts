import { combineDimensions, type Dimension } from './dimension.js';

/** A parsed unit: its dimension and the factor to the base units (mol, kg, m, cell, dbar, °C). */
export interface ParsedUnit {
  /** The unit as written. */
  text: string;
  /** Exponents over the base dimensions. */
  dimension: Dimension;
  /** Multiply a value in this unit by `factor` to get base units (e.g. nmol/L → 1e-6 mol m⁻³). */
  factor: number;
  /** Substance a mass refers to, e.g. 'C' in "pg C/cell"; undefined when none was written. */
  substance?: string;
}

interface Atom {
  dimension: Dimension;
  factor: number;
  /** Which SI prefixes the symbol takes (none when absent). */
  prefixes?: string;
}

// SI prefixes (BIPM SI Brochure, 9th ed., Table 7); 'u' stands for µ after normalisation.
const PREFIX: Record<string, number> = { a: 1e-18, f: 1e-15, p: 1e-12, n: 1e-9, u: 1e-6, m: 1e-3, c: 1e-2, d: 1e-1, k: 1e3 };

// Only the spellings of the trade are accepted; anything else is an error, never a guess.
const ATOMS: Record<string, Atom> = {
  mol: { dimension: { amount: 1 }, factor: 1, prefixes: 'afpnum' },
  g: { dimension: { mass: 1 }, factor: 1e-3, prefixes: 'afpnumk' },
  L: { dimension: { length: 3 }, factor: 1e-3, prefixes: 'um' },
  l: { dimension: { length: 3 }, factor: 1e-3, prefixes: 'um' },
  m: { dimension: { length: 1 }, factor: 1, prefixes: 'umck' },
  // Molar: mol per litre.
  M: { dimension: { amount: 1, length: -3 }, factor: 1e3, prefixes: 'pnum' },
  cell: { dimension: { cell: 1 }, factor: 1 },
  cells: { dimension: { cell: 1 }, factor: 1 },
  dbar: { dimension: { pressure: 1 }, factor: 1 },
  decibar: { dimension: { pressure: 1 }, factor: 1 },
  degC: { dimension: { temperature: 1 }, factor: 1 },
  PSU: { dimension: {}, factor: 1 },
  psu: { dimension: {}, factor: 1 },
};

function lookupAtom(symbol: string): Atom | undefined {
  if (Object.hasOwn(ATOMS, symbol)) return ATOMS[symbol];
  if (symbol.length < 2) return undefined;
  const prefix = symbol[0];
  const rest = symbol.slice(1);
  if (!Object.hasOwn(ATOMS, rest)) return undefined;
  const atom = ATOMS[rest];
  if (!atom.prefixes?.includes(prefix)) return undefined;
  return { dimension: atom.dimension, factor: atom.factor * PREFIX[prefix] };
}

function normalise(text: string): string {
  return text
    .trim()
    .replace(/[µμ]/g, 'u')
    .replace(/°C/g, 'degC')
    .replace(/⁻/g, '-')
    .replace(/¹/g, '1')
    .replace(/²/g, '2')
    .replace(/³/g, '3')
    .replace(/(?<=[A-Za-z])\.(?=[A-Za-z])/g, ' ');
}

const TOKEN = /^([A-Za-z]+)(?:\^?(-?\d+))?$/;

/** Parse a unit string such as "nmol kg-1", "µM", "pg C/cell" or "dbar"; null when it is not a known unit. */
export function parseUnit(text: string): ParsedUnit | null {
  const s = normalise(text);
  if (s === '') return null;
  if (s === '1') return { text, dimension: {}, factor: 1 };
  let dimension: Dimension = {};
  let factor = 1;
  let substance: string | undefined;
  const parts = s.split('/');
  for (let i = 0; i < parts.length; i++) {
    const tokens = parts[i].split(/[\s·*]+/).filter((t) => t !== '');
    if (tokens.length === 0) return null;
    const sign = i === 0 ? 1 : -1;
    let previousWasMass = false;
    for (const token of tokens) {
      // A bare "C" after a mass names the substance (carbon), as in "pg C/cell".
      if (token === 'C' && previousWasMass && substance === undefined) {
        substance = 'C';
        previousWasMass = false;
        continue;
      }
      const m = TOKEN.exec(token);
      if (!m) return null;
      const atom = lookupAtom(m[1]);
      if (!atom) return null;
      const power = sign * (m[2] === undefined ? 1 : Number(m[2]));
      if (power === 0) return null;
      dimension = combineDimensions(dimension, atom.dimension, power);
      factor *= atom.factor ** power;
      previousWasMass = atom.dimension.mass === 1 && power === 1;
    }
  }
  return substance === undefined ? { text, dimension, factor } : { text, dimension, factor, substance };
}

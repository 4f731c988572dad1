import { densityAssumed, unknownGridUnit } from './messages.js';
import type { ToCanonical } from './options.js';

/** Fixed seawater density in kg/m³ used for per-volume units when no temperature/salinity is at hand (common practice). */
export const DEFAULT_DENSITY = 1025;

/** Decimal exponent of amount prefixes. */
const AMOUNT_EXPONENT: Record<string, number> = { '': 0, m: -3, u: -6, n: -9, p: -12 };

/** Per-what part of a concentration: kg 1, litre 1e-3 m³, m³. */
type Per = 'kg' | 'L' | 'm3';

function normalise(text: string): string {
  return text.trim().replace(/[µμ]/g, 'u').replace(/\s+/g, ' ').replace(/\^/g, '').replace(/\*\*/g, '');
}

const PER_TOKEN: Record<string, Per> = {
  kg: 'kg', 'kg-1': 'kg',
  l: 'L', L: 'L', 'l-1': 'L', 'L-1': 'L', dm3: 'L', 'dm-3': 'L',
  m3: 'm3', 'm-3': 'm3',
};

/** Reads "<prefix>mol/kg", "<prefix>mol kg-1", "<prefix>M", "<prefix>mol/L", "<prefix>mol m-3" into exponent and per. */
function parse(text: string): { exponent: number; per: Per } | undefined {
  const t = normalise(text);
  const molar = /^([munp]?)M$/.exec(t);
  if (molar) return { exponent: AMOUNT_EXPONENT[molar[1]], per: 'L' };
  const slash = /^([munp]?)mol\s*\/\s*(kg|l|L|dm3|m3)$/.exec(t);
  const power = /^([munp]?)mol[\s.](kg-1|l-1|L-1|dm-3|m-3)$/.exec(t);
  const m = slash ?? power;
  return m ? { exponent: AMOUNT_EXPONENT[m[1]], per: PER_TOKEN[m[2]] } : undefined;
}

/**
 * Default unit converter of the grid readers to `canonical` (nmol/kg or µmol/kg): amount per kg, per litre
 * (M, mol/L) or per m³; per-volume units use DEFAULT_DENSITY and say so in `note`. lib/units does the full job.
 */
export function defaultToCanonical(canonical: string): ToCanonical {
  const target = parse(canonical);
  return (unitsText: string) => {
    const source = parse(unitsText);
    if (!target || target.per !== 'kg' || !source) return unknownGridUnit(unitsText, canonical);
    const scale = Number(`1e${source.exponent - target.exponent}`);
    if (source.per === 'kg') return { factor: scale };
    // per litre → per kg: divide by density in kg/L; per m³ → per kg: divide by density in kg/m³.
    const density = source.per === 'L' ? DEFAULT_DENSITY / 1000 : DEFAULT_DENSITY;
    return { factor: scale / density, note: densityAssumed(unitsText, canonical, DEFAULT_DENSITY) };
  };
}

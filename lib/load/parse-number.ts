// Strict decimal numbers and detection-limit markers in measured columns.

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const MISSING = new Set(['', 'na', 'n/a', 'nan', 'null', 'none']);
const BELOW_WORDS = new Set(['bdl', 'b.d.l.', 'nd', 'n.d.', '<dl', '<lod', 'bd', '<d.l.']);
const BELOW_LIMIT = /^<\s*((?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)$/;

/** Result of reading one numeric field. */
export type NumberField =
  | { kind: 'number'; value: number }
  | { kind: 'missing' }
  | { kind: 'below'; limit: number }
  | { kind: 'invalid' };

/** Read a numeric field: a plain decimal number, an empty/NA marker, or (when `censorable`) a below-detection marker such as "<0.05", "bdl" or "nd". */
export function parseNumberField(raw: string, censorable: boolean): NumberField {
  const text = raw.trim();
  if (MISSING.has(text.toLowerCase())) return { kind: 'missing' };
  if (NUMBER.test(text)) return { kind: 'number', value: Number(text) };
  if (censorable) {
    if (BELOW_WORDS.has(text.toLowerCase())) return { kind: 'below', limit: NaN };
    const m = BELOW_LIMIT.exec(text);
    if (m) return { kind: 'below', limit: Number(m[1]) };
  }
  return { kind: 'invalid' };
}

/** Powers of ten that doubles hold exactly (10^0 … 10^22). */
const EXACT_POWERS = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));

/**
 * A plain decimal without exponent and with at most 15 significant digits ("-12.5", ".25", "7."), read by one scan;
 * NaN for anything else (the caller then uses parseNumberField). Equal to Number(text) bit for bit: the digits form
 * an integer below 2^53 and the scale is an exact power of ten up to 10^22, so one IEEE division is correctly
 * rounded (Clinger 1990, "How to read floating point numbers accurately", the fast path).
 */
export function parsePlainDecimal(text: string): number {
  const n = text.length;
  let i = 0;
  let negative = false;
  const first = text.charCodeAt(0);
  if (first === 45 || first === 43) {
    negative = first === 45;
    i = 1;
  }
  let mantissa = 0;
  let digits = 0;
  let significant = 0;
  let scale = 0;
  let point = false;
  for (; i < n; i++) {
    const c = text.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      digits++;
      if (mantissa !== 0 || c !== 48) significant++;
      mantissa = mantissa * 10 + (c - 48);
      if (point) scale++;
    } else if (c === 46 && !point) point = true;
    else return NaN;
  }
  if (digits === 0 || significant > 15 || scale > 22) return NaN;
  const value = scale === 0 ? mantissa : mantissa / EXACT_POWERS[scale];
  return negative ? -value : value;
}

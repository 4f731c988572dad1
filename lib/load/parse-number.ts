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

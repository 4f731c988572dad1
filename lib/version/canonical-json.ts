// Canonical JSON: one byte sequence per value, so hashes and archived files do not depend on key insertion order.

/** JSON with keys sorted by code unit, no whitespace, shortest round-trip numbers, NaN and ±Infinity as null. */
export function canonicalJson(value: unknown): string {
  return serialise(value, '', '', new Set()) ?? 'null';
}

/** canonicalJson with two-space indentation and a trailing newline, for files people read and commit. */
export function prettyJson(value: unknown): string {
  return `${serialise(value, '  ', '', new Set()) ?? 'null'}\n`;
}

/** Serialise one value; undefined means "omit" (as JSON.stringify does for object members). */
function serialise(value: unknown, indent: string, depth: string, seen: Set<object>): string | undefined {
  if (value === null) return 'null';
  switch (typeof value) {
    case 'string':
      return JSON.stringify(value);
    case 'number':
      // String() is the shortest round-trip form and writes -0 as 0, as JSON does.
      return Number.isFinite(value) ? String(value) : 'null';
    case 'boolean':
      return value ? 'true' : 'false';
    case 'bigint':
      throw new TypeError('canonicalJson cannot serialise a bigint');
    case 'undefined':
    case 'function':
    case 'symbol':
      return undefined;
  }
  const object = value as object;
  if (typeof (object as { toJSON?: unknown }).toJSON === 'function') {
    return serialise((object as { toJSON(): unknown }).toJSON(), indent, depth, seen);
  }
  if (seen.has(object)) throw new TypeError('canonicalJson cannot serialise a cyclic structure');
  seen.add(object);
  const inner = depth + indent;
  const open = indent ? `\n${inner}` : '';
  const close = indent ? `\n${depth}` : '';
  const comma = indent ? `,\n${inner}` : ',';
  let out: string;
  // Typed arrays (Float64Array columns) are lists of numbers, not objects keyed "0", "1", ….
  if (Array.isArray(object) || (ArrayBuffer.isView(object) && !(object instanceof DataView))) {
    const items = Array.from(object as ArrayLike<unknown>, (item) => serialise(item, indent, inner, seen) ?? 'null');
    out = items.length === 0 ? '[]' : `[${open}${items.join(comma)}${close}]`;
  } else {
    const colon = indent ? ': ' : ':';
    const members: string[] = [];
    for (const key of Object.keys(object).sort()) {
      const text = serialise((object as Record<string, unknown>)[key], indent, inner, seen);
      if (text !== undefined) members.push(`${JSON.stringify(key)}${colon}${text}`);
    }
    out = members.length === 0 ? '{}' : `{${open}${members.join(comma)}${close}}`;
  }
  seen.delete(object);
  return out;
}

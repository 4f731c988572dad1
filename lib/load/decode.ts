import type { InputBytes, InputText, Problem } from '../types.js';
import * as msg from './messages.js';

/** Decode UTF-8 bytes strictly; invalid bytes give a problem with the line and byte offset instead of replacement characters. */
export function decodeUtf8(input: InputBytes): InputText | Problem {
  try {
    return { name: input.name, text: new TextDecoder('utf-8', { fatal: true }).decode(input.bytes) };
  } catch {
    const at = firstInvalidByte(input.bytes);
    let line = 1;
    for (let i = 0; i < at; i++) if (input.bytes[i] === 0x0a) line++;
    return { file: input.name, line, col: 0, message: msg.invalidUtf8(at), severity: 'error' };
  }
}

/** Offset of the first byte that breaks UTF-8 (RFC 3629 well-formed sequences). */
function firstInvalidByte(bytes: Uint8Array): number {
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i];
    const n = b < 0x80 ? 0 : b >= 0xc2 && b <= 0xdf ? 1 : b >= 0xe0 && b <= 0xef ? 2 : b >= 0xf0 && b <= 0xf4 ? 3 : -1;
    if (n < 0) return i;
    for (let k = 1; k <= n; k++) if (i + k >= bytes.length || (bytes[i + k] & 0xc0) !== 0x80) return i;
    i += n + 1;
  }
  return bytes.length;
}

// SHA-256 (FIPS 180-4) through node:crypto, the standard library's implementation.
import { createHash } from 'node:crypto';

/** Lower-case hex SHA-256 of text (as UTF-8) or bytes. */
export function sha256(data: string | Uint8Array): string {
  return createHash('sha256').update(data).digest('hex');
}

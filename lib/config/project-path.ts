// Project-relative paths: plain string checks (the CLI additionally resolves symlinks on disk).
import { posix, win32 } from 'node:path';
import * as msg from './messages.js';

/** Error message when a config path is absolute or climbs out of the project folder, else null. */
export function checkRelativePath(path: string): string | null {
  if (posix.isAbsolute(path) || win32.isAbsolute(path)) return msg.pathAbsolute(path);
  const normal = posix.normalize(path.replaceAll('\\', '/'));
  if (normal === '..' || normal.startsWith('../')) return msg.pathLeavesProject(path);
  return null;
}

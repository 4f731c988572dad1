// `basinquota diff VA VB [DIR]`: what changed between two archived versions, as text.
import { diffSnapshots, formatChanges, versionMessages as msg } from '../version/index.js';
import { archiveDir, ArchiveError, readArchive } from './archive.js';

/** Parse "v3", "V3" or "3"; null when it is not a version. */
export function parseVersionArgument(text: string): number | null {
  const m = /^v?([1-9]\d*)$/i.exec(text.trim());
  return m ? Number(m[1]) : null;
}

/**
 * Print the changes from version `va` to `vb` of the project in `projectDir` to `print` (stdout by default).
 * Exit code: 0 printed, 1 a corrupt archive, 2 a malformed or unknown version (the message lists the archived ones).
 */
export function diffCommand(projectDir: string, va: string, vb: string, log: (line: string) => void, print: (text: string) => void = (text) => process.stdout.write(text)): number {
  const wanted: number[] = [];
  for (const text of [va, vb]) {
    const version = parseVersionArgument(text);
    if (version === null) {
      log(msg.badVersionArgument(text));
      return 2;
    }
    wanted.push(version);
  }
  let archive;
  try {
    archive = readArchive(projectDir);
  } catch (error) {
    if (error instanceof ArchiveError) {
      log(error.message);
      return 1;
    }
    throw error;
  }
  const byNumber = new Map(archive.map((a) => [a.version, a]));
  for (const version of wanted) {
    if (!byNumber.has(version)) {
      log(msg.unknownVersion(version, archive.map((a) => a.version), archiveDir(projectDir)));
      return 2;
    }
  }
  print(formatChanges(diffSnapshots(byNumber.get(wanted[0])!.snapshot, byNumber.get(wanted[1])!.snapshot)));
  return 0;
}

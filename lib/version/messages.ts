// User-facing messages of the version stage and of the archive and diff commands that use it.

/** The Changes page and `diff` when there is no earlier version. */
export const firstVersion = (): string => 'This is the first version; there is nothing to compare with.';

/** A manifest.json or snapshot.json that cannot be read or parsed. */
export const corruptArchiveFile = (file: string, reason: string): string => `archived file ${file} is corrupt: ${reason}; restore it from version control or remove its version folder`;

/** A version argument that is not v1, 2, …. */
export const badVersionArgument = (text: string): string => `"${text}" is not a version; write it as v1 or 1`;

/** A version number that is not in the archive. */
export const unknownVersion = (version: number, archived: number[], archiveDir: string): string =>
  archived.length === 0
    ? `version ${version} is not archived: ${archiveDir} holds no versions yet (run basinquota build first)`
    : `version ${version} is not archived; archived versions: ${archived.map((v) => `v${v}`).join(', ')}`;

/** writeArchiveVersion asked to overwrite a version built from other inputs. */
export const archiveConflict = (dir: string): string => `${dir} already exists and was built from other inputs; a changed build must get a new version number`;

/** Wrong number of arguments to diff. */
export const diffUsage = (): string => 'usage: basinquota diff VA VB [DIR]   (versions as v1 or 1)';

/** A snapshot whose version disagrees with its folder. */
export const snapshotVersionMismatch = (folder: number, inFile: number): string => `it says version ${inFile} but lives in the folder of version ${folder}`;

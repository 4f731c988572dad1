// User-facing messages of the command line.

/** Top-level usage. */
export const usage = (): string => `basinquota — synthesis reports of ocean nutrient and phytoplankton metal-quota data

Usage:
  basinquota init DIR            write a new synthesis project with an example config
  basinquota check [DIR]         validate the config and every input; exit 1 on any error
  basinquota build [DIR] [--out DIR] [--config FILE]
                                 run the pipeline and write the report site
  basinquota serve [DIR] [--port N]
                                 build, serve on http://127.0.0.1:N (default 8080), rebuild on changes
  basinquota diff VA VB [DIR]    what changed between two archived versions (e.g. v1 v2)
  basinquota demo [--out DIR]    build the shipped demo's two versions (default into _site-demo)
  basinquota --help | COMMAND --help

Exit codes: 0 success, 1 invalid config or input (messages as file:line:col), 2 wrong usage, 3 internal or disk error.
`;

/** Help per command. */
export const commandHelp: Record<string, string> = {
  init: `basinquota init DIR
  Write a new synthesis project into DIR (which must be empty or absent): a commented basinquota.yaml
  and small example sample and cell files. Exit 0 on success, 2 if DIR is not empty.
`,
  check: `basinquota check [DIR] [--config FILE]
  Validate DIR/basinquota.yaml (or FILE) and read every input through the pipeline without writing anything.
  Every problem is printed as file:line:col message. Exit 1 on any error, 0 otherwise.
`,
  build: `basinquota build [DIR] [--out DIR] [--config FILE]
  Run the pipeline on the project in DIR (default .) and write the report site to --out (default DIR/_site).
  The site is written to a temporary folder and swapped in only when the build succeeds.
  Progress per stage goes to stderr. Exit 1 on invalid input, 3 on a disk error.
  The report version increases when the inputs, the config or the basinquota version changed since the
  latest version archived in DIR/archive/; an unchanged rebuild keeps the number and the bytes.
`,
  serve: `basinquota serve [DIR] [--port N] [--out DIR] [--config FILE]
  Build the project, serve the site on http://127.0.0.1:N/ (default 8080; localhost only, never another
  interface) and rebuild whenever the config or an input file changes. Stop with Ctrl-C.
`,
  diff: `basinquota diff VA VB [DIR]
  Print what changed between two archived versions of the project in DIR (default .): data added or
  removed, fit parameters that moved (and whether beyond their interval), regions flagged or cleared.
  Exit 0, 1 for a corrupt archive, 2 for an unknown version.
`,
  demo: `basinquota demo [--out DIR]
  Build the demo project shipped in data/demo as version 1 and then version 2 into DIR (default _site-demo).
`,
};

/** Unknown command. */
export const unknownCommand = (name: string): string => `unknown command "${name}"; run basinquota --help`;

/** init into a folder that has files. */
export const initNotEmpty = (dir: string): string => `${dir} is not empty; choose a new or empty folder`;

/** A config path that resolves (through a symlink) outside the project. */
export const symlinkLeaves = (path: string): string => `path "${path}" resolves outside the project folder (through a symbolic link)`;

/** An input file that does not exist. */
export const fileMissing = (path: string): string => `input file "${path}" does not exist`;

/** An output folder that cannot be written. */
export const cannotWrite = (dir: string, reason: string): string => `cannot write the site to ${dir}: ${reason}`;

/** Summary after check. */
export const checkSummary = (errors: number, warnings: number): string =>
  errors === 0 ? `check passed${warnings ? ` with ${warnings} warning${warnings === 1 ? '' : 's'}` : ''}` : `check failed: ${errors} error${errors === 1 ? '' : 's'}${warnings ? `, ${warnings} warning${warnings === 1 ? '' : 's'}` : ''}`;

/** A --port value that is not a port number. */
export const badPort = (value: string): string => `--port "${value}" is not a port number (0–65535)`;

/** A count of ledger rows that were kept but converted or flagged, printed by check. */
export const ledgerCount = (table: string, action: string, reason: string, count: number): string =>
  `note: ${count} ${table} row${count === 1 ? '' : 's'} ${action} (${reason}); see the ledger for each row`;

// Every user-facing message of the config stage, one named function each; tests assert the exact text.

/** YAML that does not parse. */
export const yamlSyntax = (detail: string): string => `YAML syntax error: ${detail}`;

/** The config file is empty or not a mapping. */
export const notAMapping = (): string => 'expected a mapping of settings (report, inputs, classes …) at the top level';

/** A key the schema does not know. */
export const unknownKey = (key: string, known: string[]): string =>
  `unknown key "${key}"${known.length ? ` (expected one of: ${known.join(', ')})` : ''}`;

/** A required key is absent. */
export const missingKey = (key: string): string => `missing required key "${key}"`;

/** A value of the wrong type. */
export const wrongType = (expected: string, got: string): string => `expected ${expected}, got ${got}`;

/** An input path that leaves the project folder. */
export const pathLeavesProject = (path: string): string => `path "${path}" leaves the project folder; inputs must lie inside it`;

/** An absolute input path. */
export const pathAbsolute = (path: string): string => `path "${path}" is absolute; write it relative to the project folder`;

/** A unit string the unit parser rejects. */
export const badUnit = (detail: string): string => detail;

/** A column map naming a canonical column basinquota does not know. */
export const unknownCanonicalColumn = (name: string, table: string): string =>
  `unknown ${table} column "${name}" (see the canonical names in the documentation)`;

/** The same alias declared by two classes. */
export const aliasTwice = (alias: string, first: string, second: string): string =>
  `class alias "${alias}" is declared by both "${first}" and "${second}"`;

/** A class with a biovolume-factor carbon method but no factor configured. */
export const factorMissing = (cls: string): string =>
  `class "${cls}" uses carbon "biovolume-factor" but carbon.factor_fg_per_um3 is not set`;

/** The config file itself could not be found. */
export const configNotFound = (path: string): string => `no basinquota.yaml in ${path}`;

/** A mapping key that breaks the naming rule of its section (class ids). */
export const badKey = (key: string, section: string): string =>
  `"${key}" is not a valid name under ${section}: use lower-case letters, digits, "_" or "-", starting with a letter (put other spellings in aliases)`;

/** The same input file listed twice. */
export const pathTwice = (path: string, first: string): string => `"${path}" is already listed as ${first}; each file is read once`;

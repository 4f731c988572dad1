import type { Config } from '../config/index.js';
import type { ColumnarText } from '../load/index.js';
import type { InputBytes } from '../types.js';

/** Everything a build reads, already in memory: the validated config and the bytes of every input file by config path. */
export interface ProjectInputs {
  /** Config file name relative to the project (messages). */
  configFile: string;
  /** Validated config. */
  config: Config;
  /** The config file's text as read (hashed into the version manifest). */
  configText: string;
  /** File bytes keyed by the path as written in the config. */
  files: Map<string, InputBytes>;
  /** Parquet/Arrow files decoded ahead of the (synchronous) pipeline by decodeColumnarInputs; keyed like `files`. */
  columnar?: Map<string, ColumnarText>;
}

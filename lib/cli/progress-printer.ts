// Stage progress on stderr: name, rows in → out, wall time.
import type { Progress } from '../pipeline/index.js';

/** A Progress sink that prints one line per finished stage to `write` (stderr by default). */
export function progressPrinter(write: (line: string) => void = (l) => process.stderr.write(`${l}\n`)): Progress {
  const started = new Map<string, number>();
  return {
    start(stage) {
      started.set(stage, performance.now());
    },
    end(stage, rowsIn, rowsOut) {
      const ms = performance.now() - (started.get(stage) ?? performance.now());
      write(`  ${stage.padEnd(10)} ${String(rowsIn).padStart(8)} rows in → ${String(rowsOut).padStart(8)} out  ${(ms / 1000).toFixed(2)} s`);
    },
  };
}

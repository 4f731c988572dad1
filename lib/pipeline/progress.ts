/** Receives stage boundaries so the shell can print progress and time them; the core never reads the clock. */
export interface Progress {
  /** A stage begins. */
  start(stage: string): void;
  /** A stage ends with the rows it took in and gave out. */
  end(stage: string, rowsIn: number, rowsOut: number): void;
}

/** A progress sink that does nothing (tests, library use). */
export const silentProgress: Progress = { start: () => undefined, end: () => undefined };

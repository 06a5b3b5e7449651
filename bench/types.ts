/**
 * One benchmark case: `run` is timed repeatedly (awaited when it returns a
 * promise); its return value is kept alive so work is not optimised away.
 * A case file exports `cases`, or an async `setup()` returning them, and an
 * optional async `teardown()`.
 */
export type BenchCase = {
  name: string;
  run: () => unknown;
  /** timed repetitions; default: as many as fit in about one second, at least 5 */
  iterations?: number;
  note?: string;
  /** time the first run too instead of discarding it as a warm-up (for cases that take minutes); default true */
  warmup?: boolean;
};

/** One benchmark case: `run` is timed repeatedly; its return value is kept alive so work is not optimised away. */
export type BenchCase = {
  name: string;
  run: () => unknown;
  /** timed repetitions; default: as many as fit in about one second, at least 5 */
  iterations?: number;
  note?: string;
};

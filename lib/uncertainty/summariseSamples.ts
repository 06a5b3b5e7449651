/**
 * Median and 5–95 % range of every output over the Monte Carlo samples
 * (quantile.ts, Hyndman & Fan definition 7), with the count of samples that
 * gave a value and of converged samples where the output was undefined.
 * Batches may arrive in any order; they are put in sample order first.
 */
import { quantile } from "./quantile";
import type { MonteCarloResult, OutputDef, SampleBatchResult, SampleFailure } from "./types";

export const SUMMARY_DEFAULTS = {
  /** failures listed in the result; the rest are counted */
  maxFailuresListed: 20,
  percentileMethod: "linear interpolation between order statistics (Hyndman & Fan 1996, definition 7)",
};

export interface SummaryInput {
  outputs: OutputDef[];
  central: (number | null)[];
  batches: SampleBatchResult[];
  samples: number;
  seed: number;
  varied: { id: string; factor: number }[];
  notVaried: string[];
  warnings?: string[];
  elapsed_ms: number;
}

export function summariseSamples(inp: SummaryInput): MonteCarloResult {
  const batches = [...inp.batches].sort((a, b) => a.start - b.start);
  const rows = batches.flatMap((b) => b.values);
  const failures: SampleFailure[] = batches.flatMap((b) => b.failures).sort((a, b) => a.index - b.index);
  const succeeded = rows.filter((r) => r !== null).length;
  const summaries = inp.outputs.map((o, i) => {
    const vals: number[] = [];
    let missing = 0;
    for (const r of rows) {
      if (r === null) continue;
      const v = r[i];
      if (v === null || !Number.isFinite(v)) missing++;
      else vals.push(v);
    }
    vals.sort((a, b) => a - b);
    const q = (p: number) => (vals.length > 0 ? quantile(vals, p) : null);
    return {
      key: o.key,
      central: inp.central[i],
      median: q(0.5),
      p05: q(0.05),
      p95: q(0.95),
      count: vals.length,
      missing,
    };
  });
  const warnings = [...(inp.warnings ?? [])];
  if (rows.length !== inp.samples) warnings.push(`${rows.length} of ${inp.samples} samples were run`);
  if (failures.length > 0)
    warnings.push(
      `${failures.length} of ${inp.samples} samples did not give a steady state; the ranges are over the ${succeeded} that did`,
    );
  return {
    samples: inp.samples,
    seed: inp.seed,
    succeeded,
    failed: failures.length,
    failures: failures.slice(0, SUMMARY_DEFAULTS.maxFailuresListed),
    outputs: inp.outputs,
    summaries,
    varied: inp.varied,
    notVaried: inp.notVaried,
    percentileMethod: SUMMARY_DEFAULTS.percentileMethod,
    warnings,
    elapsed_ms: inp.elapsed_ms,
  };
}

/**
 * Runs a planned sweep over an executor (the engine pool, or this thread).
 *
 * The levels are split into as many contiguous chunks as the executor has
 * workers; each chunk runs from its top level down, each level warm-started
 * from the one above, and the chunks run side by side. Levels are sent in
 * small batches so that progress and cancellation are per level. With O3
 * solved, the overhead O3 column is recomputed from the solved O3 after each
 * pass and the levels are solved again, each warm-started from its own
 * previous state, until no column changes by more than the tolerance
 * (a fixed-point iteration; the number of passes is reported).
 */
import { ozoneColumnAbove_cm2 } from "../atmosphere";
import { familyRank } from "../viz/familyOf";
import { solvedOzoneColumns } from "./ozoneColumns";
import type { SweepPlan } from "./planSweep";
import type { LevelBatch, LevelBatchResult } from "./runLevelBatch";
import { splitChunks } from "./splitChunks";
import type { SweepLevel, SweepResult } from "./types";

export const SWEEP_DEFAULTS = {
  /** levels per message to a worker; default 1 (progress and cancellation per level) */
  batchSize: 1,
  /** most passes when the O3 column is iterated; default 3 */
  maxColumnPasses: 3,
  /** largest relative change of any level's column that ends the iteration; default 0.01 */
  columnTolerance: 0.01,
};

/** Where level batches run. */
export interface SweepExecutor {
  /** how many batches can run at once */
  workers: number;
  run(batch: LevelBatch): Promise<LevelBatchResult>;
}

export interface SweepProgress {
  /** levels finished, over all passes so far */
  done: number;
  /** levels to run, over all passes planned so far */
  total: number;
  /** 1-based pass */
  pass: number;
}

export interface RunSweepOptions extends Partial<typeof SWEEP_DEFAULTS> {
  /** "auto": one chunk per worker; "sequential": one chain; default "auto" */
  parallel?: "auto" | "sequential";
  /** explicit number of chunks (benchmarks); overrides `parallel` */
  chunks?: number;
  onProgress?: (p: SweepProgress) => void;
  /** checked before each batch; a cancelled sweep rejects with the signal's reason */
  signal?: AbortSignal;
}

export interface SweepMeta {
  engineVersion: string;
  mechanism: { id: string; title: string };
  profile: SweepResult["profile"];
}

export async function runSweep(
  plan: SweepPlan,
  executor: SweepExecutor,
  meta: SweepMeta,
  options: RunSweepOptions = {},
): Promise<SweepResult> {
  const o = { ...SWEEP_DEFAULTS, ...options };
  const t0 = performance.now();
  const n = plan.tasks.length;
  const nChunks = options.chunks ?? (options.parallel === "sequential" ? 1 : executor.workers);
  // top-down order: index 0 is the highest level
  const order = plan.tasks.map((_, i) => n - 1 - i);
  const chunks = splitChunks(n, nChunks).map((c) => c.map((k) => order[k]));
  const maxPasses = plan.ozone === "solved" ? Math.max(1, o.maxColumnPasses) : 1;
  const warnings = [...plan.warnings];
  const progress: SweepProgress = { done: 0, total: n, pass: 1 };
  options.onProgress?.({ ...progress });

  let levels: SweepLevel[] = new Array(n);
  let states: (number[] | null)[] = new Array(n).fill(null);
  let Ms: (number | null)[] = new Array(n).fill(null);
  let columns: number[] | undefined;
  let density: number[] | undefined;
  let passes = 0;

  for (let pass = 1; pass <= maxPasses; pass++) {
    passes = pass;
    progress.pass = pass;
    const prevStates = states;
    const prevMs = Ms;
    const nextLevels: SweepLevel[] = new Array(n);
    const nextStates: (number[] | null)[] = new Array(n).fill(null);
    const nextMs: (number | null)[] = new Array(n).fill(null);
    await Promise.all(
      chunks.map(async (chunk) => {
        let state: number[] | null = null;
        let stateM: number | null = null;
        for (let s = 0; s < chunk.length; s += o.batchSize) {
          if (options.signal?.aborted) throw options.signal.reason ?? new Error("cancelled");
          const idx = chunk.slice(s, s + o.batchSize);
          const tasks = idx.map((i) => ({
            ...plan.tasks[i],
            ...(columns ? { o3ColumnAbove_cm2: columns[i] } : {}),
            ...(pass > 1 && prevStates[i]
              ? { initialState: prevStates[i] as number[], initialM_cm3: prevMs[i] ?? undefined }
              : {}),
          }));
          const out = await executor.run({ tasks, initialState: state, initialM_cm3: stateM });
          idx.forEach((i, k) => {
            nextLevels[i] = out.levels[k];
            nextStates[i] = out.states[k];
            nextMs[i] = out.M_cm3[k];
            if (out.states[k]) {
              state = out.states[k];
              stateM = out.M_cm3[k];
            }
          });
          progress.done += idx.length;
          options.onProgress?.({ ...progress });
        }
      }),
    );
    levels = nextLevels;
    states = nextStates;
    Ms = nextMs;
    if (plan.ozone !== "solved") break;
    const prevColumns = columns ?? plan.altitudes_km.map((z) => ozoneColumnAbove_cm2(z));
    const next = solvedOzoneColumns(levels, density);
    density = next.density_cm3;
    const change = Math.max(
      ...next.column_cm2.map((c, i) => Math.abs(c - prevColumns[i]) / Math.max(prevColumns[i], 1)),
    );
    if (change <= o.columnTolerance) break;
    if (pass === maxPasses) {
      warnings.push(
        `the overhead O3 column had not settled after ${pass} passes (largest change ${(change * 100).toFixed(1)} %); the last pass is shown`,
      );
      break;
    }
    columns = next.column_cm2;
    progress.total += n;
    options.onProgress?.({ ...progress });
  }

  const failed = levels.filter((l) => l.status !== "converged");
  if (failed.length) {
    warnings.push(
      `${failed.length} of ${n} levels did not converge: ${failed.map((l) => `${l.altitude_km} km (${l.status})`).join(", ")}`,
    );
  }
  const families = new Set<string>();
  for (const l of levels) for (const f of l.budget?.byFamily ?? []) families.add(f.family);
  return {
    engineVersion: meta.engineVersion,
    mechanism: meta.mechanism,
    profile: meta.profile,
    mode: plan.mode,
    ozone: plan.ozone,
    columnSource: plan.columnSource,
    levels,
    families: [...families].sort((a, b) => familyRank(a) - familyRank(b) || a.localeCompare(b)),
    timing: {
      wall_ms: performance.now() - t0,
      compute_ms: levels.reduce((s, l) => s + l.elapsed_ms, 0),
      chunks: chunks.length,
      passes,
    },
    warnings,
  };
}

/** An executor that runs batches in this thread (tests, benchmarks, one-worker comparisons). */
export function inlineExecutor(run: (batch: LevelBatch) => LevelBatchResult, workers = 1): SweepExecutor {
  return { workers, run: async (batch) => run(batch) };
}

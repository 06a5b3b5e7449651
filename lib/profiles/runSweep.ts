/**
 * Runs a planned sweep over an executor (the engine pool, or this thread).
 *
 * The levels run as warm-started chains, one per worker of the executor:
 * the profile is cut into contiguous segments, and each segment is worked by
 * two chains, one from its top down and one from its bottom up, each level
 * warm-started from the one its chain did before, until they meet (a single
 * chain runs from the top down). Levels are sent in
 * small batches so that progress and cancellation are per level. With O3
 * solved, each level's overhead O3 column is integrated from the freshest O3
 * of the levels above it (solved in this pass where the chain has reached
 * them, else from the previous pass, else the climatology): a Gauss–Seidel
 * fixed-point iteration, repeated with each level warm-started from its own
 * previous state until no column changes by more than the tolerance (the
 * number of passes is reported).
 */

import { familyRank } from "../analysis/familyOf";
import { climatologyMixingRatio, columnsAboveLevels, ozoneColumnAbove_cm2, standardAtmosphere } from "../atmosphere";
import type { SweepPlan } from "./planSweep";
import type { LevelBatch, LevelBatchResult } from "./runLevelBatch";
import { splitChunks } from "./splitChunks";
import { failedLevel } from "./summariseLevel";
import type { SweepLevel, SweepResult } from "./types";
import { airDensityOf_cm3 } from "./units";

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
  /** "parallel": one chain per worker; "sequential": one chain from the top down; "auto": parallel for the 24-hour mode only; default "auto" */
  parallel?: "auto" | "parallel" | "sequential";
  /** explicit number of warm-started chains run at once (tests, benchmarks); overrides `parallel` */
  chains?: number;
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
  // an option given as undefined keeps its default
  const o = { ...SWEEP_DEFAULTS, ...Object.fromEntries(Object.entries(options).filter(([, v]) => v !== undefined)) };
  const t0 = performance.now();
  const n = plan.tasks.length;
  const nChains = Math.max(
    1,
    Math.min(n, options.chains ?? (useParallel(options.parallel ?? "auto", plan.mode) ? executor.workers : 1)),
  );
  // each segment of neighbouring levels is worked from both ends by two chains that meet wherever
  // the cost puts them (the low levels cost far more than the high ones), so no worker idles; with O3
  // solved every chain runs top down, so that each level sees the O3 its chain solved above it
  const bothEnds = plan.ozone !== "solved";
  const segments = splitChunks(n, bothEnds ? Math.ceil(nChains / 2) : nChains).map((c) => ({
    lo: c[0],
    hi: c[c.length - 1],
  }));
  const chainPlan = segments.flatMap((seg, k) =>
    bothEnds && 2 * k + 1 < nChains
      ? [
          { seg, dir: -1 as const },
          { seg, dir: 1 as const },
        ]
      : [{ seg, dir: -1 as const }],
  );
  const maxPasses = plan.ozone === "solved" ? Math.max(1, o.maxColumnPasses) : 1;
  const warnings = [...plan.warnings];
  const progress: SweepProgress = { done: 0, total: n, pass: 1 };
  options.onProgress?.({ ...progress });

  let levels: SweepLevel[] = new Array(n);
  let states: (number[] | null)[] = new Array(n).fill(null);
  let Ms: (number | null)[] = new Array(n).fill(null);
  const solved = plan.ozone === "solved";
  const z = plan.altitudes_km;
  // O3 density by level (increasing altitude): the climatology's until a level has solved its own
  const density = solved ? z.map((zi, i) => climatologyO3_cm3(plan, i, zi)) : [];
  const columnAbove = (i: number) =>
    columnsAboveLevels(z, density, { columnAboveTop_cm2: ozoneColumnAbove_cm2(z[n - 1]) })[i];
  const used: number[] = new Array(n).fill(0);
  let passes = 0;

  for (let pass = 1; pass <= maxPasses; pass++) {
    passes = pass;
    progress.pass = pass;
    const prevStates = states;
    const prevMs = Ms;
    const nextLevels: SweepLevel[] = new Array(n);
    const nextStates: (number[] | null)[] = new Array(n).fill(null);
    const nextMs: (number | null)[] = new Array(n).fill(null);
    const cursors = segments.map((seg) => ({ lo: seg.lo, hi: seg.hi }));
    await Promise.all(
      chainPlan.map(async ({ seg, dir }) => {
        const cur = cursors[segments.indexOf(seg)];
        let state: number[] | null = null;
        let stateM: number | null = null;
        while (cur.lo <= cur.hi) {
          if (options.signal?.aborted) throw options.signal.reason ?? new Error("cancelled");
          const idx: number[] = [];
          while (idx.length < o.batchSize && cur.lo <= cur.hi) idx.push(dir < 0 ? cur.hi-- : cur.lo++);
          // solved O3: the column from the freshest O3 of the levels above (this pass where already solved)
          if (solved) for (const i of idx) used[i] = columnAbove(i);
          const tasks = idx.map((i) => ({
            ...plan.tasks[i],
            ...(solved ? { o3ColumnAbove_cm2: used[i] } : {}),
            ...(pass > 1 && prevStates[i]
              ? { initialState: prevStates[i] as number[], initialM_cm3: prevMs[i] ?? undefined }
              : {}),
          }));
          let out: LevelBatchResult;
          try {
            out = await executor.run({ tasks, initialState: state, initialM_cm3: stateM });
          } catch (e) {
            // a batch the executor could not run (time limit, worker failure) fails its levels only
            if (options.signal?.aborted) throw options.signal.reason ?? e;
            out = {
              levels: tasks.map((t) => failedLevel(t.request, e)),
              states: tasks.map(() => null),
              M_cm3: tasks.map(() => null),
            };
          }
          idx.forEach((i, k) => {
            nextLevels[i] = out.levels[k];
            nextStates[i] = out.states[k];
            nextMs[i] = out.M_cm3[k];
            const o3 = solved ? solvedO3(out.levels[k]) : undefined;
            if (o3 !== undefined) density[i] = o3;
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
    if (!solved) break;
    const settled = z.map((_, i) => columnAbove(i));
    const change = Math.max(...settled.map((c, i) => Math.abs(c - used[i]) / Math.max(used[i], 1)));
    if (change <= o.columnTolerance) break;
    if (pass === maxPasses) {
      warnings.push(
        `the overhead O3 column had not settled after ${pass} passes (largest change ${(change * 100).toFixed(1)} %); the last pass is shown`,
      );
      break;
    }
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
      chains: chainPlan.length,
      passes,
    },
    warnings,
  };
}

/**
 * Whether to run chains side by side. Measured on the 2-core machine (51
 * levels, reference mechanism, medians): instantaneous 0.7 s either way, the
 * parallel one using twice the CPU; 24-hour 47 s on two chains against 104 s
 * on one. So "auto" runs the 24-hour mode in parallel and the instantaneous
 * mode as one chain.
 */
export function useParallel(parallel: "auto" | "parallel" | "sequential", mode: "instantaneous" | "diurnal"): boolean {
  return parallel === "parallel" || (parallel === "auto" && mode === "diurnal");
}

/** An executor that runs batches in this thread (tests, benchmarks, one-worker comparisons). */
export function inlineExecutor(run: (batch: LevelBatch) => LevelBatchResult, workers = 1): SweepExecutor {
  return { workers, run: async (batch) => run(batch) };
}

function solvedO3(l: SweepLevel): number | undefined {
  if (l.status !== "converged") return undefined;
  const v = l.species.find((s) => s.id === "O3")?.numberDensity_cm3;
  return v !== undefined && Number.isFinite(v) && v >= 0 ? v : undefined;
}

function climatologyO3_cm3(plan: SweepPlan, i: number, z_km: number): number {
  const c = plan.tasks[i].request.condition;
  const M =
    c.T_K !== undefined && c.p_hPa !== undefined ? airDensityOf_cm3(c.p_hPa, c.T_K) : standardAtmosphere(z_km).M_cm3;
  return climatologyMixingRatio("O3", z_km) * M;
}

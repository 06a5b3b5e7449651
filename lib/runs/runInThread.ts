/**
 * A whole run in the calling thread, segment after segment (tests, the
 * benchmark and the engine's task of one segment use the same pieces; the
 * service sends segments to the engine pool so that a run can be cancelled
 * between them).
 */
import type { CompiledMechanism } from "../mechanism/types";
import { assembleRun } from "./assembleRun";
import { integrateDays } from "./integrateDays";
import type { JCache, RunPlan, RunResult, RunSegment } from "./types";

export const RUN_IN_THREAD_DEFAULTS = {
  /** days per segment */
  segmentDays: 5,
};

export function runInThread(
  mech: CompiledMechanism,
  mechanism: { id: string; title: string },
  plan: RunPlan,
  extra: { title?: string; warnings?: string[]; engineVersion?: string } = {},
): RunResult {
  const t0 = performance.now();
  const segments: RunSegment[] = [];
  let state = plan.initial_cm3;
  let jCache: JCache = {};
  for (let d = 0; d < plan.days; d += RUN_IN_THREAD_DEFAULTS.segmentDays) {
    const dayCount = Math.min(RUN_IN_THREAD_DEFAULTS.segmentDays, plan.days - d);
    const seg = integrateDays(mech, plan, { firstDay: d, dayCount, state_cm3: state, jCache });
    segments.push(seg);
    if (seg.status !== "ok") break;
    state = seg.final_cm3;
    jCache = seg.jCache;
  }
  return assembleRun(mech, plan, segments, {
    engineVersion: extra.engineVersion ?? "",
    mechanism,
    title: extra.title ?? "",
    warnings: extra.warnings ?? [],
    elapsed_ms: performance.now() - t0,
  });
}

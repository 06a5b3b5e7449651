/**
 * A run's result from its segments (consecutive spans of days, each
 * integrated from the end of the one before): the hours and days joined, the
 * first failure ending the run with what was done before it.
 */
import type { CompiledMechanism } from "../mechanism/types";
import { poolTotalsOf } from "./dayBudget";
import { emptyHours } from "./integrateDays";
import type { RunPlan, RunResult, RunSegment } from "./types";

export interface RunMeta {
  engineVersion: string;
  mechanism: { id: string; title: string };
  title: string;
  warnings: string[];
  elapsed_ms: number;
}

export function assembleRun(mech: CompiledMechanism, plan: RunPlan, segments: RunSegment[], meta: RunMeta): RunResult {
  const hours = emptyHours();
  const daily: RunResult["daily"] = [];
  const warnings = [...meta.warnings];
  let status: RunResult["status"] = "ok";
  let message = `${plan.days} day${plan.days === 1 ? "" : "s"} integrated`;
  let failedAt_h: number | undefined;
  for (const s of segments) {
    for (const key of Object.keys(hours) as (keyof RunResult["hours"])[])
      (hours[key] as unknown[]).push(...s.hours[key]);
    daily.push(...s.days);
    for (const d of s.days) for (const w of d.warnings) if (!warnings.includes(w)) warnings.push(w);
    if (s.status !== "ok") {
      status = s.status;
      message = s.message;
      failedAt_h = s.failedAt_h;
      break;
    }
  }
  return {
    engineVersion: meta.engineVersion,
    mechanism: meta.mechanism,
    title: meta.title,
    kind: plan.trajectory ? "trajectory" : "place",
    days: plan.days,
    status,
    message,
    ...(failedAt_h !== undefined ? { failedAt_h } : {}),
    species: mech.species.map((s) => s.id),
    reactions: mech.reactions.map((r) => ({ id: r.id, equation: r.equation })),
    hours,
    daily,
    initialPoolTotals_cm3: poolTotalsOf(mech, plan.initial_cm3),
    options: plan.options,
    warnings,
    elapsed_ms: meta.elapsed_ms,
  };
}

/**
 * Everything a sweep needs before its levels run, and the run itself over an
 * executor: the profile the request names, the plan of levels, and a check
 * of the request-wide overrides (held, poolTotals, J) once rather than at
 * every level. Shared by the service's sweep jobs and the command line, so
 * both run the same sweep for the same request.
 */
import type { DemoProfile } from "../atmosphere/types";
import { compileSource, type MechanismSource } from "../engine/mechanismSource";
import { resolveCondition } from "../engine/resolveCondition";
import { ENGINE_VERSION } from "../engine/version";
import { InputError } from "../errors";
import { resolveProfileSpec } from "./builtinProfiles";
import { planSweep, type SweepPlan } from "./planSweep";
import { type RunSweepOptions, runSweep, type SweepExecutor } from "./runSweep";
import type { Profile, SweepRequest, SweepResult } from "./types";

export interface PreparedSweep {
  request: SweepRequest;
  src: MechanismSource;
  profile: Profile;
  plan: SweepPlan;
}

/** `e` with its path under `prefix` (e.g. "a"); other errors unchanged. */
function under(prefix: string, e: unknown): unknown {
  if (!(e instanceof InputError) || !prefix) return e;
  const p = e.path ?? "";
  return new InputError(`${prefix}.${p}`, e.message.slice(p.length + 2));
}

/** Checks a sweep against its mechanism and profile; InputErrors carry `path` as a prefix (e.g. "a"). */
export function prepareSweep(
  request: SweepRequest,
  src: MechanismSource,
  demos: readonly DemoProfile[],
  path = "",
): PreparedSweep {
  const mech = compileSource(src);
  const profile = resolveProfileSpec(request.profile, demos, path ? `${path}.profile` : "profile");
  let plan: SweepPlan;
  try {
    plan = planSweep(request, profile, mech);
  } catch (e) {
    throw under(path, e);
  }
  try {
    resolveCondition(mech, plan.tasks[0].request.condition);
  } catch (e) {
    throw under(path, e);
  }
  return { request, src, profile, plan };
}

/** Runs a prepared sweep's levels over `executor` with the request's options. */
export function runPreparedSweep(
  p: PreparedSweep,
  executor: SweepExecutor,
  run: Pick<RunSweepOptions, "signal" | "onProgress"> = {},
): Promise<SweepResult> {
  const { id, title, source, demo, note } = p.profile;
  return runSweep(
    p.plan,
    executor,
    {
      engineVersion: ENGINE_VERSION,
      mechanism: { id: p.src.id, title: p.src.title },
      profile: { id, title, source, demo, note },
    },
    {
      parallel: p.request.options?.parallel,
      maxColumnPasses: p.request.options?.maxColumnPasses,
      columnTolerance: p.request.options?.columnTolerance,
      ...run,
    },
  );
}

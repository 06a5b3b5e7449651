/**
 * Two sweeps side by side: at every altitude both have, the Ox loss rate and
 * its split by family for A and B, the difference B − A, and the cycles
 * whose change explains most of it (largest |Δ| first; a cycle missing on
 * one side counts as 0 there; cycles are matched by their steps written as
 * equations, so that the same cycle matches under two mechanisms whose
 * reaction ids differ).
 * Rates in molecules cm⁻³ s⁻¹.
 */

import { familyRank } from "../analysis/familyOf";
import { InputError } from "../errors";
import { idRecord } from "../idRecord";
import type {
  ComparisonLevel,
  ComparisonResult,
  ComparisonSideLevel,
  CycleChange,
  SweepLevel,
  SweepResult,
} from "./types";

export const COMPARE_DEFAULTS = {
  /** cycles listed per altitude; default 5 */
  topCycles: 5,
  /** altitudes closer than this are the same level, km */
  altitudeTolerance_km: 1e-6,
};

export interface CompareOptions extends Partial<typeof COMPARE_DEFAULTS> {
  labels?: { a?: string; b?: string };
  sweepIds?: { a: string; b: string };
  engineVersion?: string;
}

function side(l: SweepLevel): ComparisonSideLevel {
  const oxLoss_cm3s = idRecord<number>();
  const fraction = idRecord<number>();
  for (const f of l.budget?.byFamily ?? []) {
    oxLoss_cm3s[f.family] = f.oxLoss_cm3s;
    fraction[f.family] = f.fraction;
  }
  return {
    status: l.status,
    message: l.message,
    loss_cm3s: l.budget ? l.budget.loss_cm3s : null,
    oxLoss_cm3s,
    fraction,
  };
}

export function explainDifference(a: SweepLevel, b: SweepLevel, total_cm3s: number, top: number): CycleChange[] {
  const byKey = new Map<string, CycleChange>();
  // stored sweeps from before stepsKey existed match by id
  const keyOf = (c: SweepLevel["cycles"][number]) => c.stepsKey || c.id;
  const entry = (c: SweepLevel["cycles"][number]): CycleChange => {
    const k = keyOf(c);
    let e = byKey.get(k);
    if (!e) {
      e = {
        cycleId: c.id,
        family: c.family,
        netEquation: c.netEquation,
        a_cm3s: 0,
        b_cm3s: 0,
        delta_cm3s: 0,
        shareOfDifference: null,
      };
      byKey.set(k, e);
    }
    return e;
  };
  for (const c of a.cycles) entry(c).a_cm3s += c.oxLoss_cm3s;
  for (const c of b.cycles) entry(c).b_cm3s += c.oxLoss_cm3s;
  const all = [...byKey.values()].map((c) => {
    const delta = c.b_cm3s - c.a_cm3s;
    return { ...c, delta_cm3s: delta, shareOfDifference: total_cm3s !== 0 ? delta / total_cm3s : null };
  });
  return all
    .filter((c) => c.delta_cm3s !== 0)
    .sort((x, y) => Math.abs(y.delta_cm3s) - Math.abs(x.delta_cm3s) || x.cycleId.localeCompare(y.cycleId))
    .slice(0, top);
}

export function compareSweeps(a: SweepResult, b: SweepResult, options: CompareOptions = {}): ComparisonResult {
  const o = { ...COMPARE_DEFAULTS, ...definedOnly(options) };
  if (!(Number.isInteger(o.topCycles) && o.topCycles >= 1 && o.topCycles <= 50)) {
    throw new InputError("topCycles", `expected a whole number from 1 to 50, got ${o.topCycles}`);
  }
  const levels: ComparisonLevel[] = [];
  for (const la of a.levels) {
    const lb = b.levels.find((x) => Math.abs(x.altitude_km - la.altitude_km) <= o.altitudeTolerance_km);
    if (!lb) continue;
    const sa = side(la);
    const sb = side(lb);
    let difference: ComparisonLevel["difference"] = null;
    if (la.budget && lb.budget) {
      const families = new Set([...Object.keys(sa.oxLoss_cm3s), ...Object.keys(sb.oxLoss_cm3s)]);
      const dLoss = idRecord<number>();
      const dFrac = idRecord<number>();
      for (const f of families) {
        dLoss[f] = (sb.oxLoss_cm3s[f] ?? 0) - (sa.oxLoss_cm3s[f] ?? 0);
        dFrac[f] = (sb.fraction[f] ?? 0) - (sa.fraction[f] ?? 0);
      }
      const total = lb.budget.loss_cm3s - la.budget.loss_cm3s;
      const explaining = explainDifference(la, lb, total, o.topCycles);
      difference = {
        loss_cm3s: total,
        relative: la.budget.loss_cm3s !== 0 ? total / la.budget.loss_cm3s : null,
        oxLoss_cm3s: dLoss,
        fraction: dFrac,
        explaining,
        explainedFraction: total !== 0 ? explaining.reduce((s, c) => s + c.delta_cm3s, 0) / total : null,
      };
    }
    levels.push({ altitude_km: la.altitude_km, a: sa, b: sb, difference });
  }
  if (levels.length === 0) {
    const range = (s: SweepResult) =>
      s.levels.length ? `${s.levels[0].altitude_km}–${s.levels[s.levels.length - 1].altitude_km} km` : "no levels";
    throw new InputError(
      "b",
      `the two sweeps share no altitude (A: ${range(a)}, B: ${range(b)}); run them on the same grid`,
    );
  }
  const warnings: string[] = [];
  if (levels.length < Math.max(a.levels.length, b.levels.length)) {
    warnings.push(`only the ${levels.length} altitudes both sweeps have are compared`);
  }
  const failed = levels.filter((l) => !l.difference).map((l) => `${l.altitude_km} km`);
  if (failed.length) warnings.push(`no difference where a side failed: ${failed.join(", ")}`);
  const families = [...new Set([...a.families, ...b.families])].sort(
    (x, y) => familyRank(x) - familyRank(y) || x.localeCompare(y),
  );
  const meta = (s: SweepResult, id: string) => ({
    sweepId: id,
    mechanism: s.mechanism,
    profile: s.profile,
    mode: s.mode,
  });
  return {
    engineVersion: o.engineVersion ?? a.engineVersion,
    labels: { a: o.labels?.a || "A", b: o.labels?.b || "B" },
    a: meta(a, o.sweepIds?.a ?? ""),
    b: meta(b, o.sweepIds?.b ?? ""),
    families,
    levels,
    warnings,
  };
}

/** The options that are set: an `undefined` must not override a default. */
function definedOnly<T extends object>(o: T): Partial<T> {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as Partial<T>;
}

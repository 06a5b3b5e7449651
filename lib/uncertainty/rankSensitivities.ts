/**
 * The parameters that matter most for one output: the coefficients of that
 * output's row sorted by |S|, largest first, zeros and undefined left out.
 * `against altitude`: the same ranking for every level of a profile, with
 * the union of each level's top parameters so one table covers the profile.
 */
import { InputError } from "../errors";
import type { RankedSensitivity, SensitivityReport } from "./types";

export const RANK_DEFAULTS = {
  /** rows kept; default 10 */
  top: 10,
  /** |S| below this is left out; default 1e-6 */
  minAbs: 1e-6,
};

export interface RankOptions {
  /** rows kept; default 10 */
  top?: number;
  /** smallest |S| shown; default 1e-6 */
  minAbs?: number;
  /** photolysis channels instead of (or besides) their reactions: "reactions" (default), "channels", "both" */
  photolysis?: "reactions" | "channels" | "both";
}

export function rankSensitivities(
  report: SensitivityReport,
  outputKey: string,
  options: RankOptions = {},
): RankedSensitivity[] {
  const i = report.outputs.findIndex((o) => o.key === outputKey);
  if (i < 0)
    throw new InputError(
      "outputKey",
      `unknown output ${outputKey} (known: ${report.outputs.map((o) => o.key).join(", ")})`,
    );
  const top = options.top ?? RANK_DEFAULTS.top;
  const minAbs = options.minAbs ?? RANK_DEFAULTS.minAbs;
  const photolysis = options.photolysis ?? "reactions";
  const rows = report.parameters
    .map((p, q) => ({ p, s: report.coefficients[i][q] }))
    .filter(({ p, s }) => {
      if (s === null || !(Math.abs(s) >= minAbs)) return false;
      if (p.kind === "photolysis-channel") return photolysis !== "reactions";
      return (
        photolysis !== "channels" ||
        p.reactions.length !== 1 ||
        !report.parameters.some((c) => c.kind === "photolysis-channel" && c.reactions.includes(p.reactions[0]))
      );
    })
    .sort((a, b) => Math.abs(b.s as number) - Math.abs(a.s as number))
    .slice(0, top);
  return rows.map(({ p, s }, r) => ({ parameter: p.id, label: p.label, coefficient: s as number, rank: r + 1 }));
}

/** One output's coefficients at every level for the parameters in any level's top list (null where a level has none). */
export function rankAgainstAltitude(
  levels: { altitude_km: number; report: SensitivityReport | null }[],
  outputKey: string,
  options: RankOptions = {},
): { parameters: { id: string; label: string }[]; altitude_km: number[]; coefficients: (number | null)[][] } {
  const chosen = new Map<string, string>();
  for (const l of levels) {
    if (l.report?.status !== "ok" || !l.report.outputs.some((o) => o.key === outputKey)) continue;
    for (const row of rankSensitivities(l.report, outputKey, options)) chosen.set(row.parameter, row.label);
  }
  const parameters = [...chosen].map(([id, label]) => ({ id, label }));
  const coefficients = parameters.map(({ id }) =>
    levels.map((l) => {
      const rep = l.report;
      if (rep?.status !== "ok") return null;
      const i = rep.outputs.findIndex((o) => o.key === outputKey);
      const q = rep.parameters.findIndex((p) => p.id === id);
      return i < 0 || q < 0 ? null : rep.coefficients[i][q];
    }),
  );
  return { parameters, altitude_km: levels.map((l) => l.altitude_km), coefficients };
}

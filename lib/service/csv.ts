/**
 * CSV exports of an analysis, with units in the headers (RFC 4180 quoting),
 * each after its provenance block (lib/service/csvProvenance.ts).
 */
import { csvTable as toCsv } from "../csv";
import type { AnalysisResult } from "../engine/types";
import { monteCarloCsv, sensitivityCsv } from "../uncertainty";
import { getAnalysisRecord } from "./analyses";
import { type CsvExportOptions, conditionEntries, csvExport, csvMechanism } from "./csvProvenance";

export { toCsv };

export function ratesCsv(r: AnalysisResult): string {
  const ox = new Map(r.cycles.perReaction.map((p) => [p.reactionId, p]));
  return toCsv(
    [
      "reaction_id",
      "equation",
      "k (cm3 molecule-1 s-1 for bimolecular; s-1 for photolysis and first order)",
      "rate (molecules cm-3 s-1)",
      "ox_destroyed_via_cycles (molecules cm-3 s-1)",
      "net_ox_change (molecules cm-3 s-1)",
    ],
    r.steadyState.reactions.map((x) => [
      x.id,
      x.equation,
      x.k,
      x.rate_cm3s,
      ox.get(x.id)?.oxDestroyed_cm3s ?? 0,
      ox.get(x.id)?.netOxChange_cm3s ?? 0,
    ]),
  );
}

export function speciesCsv(r: AnalysisResult): string {
  return toCsv(
    [
      "species",
      "role",
      "number_density (molecules cm-3)",
      "mixing_ratio (mol/mol)",
      "production (molecules cm-3 s-1)",
      "loss (molecules cm-3 s-1)",
      "lifetime (s)",
    ],
    r.steadyState.species.map((s) => [
      s.id,
      s.role,
      s.numberDensity_cm3,
      s.mixingRatio,
      s.production_cm3s,
      s.loss_cm3s,
      s.lifetime_s,
    ]),
  );
}

export function cyclesCsv(r: AnalysisResult): string {
  return toCsv(
    [
      "cycle_id",
      "family",
      "net_reaction",
      "steps",
      "rate (molecules cm-3 s-1)",
      "ox_per_turnover",
      "ox_loss (molecules cm-3 s-1)",
      "share (fraction of total Ox loss)",
      "efficiency (fraction)",
      "rate_limiting_step",
      "chain_length (turnovers)",
      "chain_length_rate_limiting (turnovers)",
    ],
    r.cycles.cycles.map((c) => [
      c.id,
      c.family,
      c.netEquation,
      c.steps.map((s) => (s.multiplicity > 1 ? `${s.multiplicity}×(${s.equation})` : s.equation)).join(" ; "),
      c.rate_cm3s,
      c.oxPerTurnover,
      c.oxLoss_cm3s,
      c.share,
      c.efficiency,
      c.rateLimitingStep,
      c.chainLength,
      c.chainLengthRateLimiting,
    ]),
  );
}

/** Monte Carlo medians and 5–95 % ranges (lib/uncertainty); a comment line only when the analysis has none. */
export function uncertaintyCsv(r: AnalysisResult): string {
  const mc = r.uncertainty?.monteCarlo;
  return mc ? monteCarloCsv(mc) : "# no Monte Carlo ranges: request options.uncertaintySamples > 0\n";
}

/** Sensitivity coefficients in long form (lib/uncertainty); a comment line only when the analysis has none. */
export function sensitivitiesCsv(r: AnalysisResult): string {
  const s = r.uncertainty?.sensitivity;
  return s ? sensitivityCsv(s) : "# no sensitivities: request options.sensitivity = true\n";
}

const ANALYSIS_EXPORTS = {
  "rates.csv": [ratesCsv, "rates.csv: every reaction's rate constant, rate and odd-oxygen effect at the steady state"],
  "species.csv": [speciesCsv, "species.csv: every species' amount, production, loss and lifetime at the steady state"],
  "cycles.csv": [cyclesCsv, "cycles.csv: the catalytic cycles with rate, share of the Ox loss and chain length"],
  "uncertainty.csv": [uncertaintyCsv, "uncertainty.csv: Monte Carlo medians and 5–95 % ranges of the outputs"],
  "sensitivities.csv": [sensitivitiesCsv, "sensitivities.csv: normalised sensitivities d ln(output) / d ln(k)"],
} as const;

/** A CSV export of a stored analysis with its provenance block; null for an unknown file. */
export async function analysisExport(
  id: string,
  file: string,
  o: CsvExportOptions,
): Promise<{ csv: string; filename: string } | null> {
  const entry = ANALYSIS_EXPORTS[file as keyof typeof ANALYSIS_EXPORTS];
  if (!entry) return null;
  const [make, table] = entry;
  const record = await getAnalysisRecord(id);
  const r = record.result;
  const csv = csvExport(
    make(r),
    {
      table,
      mechanisms: [await csvMechanism(r.mechanism)],
      condition: conditionEntries(r.condition),
      engineVersion: r.engineVersion,
      computedAt: record.createdAt,
      permalink: `/a/${id}`,
      record: `/api/analyses/${id}`,
    },
    o,
  );
  return { csv, filename: `analysis-${id}-${file}` };
}

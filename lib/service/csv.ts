/**
 * The CSV tables of an analysis, with units in the headers (RFC 4180
 * quoting); lib/service/analysisExports.ts sends them after their
 * provenance block.
 */
import { type CsvCommentEntry, csvTable as toCsv } from "../csv";
import type { AnalysisResult } from "../engine/types";
import { monteCarloCsv, monteCarloNotes, sensitivityCsv, sensitivityNotes } from "../uncertainty";

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

/** Monte Carlo medians and 5–95 % ranges (lib/uncertainty); "" when the analysis has none (see uncertaintyNotes). */
export function uncertaintyCsv(r: AnalysisResult): string {
  const mc = r.uncertainty?.monteCarlo;
  return mc ? monteCarloCsv(mc) : "";
}

/** What uncertaintyCsv was computed with, or why it is empty, for the provenance block. */
export function uncertaintyNotes(r: AnalysisResult): CsvCommentEntry[] {
  const mc = r.uncertainty?.monteCarlo;
  return mc ? monteCarloNotes(mc) : [["note", "no Monte Carlo ranges: request options.uncertaintySamples > 0"]];
}

/** Sensitivity coefficients in long form (lib/uncertainty); "" when the analysis has none (see sensitivitiesNotes). */
export function sensitivitiesCsv(r: AnalysisResult): string {
  const s = r.uncertainty?.sensitivity;
  return s ? sensitivityCsv(s) : "";
}

/** The method behind sensitivitiesCsv, or why it is empty, for the provenance block. */
export function sensitivitiesNotes(r: AnalysisResult): CsvCommentEntry[] {
  const s = r.uncertainty?.sensitivity;
  return s ? sensitivityNotes(s) : [["note", "no sensitivities: request options.sensitivity = true"]];
}

/** One CSV table of an analysis: the table, its one-line description, and entries of its own for the provenance block. */
export interface AnalysisCsvTable {
  make: (r: AnalysisResult) => string;
  table: string;
  notes: (r: AnalysisResult) => CsvCommentEntry[];
}

const none = (): CsvCommentEntry[] => [];

/** The CSV tables of an analysis by file name, as the routes and the command line serve them. */
export const ANALYSIS_CSV_TABLES: Record<string, AnalysisCsvTable> = {
  "rates.csv": {
    make: ratesCsv,
    table: "rates.csv: every reaction's rate constant, rate and odd-oxygen effect at the steady state",
    notes: none,
  },
  "species.csv": {
    make: speciesCsv,
    table: "species.csv: every species' amount, production, loss and lifetime at the steady state",
    notes: none,
  },
  "cycles.csv": {
    make: cyclesCsv,
    table: "cycles.csv: the catalytic cycles with rate, share of the Ox loss and chain length",
    notes: none,
  },
  "uncertainty.csv": {
    make: uncertaintyCsv,
    table: "uncertainty.csv: Monte Carlo medians and 5–95 % ranges of the outputs",
    notes: uncertaintyNotes,
  },
  "sensitivities.csv": {
    make: sensitivitiesCsv,
    table: "sensitivities.csv: normalised sensitivities d ln(output) / d ln(k)",
    notes: sensitivitiesNotes,
  },
};

/**
 * CSV exports of an analysis's uncertainty results: the Monte Carlo summary
 * (one row per output) and the sensitivity matrix in long form (one row per
 * output and parameter with a nonzero coefficient), written by lib/csv
 * (RFC 4180, CRLF, shortest round-trip numbers; empty cell = undefined).
 * What the tables were computed with (samples, seed, method) are comment
 * entries for the export's provenance block (lib/service/csvProvenance.ts).
 */
import { type CsvCommentEntry, csvTable } from "../csv";
import type { MonteCarloResult, SensitivityReport } from "./types";

export function monteCarloCsv(mc: MonteCarloResult): string {
  return csvTable(
    ["key", "kind", "label", "unit", "central", "median", "p05", "p95", "count", "missing"],
    mc.outputs.map((o, i) => {
      const s = mc.summaries[i];
      return [o.key, o.kind, o.label, o.unit, s.central, s.median, s.p05, s.p95, s.count, s.missing];
    }),
  );
}

/** The Monte Carlo settings behind monteCarloCsv, as `# key: value` entries. */
export function monteCarloNotes(mc: MonteCarloResult): CsvCommentEntry[] {
  return [
    ["monte-carlo", `${mc.samples} samples, seed ${mc.seed}, ${mc.succeeded} converged, ${mc.failed} failed`],
    ["percentiles", mc.percentileMethod],
  ];
}

export function sensitivityCsv(rep: SensitivityReport): string {
  const rows: unknown[][] = [];
  rep.outputs.forEach((o, i) => {
    rep.parameters.forEach((p, q) => {
      const s = rep.coefficients[i][q];
      if (s !== 0) rows.push([o.key, o.label, p.id, p.kind, p.label, s]);
    });
  });
  return csvTable(["output", "output_label", "parameter", "parameter_kind", "parameter_label", "coefficient"], rows);
}

/** The method behind sensitivityCsv, as `# key: value` entries. */
export function sensitivityNotes(rep: SensitivityReport): CsvCommentEntry[] {
  return [
    ["coefficients", "d ln(output) / d ln(k)"],
    ["sensitivity-status", rep.status],
    ["cycle-outputs", rep.cycleMethod],
  ];
}

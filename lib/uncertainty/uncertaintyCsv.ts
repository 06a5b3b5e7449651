/**
 * CSV exports (RFC 4180 quoting) of an analysis's uncertainty results: the
 * Monte Carlo summary (one row per output) and the sensitivity matrix in
 * long form (one row per output and parameter with a nonzero coefficient).
 * Numbers in JavaScript's shortest round-trip form; empty cell = undefined.
 */
import type { MonteCarloResult, SensitivityReport } from "./types";

const cell = (v: string | number | null | undefined): string => {
  if (v === null || v === undefined) return "";
  const s = String(v);
  return /[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
};
const line = (cells: (string | number | null | undefined)[]) => cells.map(cell).join(",");

export function monteCarloCsv(mc: MonteCarloResult): string {
  const rows = [
    `# Monte Carlo: ${mc.samples} samples, seed ${mc.seed}, ${mc.succeeded} converged, ${mc.failed} failed; percentiles: ${mc.percentileMethod}`,
    line(["key", "kind", "label", "unit", "central", "median", "p05", "p95", "count", "missing"]),
  ];
  mc.outputs.forEach((o, i) => {
    const s = mc.summaries[i];
    rows.push(line([o.key, o.kind, o.label, o.unit, s.central, s.median, s.p05, s.p95, s.count, s.missing]));
  });
  return `${rows.join("\n")}\n`;
}

export function sensitivityCsv(rep: SensitivityReport): string {
  const rows = [
    `# sensitivity coefficients d ln(output)/d ln(k); status ${rep.status}; cycle outputs: ${rep.cycleMethod}`,
    line(["output", "output_label", "parameter", "parameter_kind", "parameter_label", "coefficient"]),
  ];
  rep.outputs.forEach((o, i) => {
    rep.parameters.forEach((p, q) => {
      const s = rep.coefficients[i][q];
      if (s === 0) return;
      rows.push(line([o.key, o.label, p.id, p.kind, p.label, s]));
    });
  });
  return `${rows.join("\n")}\n`;
}

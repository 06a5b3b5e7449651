/**
 * The short human summary of one analysis: the condition, the solver's
 * status, the odd-oxygen budget by family and the top cycles with their
 * rate-limiting step and chain length. Plain text, one fact per line.
 */
import type { AnalysisResult } from "../engine/types";

export const SUMMARY_DEFAULTS = {
  /** cycles listed; default 5 */
  topCycles: 5,
};

const sci = (v: number | null | undefined): string =>
  v === null || v === undefined || !Number.isFinite(v) ? "–" : v.toExponential(2);
/** three significant digits, in plain notation between 0.01 and 100000 */
const short = (v: number | null): string =>
  v === null || !Number.isFinite(v)
    ? "–"
    : Math.abs(v) >= 0.01 && Math.abs(v) < 1e5
      ? String(Number(v.toPrecision(3)))
      : v.toExponential(2);
const pct = (f: number): string => `${(100 * f).toFixed(1)} %`;

export function analysisSummary(r: AnalysisResult, options: Partial<typeof SUMMARY_DEFAULTS> = {}): string {
  const o = { ...SUMMARY_DEFAULTS, ...options };
  const c = r.condition;
  const s = r.steadyState;
  const b = r.cycles.budget;
  const lines: string[] = [
    `${r.mechanism.title} (${r.mechanism.id})`,
    `condition: ${c.altitude_km} km, ${c.T_K.toFixed(1)} K, ${c.p_hPa.toPrecision(4)} hPa, ${c.latitude_deg}° N, ${c.date}, ` +
      `${c.localSolarTime_h} h local solar time, zenith ${c.zenith_deg.toFixed(1)}°, ${c.mode}, O3 ${c.ozone}`,
    `steady state: ${s.status} after ${s.iterations} iterations${s.status === "converged" ? "" : ` (${s.message})`}`,
    `odd oxygen (${b.definition.join(" + ") || "none"}): production ${sci(b.production_cm3s)}, loss ${sci(b.loss_cm3s)} molecules cm⁻³ s⁻¹`,
  ];
  if (b.byFamily.length) {
    lines.push("Ox loss by family:");
    const w = Math.max(...b.byFamily.map((f) => f.family.length));
    for (const f of b.byFamily) {
      lines.push(`  ${f.family.padEnd(w)}  ${pct(f.fraction).padStart(7)}  ${sci(f.oxLoss_cm3s)} molecules cm⁻³ s⁻¹`);
    }
  }
  const cycles = [...r.cycles.cycles].sort((x, y) => y.share - x.share).slice(0, o.topCycles);
  if (cycles.length) {
    lines.push(`top cycles (${cycles.length} of ${r.cycles.cycles.length}):`);
    cycles.forEach((cy, i) => {
      lines.push(`  ${i + 1}. ${cy.family}: ${cy.netEquation}, ${pct(cy.share)} of the Ox loss`);
      const step = cy.steps.find((x) => x.reactionId === cy.rateLimitingStep);
      const limiting = step ? `${step.reactionId} (${step.equation})` : cy.rateLimitingStep;
      lines.push(`     rate-limiting step ${limiting}; chain length ${short(cy.chainLength)}`);
    });
  }
  for (const w of [...(r.warnings ?? []), ...r.cycles.warnings]) lines.push(`warning: ${w}`);
  return `${lines.join("\n")}\n`;
}

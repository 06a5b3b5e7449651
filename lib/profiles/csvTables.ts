/**
 * CSV exports of sweeps and comparisons, units in the headers, RFC 4180
 * quoting, one row per altitude (or per altitude and cycle). Failed levels
 * keep their row with the status and reason and empty numbers.
 */
import { csvTable } from "../csv";
import type { ComparisonResult, SweepResult } from "./types";

/** One row per level: condition, status, Ox production and loss, loss and fraction by family. */
export function sweepLevelsCsv(r: SweepResult): string {
  const header = [
    "altitude (km)",
    "status",
    "message",
    "T (K)",
    "p (hPa)",
    "M (molecules cm-3)",
    "solar zenith angle (deg)",
    "O3 column above (DU)",
    "sulfate aerosol surface (um2 cm-3)",
    "Ox production (molecules cm-3 s-1)",
    "Ox loss (molecules cm-3 s-1)",
    ...r.families.map((f) => `${f} Ox loss (molecules cm-3 s-1)`),
    ...r.families.map((f) => `${f} fraction (of Ox loss)`),
  ];
  const rows = r.levels.map((l) => {
    const by = new Map((l.budget?.byFamily ?? []).map((f) => [f.family, f]));
    return [
      l.altitude_km,
      l.status,
      l.message,
      l.condition?.T_K,
      l.condition?.p_hPa,
      l.condition?.M_cm3,
      l.condition?.zenith_deg,
      l.condition?.o3ColumnAbove_DU,
      l.condition?.aerosolSurface_um2cm3,
      l.budget?.production_cm3s,
      l.budget?.loss_cm3s,
      ...r.families.map((f) => (l.budget ? (by.get(f)?.oxLoss_cm3s ?? 0) : null)),
      ...r.families.map((f) => (l.budget ? (by.get(f)?.fraction ?? 0) : null)),
    ];
  });
  return csvTable(header, rows);
}

/** One row per level and cycle. */
export function sweepCyclesCsv(r: SweepResult): string {
  return csvTable(
    [
      "altitude (km)",
      "cycle_id",
      "family",
      "net_reaction",
      "rate (molecules cm-3 s-1)",
      "ox_loss (molecules cm-3 s-1)",
      "share (fraction of Ox loss)",
      "rate_limiting_step",
      "chain_length (turnovers)",
    ],
    r.levels.flatMap((l) =>
      l.cycles.map((c) => [
        l.altitude_km,
        c.id,
        c.family,
        c.netEquation,
        c.rate_cm3s,
        c.oxLoss_cm3s,
        c.share,
        c.rateLimitingStep,
        c.chainLength,
      ]),
    ),
  );
}

/** One row per altitude: A, B, B − A, by family, and the cycles explaining the difference. */
export function comparisonCsv(r: ComparisonResult): string {
  const { a, b } = r.labels;
  const header = [
    "altitude (km)",
    `${a} status`,
    `${b} status`,
    `${a} Ox loss (molecules cm-3 s-1)`,
    `${b} Ox loss (molecules cm-3 s-1)`,
    "B - A Ox loss (molecules cm-3 s-1)",
    "(B - A)/A",
    ...r.families.flatMap((f) => [
      `${a} ${f} fraction`,
      `${b} ${f} fraction`,
      `B - A ${f} Ox loss (molecules cm-3 s-1)`,
    ]),
    "cycles explaining B - A (id: delta molecules cm-3 s-1; largest first)",
    "fraction of B - A explained by those cycles",
  ];
  const rows = r.levels.map((l) => [
    l.altitude_km,
    l.a.status,
    l.b.status,
    l.a.loss_cm3s,
    l.b.loss_cm3s,
    l.difference?.loss_cm3s,
    l.difference?.relative,
    ...r.families.flatMap((f) => [
      l.a.loss_cm3s === null ? null : (l.a.fraction[f] ?? 0),
      l.b.loss_cm3s === null ? null : (l.b.fraction[f] ?? 0),
      l.difference ? (l.difference.oxLoss_cm3s[f] ?? 0) : null,
    ]),
    l.difference?.explaining.map((c) => `${c.netEquation} [${c.family}]: ${c.delta_cm3s.toPrecision(4)}`).join("; "),
    l.difference?.explainedFraction,
  ]);
  return csvTable(header, rows);
}

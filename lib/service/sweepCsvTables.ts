/**
 * The CSV tables of a sweep and the provenance entries of sweeps and
 * comparisons, free of storage: the routes (lib/service/profiles.ts) and the
 * command line write the same tables after the same lines.
 */
import type { CsvCommentEntry } from "../csv";
import { comparisonCsv, sweepCyclesCsv, sweepLevelsCsv } from "../profiles/csvTables";
import { profileToCsv } from "../profiles/profileToCsv";
import type { ComparisonResult, Profile, SweepRequest, SweepResult } from "../profiles/types";

export { comparisonCsv };

/** A sweep as stored: its request (CSV text left out), the profile it used, and its result. */
export interface ProfileRecordBody {
  request: SweepRequest;
  profile: Profile;
  result: SweepResult;
}

/** One CSV table of a sweep: the table and its one-line description. */
export interface SweepCsvTable {
  make: (b: ProfileRecordBody) => string;
  table: string;
}

/** The CSV tables of a sweep by file name. */
export const SWEEP_CSV_TABLES: Record<string, SweepCsvTable> = {
  "levels.csv": {
    make: (b) => sweepLevelsCsv(b.result),
    table: "levels.csv: every level of a stored profile sweep with its condition, Ox budget and family shares",
  },
  "cycles.csv": {
    make: (b) => sweepCyclesCsv(b.result),
    table: "cycles.csv: the catalytic cycles at every level of a stored profile sweep",
  },
  "profile.csv": {
    make: (b) => profileToCsv(b.profile),
    table: "profile.csv: the profile the sweep used, in the upload format (docs/profile-format.md)",
  },
};

/** The settings every level of a sweep shares (the per-level condition is in the table). */
export function sweepCondition(r: SweepResult, request: SweepRequest): CsvCommentEntry[] {
  const { profile: _profile, mechanismId: _mechanism, ...settings } = request;
  return [
    [
      "profile",
      `${r.profile.title} (${r.profile.source}${r.profile.demo ? "; invented demo data, not a measurement" : ""})`,
    ],
    ["condition", `per level in the table; mode=${r.mode}; ozone=${r.ozone}; o3-column=${r.columnSource}`],
    ["request", JSON.stringify(settings)],
  ];
}

export const COMPARISON_TABLE =
  "comparison.csv: Ox loss of two profile sweeps A and B against altitude, the difference B − A and the cycles that explain it";

/** The lines of one side of a comparison; `sweepLink` is the side's stored sweep, when there is one. */
export function comparisonSide(r: ComparisonResult, k: "a" | "b", sweepLink?: string): CsvCommentEntry[] {
  return [
    [`${k}-label`, r.labels[k]],
    [`${k}-sweep`, sweepLink],
    [
      `${k}-profile`,
      `${r[k].profile.title} (${r[k].profile.source}${r[k].profile.demo ? "; invented demo data" : ""})`,
    ],
    [`${k}-mode`, r[k].mode],
  ];
}

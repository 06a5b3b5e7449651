/** The form state of one side (a profile and how to run it) and the request it makes. */
import type { ComparisonSide, SweepGrid, SweepRequest } from "@/lib/profiles/types";

export interface SideState {
  /** "standard", "demo:<id>", "csv" or "stored" */
  source: string;
  csv: string;
  csvName: string;
  sweepId: string;
  mechanismId: string;
  mode: "instantaneous" | "diurnal";
  ozone: "held" | "solved";
  /** ppbv; undefined = the climatology */
  cly_ppbv?: number;
  latitude_deg?: number;
  date?: string;
  localSolarTime_h?: number;
  /** polar cloud type of every level (auto is decided per level); undefined = none */
  cloud?: "none" | "NAT" | "ice" | "auto";
}

export const defaultSide = (over: Partial<SideState> = {}): SideState => ({
  source: "standard",
  csv: "",
  csvName: "",
  sweepId: "",
  mechanismId: "reference",
  mode: "instantaneous",
  ozone: "held",
  ...over,
});

export function sweepRequestOf(s: SideState, grid: SweepGrid): SweepRequest {
  const profile: SweepRequest["profile"] =
    s.source === "csv"
      ? { kind: "csv", csv: s.csv, ...(s.csvName ? { name: s.csvName } : {}) }
      : s.source.startsWith("demo:")
        ? { kind: "demo", id: s.source.slice(5) }
        : { kind: "standard" };
  const condition: SweepRequest["condition"] = {
    mode: s.mode,
    ozone: s.ozone,
    ...(s.cly_ppbv !== undefined ? { poolTotals: { Cly: s.cly_ppbv * 1e-9 } } : {}),
    ...(s.latitude_deg !== undefined ? { latitude_deg: s.latitude_deg } : {}),
    ...(s.date ? { date: s.date } : {}),
    ...(s.localSolarTime_h !== undefined ? { localSolarTime_h: s.localSolarTime_h } : {}),
    ...(s.cloud && s.cloud !== "none" ? { cloud: s.cloud } : {}),
  };
  const g = Object.fromEntries(Object.entries(grid).filter(([, v]) => v !== undefined)) as SweepGrid;
  return { mechanismId: s.mechanismId, profile, ...(Object.keys(g).length ? { grid: g } : {}), condition };
}

export function sideOf(s: SideState, grid: SweepGrid): ComparisonSide {
  return s.source === "stored" ? { sweepId: s.sweepId.trim() } : sweepRequestOf(s, grid);
}

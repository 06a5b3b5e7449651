/**
 * Invented demonstration runs (not measurements, not a model of any real
 * event). The cold-vortex parcel: a parcel at 55 hPa (about 20 km) at
 * 66–72°N in late winter, started with most of its chlorine activated
 * (as Cl2 after the winter's cloud chemistry, which the reference mechanism
 * does not itself contain), 10 days cold (192 K), then warming to 212 K over
 * two days while the sun returns; the active chlorine goes back to ClONO2
 * and HCl. The doubled-chlorine place: a fixed mid-latitude place at 20 km
 * with twice the default total chlorine.
 */
import type { RunRequest } from "./types";

export interface DemoRun {
  id: string;
  title: string;
  note: string;
  request: RunRequest;
}

const COLD_DAYS = 10;
const WARMING_DAYS = 2;
const VORTEX_DAYS = 20;

/** The invented cold-vortex trajectory, every 3 h. */
export function inventedVortexTrajectoryCsv(): string {
  const lines = ["# title: invented cold-vortex parcel", "# demo: invented", "time_h,T_K,p_hPa,latitude_deg"];
  for (let t = 0; t <= 24 * VORTEX_DAYS; t += 3) {
    const day = t / 24;
    const w = Math.min(1, Math.max(0, (day - COLD_DAYS) / WARMING_DAYS));
    const T = 192 + 20 * w;
    // the parcel swings between 66 and 72°N once every 4 days
    const lat = 69 + 3 * Math.sin((2 * Math.PI * day) / 4);
    lines.push(`${t},${T.toFixed(2)},55,${lat.toFixed(3)}`);
  }
  return `${lines.join("\n")}\n`;
}

export const DEMO_RUNS: readonly DemoRun[] = [
  {
    id: "invented-vortex-parcel",
    title: "Invented cold-vortex parcel: activated chlorine, 10 days cold, then warming",
    note: "invented demo data: the trajectory and the activated start are made up for teaching",
    request: {
      mechanismId: "reference",
      title: "Invented cold-vortex parcel (invented demo data)",
      condition: { altitude_km: 20, date: "2027-02-20", latitude_deg: 69 },
      days: VORTEX_DAYS,
      start: {
        kind: "amounts",
        // 2.2 ppbv of the chlorine as Cl2 (4.4 ppbv Cl would be too much: keep within a Cly of ~3 ppbv)
        mixingRatios: { Cl2: 1.1e-9, HCl: 0.5e-9, ClONO2: 0.2e-9, HOCl: 0, ClO: 0, Cl2O2: 0 },
      },
      trajectory: { csv: inventedVortexTrajectoryCsv(), name: "invented-vortex-parcel.csv" },
    },
  },
  {
    id: "invented-doubled-chlorine",
    title: "Invented mid-latitude place with doubled chlorine, 30 days",
    note: "invented scenario: a sensitivity run with twice the default total chlorine",
    request: {
      mechanismId: "reference",
      title: "Mid-latitude 20 km, doubled chlorine (invented scenario)",
      condition: { altitude_km: 20, latitude_deg: 45, date: "2026-03-20", poolTotals: { Cly: 6.6e-9 } },
      days: 30,
      start: { kind: "periodic" },
    },
  },
];

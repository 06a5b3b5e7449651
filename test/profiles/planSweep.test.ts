import { describe, expect, it } from "vitest";
import { InputError } from "@/lib/errors";
import { interpolateProfile } from "@/lib/profiles/interpolateProfile";
import { levelGrid } from "@/lib/profiles/levelGrid";
import { parseProfileCsv } from "@/lib/profiles/parseProfileCsv";
import { planSweep } from "@/lib/profiles/planSweep";
import { splitChunks } from "@/lib/profiles/splitChunks";
import { standardProfile } from "@/lib/profiles/standardProfile";
import { expectClose } from "../helpers/close";

const MECH = {
  species: [
    { id: "O3", role: "solved" },
    { id: "H2O", role: "held" },
    { id: "O2", role: "held" },
  ],
  pools: [{ id: "Cly" }],
};

const CSV = [
  "altitude (km),T (K),p (hPa),H2O (ppmv),CH4 (ppmv),Cly (ppbv),Bry (pptv),O3 (ppmv)",
  "10,223,265,5,1.7,1,10,0.5",
  "20,217,55,4,1.5,2,15,3",
  "30,227,12,5,1.0,3,20,8",
].join("\n");

describe("levelGrid", () => {
  it("gives 51 levels for 10–60 km in 1 km steps and lands on decimal altitudes", () => {
    expect(levelGrid({ from_km: 10, to_km: 60, step_km: 1 }).length).toBe(51);
    expect(levelGrid({ from_km: 10, to_km: 10.3, step_km: 0.1 })).toEqual([10, 10.1, 10.2, 10.3]);
  });

  it("throws naming the field for a bad range or too many levels", () => {
    expect(() => levelGrid({ from_km: 50, to_km: 40, step_km: 1 })).toThrow(/grid\.to_km/);
    expect(() => levelGrid({ from_km: 10, to_km: 60, step_km: 0 })).toThrow(/grid\.step_km/);
    expect(() => levelGrid({ from_km: 0, to_km: 86, step_km: 0.1 })).toThrow(/more than the 200 allowed/);
  });
});

describe("splitChunks", () => {
  it("splits levels into contiguous near-equal runs", () => {
    expect(splitChunks(5, 2)).toEqual([
      [0, 1, 2],
      [3, 4],
    ]);
    expect(splitChunks(2, 4)).toEqual([[0], [1]]);
    expect(splitChunks(51, 2).map((c) => c.length)).toEqual([26, 25]);
  });
});

describe("interpolateProfile", () => {
  it("interpolates T linearly and p and amounts exponentially between levels", () => {
    const p = parseProfileCsv(CSV);
    const at = interpolateProfile(p, 15);
    expectClose(at?.T_K as number, 220, { rel: 1e-12 });
    expectClose(at?.p_hPa as number, Math.sqrt(265 * 55), { rel: 1e-12 });
    expectClose(at?.held?.H2O as number, Math.sqrt(5e-6 * 4e-6), { rel: 1e-12 });
    expect(interpolateProfile(p, 5)).toBeNull();
    expect(interpolateProfile(p, 30)?.T_K).toBe(227);
  });
});

describe("planSweep", () => {
  it("asks the engine for exactly the defaults at each altitude of the default profile", () => {
    const plan = planSweep({ mechanismId: "m", profile: { kind: "standard" } }, standardProfile(), MECH);
    expect(plan.altitudes_km.length).toBe(51);
    expect(plan.tasks[0].request).toEqual({ mechanismId: "m", condition: { altitude_km: 10 } });
    expect(plan.columnSource).toBe("climatology");
  });

  it("takes T, p and amounts from the profile, drops columns the mechanism cannot use, and lets the request win", () => {
    const p = parseProfileCsv(CSV);
    const plan = planSweep(
      {
        mechanismId: "m",
        profile: { kind: "csv", csv: CSV },
        grid: { step_km: 10 },
        condition: { poolTotals: { Cly: 3.3e-9 }, latitude_deg: 10 },
      },
      p,
      MECH,
    );
    expect(plan.altitudes_km).toEqual([10, 20, 30]);
    const c = plan.tasks[1].request.condition;
    expect(c.T_K).toBe(217);
    expect(c.latitude_deg).toBe(10);
    expect(Object.keys(c.held ?? {}).sort()).toEqual(["H2O", "O3"]);
    expectClose(c.held?.O3 as number, 3e-6, { rel: 1e-12 });
    expect(c.poolTotals).toEqual({ Cly: 3.3e-9 });
    expect(plan.warnings).toEqual([
      "profile column CH4 not used: the mechanism does not hold CH4",
      "profile column Bry not used: the mechanism has no pool Bry",
    ]);
    expect(plan.columnSource).toBe("profile");
    // the column above 10 km includes the profile's O3 between 10 and 30 km and more above
    expect(plan.tasks[0].o3ColumnAbove_cm2).toBeGreaterThan(plan.tasks[2].o3ColumnAbove_cm2 as number);
  });

  it("uses no profile O3 when O3 is solved", () => {
    const plan = planSweep(
      { mechanismId: "m", profile: { kind: "csv", csv: CSV }, condition: { ozone: "solved" } },
      parseProfileCsv(CSV),
      MECH,
    );
    const held = plan.tasks[0].request.condition.held ?? {};
    expect(Object.keys(held)).toEqual(["H2O"]);
    expectClose(held.H2O, 5e-6, { rel: 1e-12 });
    expect(plan.columnSource).toBe("solved");
    expect(plan.warnings.join(" ")).toContain("O3 is solved in this sweep");
  });

  it("throws naming the grid when it reaches outside the profile", () => {
    const p = parseProfileCsv(CSV);
    expect(() =>
      planSweep({ mechanismId: "m", profile: { kind: "csv", csv: CSV }, grid: { to_km: 40 } }, p, MECH),
    ).toThrow(InputError);
    expect(() =>
      planSweep({ mechanismId: "m", profile: { kind: "csv", csv: CSV }, grid: { from_km: 5 } }, p, MECH),
    ).toThrow(/grid\.from_km/);
  });
});

/**
 * Reading a trajectory CSV: every error names the row (the file's line) and
 * the column; the limits of a run are enforced before anything is queued.
 */
import { describe, expect, it } from "vitest";
import { InputError } from "../../lib/errors";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import { parseRunRequest, parseTrajectoryCsv, planRun } from "../../lib/runs";

const HEADER = "time_h,T_K,p_hPa,latitude_deg";

function errorOf(fn: () => unknown): InputError {
  try {
    fn();
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  }
  throw new Error("expected an InputError");
}

describe("parseTrajectoryCsv", () => {
  it("reads rows, comment lines and extra columns, which are passed on under their names", () => {
    const t = parseTrajectoryCsv(
      `# title: invented\n${HEADER},aerosolSurface_um2cm3,natSurface_um2cm3\n0,195,50,70,2,0.5\n3,196,50,71,2,\n`,
    );
    expect(t.meta.title).toBe("invented");
    expect(t.points).toHaveLength(2);
    expect(t.points[0]).toMatchObject({ time_h: 0, T_K: 195, p_hPa: 50, latitude_deg: 70, aerosolSurface_um2cm3: 2 });
    expect(t.points[0].extra).toEqual({ natSurface_um2cm3: 0.5 });
    expect(t.points[1].extra).toBeUndefined();
    expect(t.extraColumns).toEqual(["natSurface_um2cm3"]);
  });

  it("throws naming the row and the column of a value that is not a number", () => {
    const e = errorOf(() => parseTrajectoryCsv(`${HEADER}\n0,195,50,70\n3,warm,50,70\n`));
    expect(e.path).toBe('trajectory.csv row 3, column "T_K"');
    expect(e.message).toContain('"warm" is not a number');
  });

  it("throws naming the row and the column of a value out of range", () => {
    const e = errorOf(() => parseTrajectoryCsv(`# a comment\n${HEADER}\n0,195,50,70\n3,195,50,95\n`));
    expect(e.path).toBe('trajectory.csv row 4, column "latitude_deg"');
    expect(e.message).toContain("outside -90–90");
  });

  it("throws when times do not increase, or do not start at 0", () => {
    expect(errorOf(() => parseTrajectoryCsv(`${HEADER}\n0,195,50,70\n0,195,50,70\n`)).path).toBe(
      'trajectory.csv row 3, column "time_h"',
    );
    expect(errorOf(() => parseTrajectoryCsv(`${HEADER}\n1,195,50,70\n`)).path).toBe(
      'trajectory.csv row 2, column "time_h"',
    );
  });

  it("throws for a missing required column, a short row and a header only", () => {
    expect(errorOf(() => parseTrajectoryCsv("time_h,T_K,p_hPa\n0,195,50\n")).message).toContain(
      'no column "latitude_deg"',
    );
    expect(errorOf(() => parseTrajectoryCsv(`${HEADER}\n0,195,50\n`)).path).toBe("trajectory.csv row 2");
    expect(errorOf(() => parseTrajectoryCsv(`${HEADER}\n`)).message).toContain("no data rows");
  });

  it("refuses more than 10,000 rows", () => {
    const rows = Array.from({ length: 10_001 }, (_, i) => `${i / 2},200,50,70`).join("\n");
    const e = errorOf(() => parseTrajectoryCsv(`${HEADER}\n${rows}\n`));
    expect(e.code).toBe("too-many-rows");
    expect(e.path).toBe("trajectory.csv row 10002");
  });
});

describe("the limits of a run request", () => {
  const mech = loadBuiltinMechanism("reference").mechanism;
  const condition = { altitude_km: 20 };

  it("refuses more than 60 days and fewer than 1", () => {
    expect(errorOf(() => parseRunRequest({ mechanismId: "reference", condition, days: 61 })).path).toBe("days");
    expect(errorOf(() => parseRunRequest({ mechanismId: "reference", condition, days: 0 })).path).toBe("days");
  });

  it("refuses a trajectory that ends before the run", () => {
    const csv = `${HEADER}\n0,200,50,70\n24,200,50,70\n`;
    const e = errorOf(() => planRun(mech, { mechanismId: "reference", condition, days: 2, trajectory: { csv } }));
    expect(e.path).toBe("trajectory");
    expect(e.message).toContain("ends at 24 h");
  });

  it("refuses an override the mechanism does not have before anything runs", () => {
    const e = errorOf(() =>
      planRun(mech, { mechanismId: "reference", condition: { altitude_km: 20, poolTotals: { Fy: 1e-9 } }, days: 1 }),
    );
    expect(e.path).toBe("condition.poolTotals.Fy");
  });
});

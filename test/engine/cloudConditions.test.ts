/**
 * The cloud fields of a condition: type and surface area through the
 * request schema and the resolution, with errors that name the field.
 */
import { describe, expect, it } from "vitest";
import { parseAnalysisRequest } from "@/lib/engine/requestSchema";
import { resolveCondition, solveConditionsOf } from "@/lib/engine/resolveCondition";
import { InputError } from "@/lib/errors";
import { loadBuiltinMechanism } from "@/lib/mechanism";

const reference = loadBuiltinMechanism("reference").mechanism;
const cold = { altitude_km: 19, T_K: 192, latitude_deg: 70 };

describe("cloud fields of a condition", () => {
  it("passes the NAT surface to the solver in cm² cm⁻³ and records the temperatures that decided it", () => {
    const c = resolveCondition(reference, { ...cold, cloud: "auto" });
    expect(c.cloud?.present).toBe("NAT");
    expect(c.cloud?.T_NAT_K).toBeGreaterThan(192);
    expect(c.sources?.cloud).toMatch(/NAT cloud/);
    expect(solveConditionsOf(c).natSurface_cm2cm3).toBe(1e-8);
    expect(solveConditionsOf(c).iceSurface_cm2cm3).toBe(0);
  });

  it("defaults to no cloud", () => {
    const c = resolveCondition(reference, cold);
    expect(c.cloud?.present).toBe("none");
    expect(solveConditionsOf(c).natSurface_cm2cm3).toBe(0);
  });

  it("rejects an unknown cloud type and a surface area out of range, naming the field", () => {
    const bad = (condition: object) => () => parseAnalysisRequest({ mechanismId: "reference", condition });
    expect(bad({ ...cold, cloud: "cirrus" })).toThrow(/condition\.cloud/);
    expect(bad({ ...cold, cloud: "ice", cloudSurface_um2cm3: 2e4 })).toThrow(/cloudSurface_um2cm3/);
    try {
      resolveCondition(reference, { ...cold, cloud: "NAT", cloudSurface_um2cm3: 500 });
      expect.fail("expected an InputError");
    } catch (e) {
      expect(e).toBeInstanceOf(InputError);
      expect((e as InputError).path).toBe("condition.cloudSurface_um2cm3");
    }
  });
});

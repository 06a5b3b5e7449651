import { describe, expect, it } from "vitest";
import { meanMolecularSpeed_cms, rateConstant, uptake } from "../../lib/kinetics";
import { expectClose } from "../helpers/close";

describe("uptake on aerosol surfaces, k = γ v̄ A / 4", () => {
  it("gives N2O5 the mean speed of kinetic theory, √(8RT/πM) (common practice; worked by hand)", () => {
    // 8 · 8.314462618 · 220 / (π · 0.10801 kg/mol) = 43 125 m² s⁻², √ = 207.67 m s⁻¹
    expectClose(meanMolecularSpeed_cms(220, 108.01), 2.0767e4, { rel: 2e-4 });
  });

  it("gives N2O5 on 1 µm² cm⁻³ of sulfate with γ = 0.1 at 220 K a lifetime of about two days (worked by hand; common practice)", () => {
    const k = uptake(0.1, 108.01, 220, 1e-8);
    expectClose(k, 5.192e-6, { rel: 2e-4 });
    const lifetime_days = 1 / k / 86400;
    expect(lifetime_days).toBeGreaterThan(2);
    expect(lifetime_days).toBeLessThan(2.5);
  });

  it("is linear in γ and A, grows as √T, and is 0 without aerosol", () => {
    const k = uptake(0.1, 108.01, 220, 1e-8);
    expectClose(uptake(0.2, 108.01, 220, 3e-8), 6 * k, { rel: 1e-12 });
    expectClose(uptake(0.1, 108.01, 4 * 220, 1e-8), 2 * k, { rel: 1e-12 });
    const law = { law: "uptake" as const, gamma: 0.1, molarMass_gmol: 108.01 };
    expect(rateConstant(law, { T_K: 220, M_cm3: 1e18, J_s: {} })).toBe(0);
    expectClose(rateConstant(law, { T_K: 220, M_cm3: 1e18, J_s: {}, aerosolSurface_cm2cm3: 1e-8 }), k, { rel: 1e-12 });
  });
});

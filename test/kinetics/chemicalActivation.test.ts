import { describe, expect, it } from "vitest";
import { chemicalActivation, termolecular } from "../../lib/kinetics";
import { expectClose } from "../helpers/close";

// JPL 19-5, Table 2-2 (from memory): OH + CO -> H + CO2, k0(300) = 1.5e-13, n = −0.6, k∞(300) = 2.1e9 s⁻¹, m = −6.1.
const OH_CO = { k0_300: 1.5e-13, n: -0.6, kinf_300: 2.1e9, m: -6.1 };

describe("chemicalActivation (JPL 19-5 form)", () => {
  it("matches OH + CO -> H + CO2 at 298 K and 1 atm worked by hand", () => {
    // By hand at T = 298 K, [M] = 2.46e19: k0 = 1.5e-13 (298/300)^0.6 = 1.49399e-13,
    // k∞ = 2.1e9 (298/300)^6.1 = 2.01604e9, x = k0[M]/k∞ = 1.82299e-3, log10 x = −2.73920,
    // exponent 1/(1 + 7.50330) = 0.117601, k = 1.49399e-13/1.00182 × 0.6^0.117603 = 1.40432e-13.
    expectClose(chemicalActivation(OH_CO, 298, 2.46e19), 1.40432e-13, { rel: 2e-4 });
  });

  it("gives with the HOCO association channel a total OH + CO rate near 2.4e-13 at 1 atm", () => {
    // association OH + CO + M -> HOCO: JPL 19-5, Table 2-1 (from memory) 5.9e-33, n 1.4, 1.1e-12, m −1.3.
    // The sum, 2.37e-13 cm³ s⁻¹, is the familiar 1-atm room-temperature value (common practice; from memory).
    const total =
      chemicalActivation(OH_CO, 298, 2.46e19) +
      termolecular({ k0_300: 5.9e-33, n: 1.4, kinf_300: 1.1e-12, m: -1.3 }, 298, 2.46e19);
    expectClose(total, 2.4e-13, { rel: 0.05 });
  });

  it("tends to k0(T) at zero pressure and falls as [M] grows", () => {
    const k0 = 1.5e-13 * (220 / 300) ** 0.6;
    expectClose(chemicalActivation(OH_CO, 220, 0), k0, { rel: 1e-14 });
    // the broadening factor approaches 1 only logarithmically
    expectClose(chemicalActivation(OH_CO, 220, 1), k0, { rel: 2e-3 });
    expect(chemicalActivation(OH_CO, 220, 1e19)).toBeLessThan(chemicalActivation(OH_CO, 220, 1e17));
  });
});

import { describe, it } from "vitest";
import { equilibriumConstant, equilibriumReverse, termolecular } from "../../lib/kinetics";
import { expectClose } from "../helpers/close";

describe("equilibriumReverse", () => {
  it("computes K(T) = A exp(B/T) for ClO + ClO ⇌ Cl2O2 at 200 K", () => {
    // JPL 19-5, Table 3-1 (from memory): A = 2.16e-27 cm³, B = 8537 K.
    // By hand: exp(8537/200) = exp(42.685) = 3.45033e18, K = 7.4527e-9 cm³ molecule⁻¹.
    expectClose(equilibriumConstant(2.16e-27, 8537, 200), 7.4527e-9, { rel: 2e-4 });
  });

  it("gives k_rev = k_fwd / K, so that k_rev · K recovers k_fwd", () => {
    const kf = termolecular({ k0_300: 1.9e-32, n: 3.6, kinf_300: 3.7e-12, m: 1.6 }, 200, 5e17);
    const kr = equilibriumReverse(kf, 2.16e-27, 8537, 200);
    expectClose(kr * equilibriumConstant(2.16e-27, 8537, 200), kf, { rel: 1e-14 });
    // by hand: k_fwd = 3.7345e-14, k_rev = 3.7345e-14 / 7.4527e-9 = 5.0110e-6 s⁻¹
    expectClose(kr, 5.011e-6, { rel: 5e-4 });
  });
});

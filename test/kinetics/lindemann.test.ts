import { describe, it } from "vitest";
import { arrhenius, lindemann } from "../../lib/kinetics";
import { expectClose } from "../helpers/close";

// JPL 19-5 OH + HNO3 pressure-dependent part (from memory): k3 = 6.5e-34 exp(1335/T), k2 = 2.7e-17 exp(2199/T).
const P = { low: { A: 6.5e-34, EoverR_K: -1335 }, high: { A: 2.7e-17, EoverR_K: -2199 } };

describe("lindemann", () => {
  it("matches the pressure-dependent part of OH + HNO3 at 220 K and 1e18 cm⁻³ worked by hand", () => {
    // by hand: k3 = 6.5e-34 × exp(6.06818) = 2.8073e-31, k3[M] = 2.8073e-13,
    // k2 = 2.7e-17 × exp(9.99545) = 5.9202e-13, k = 2.8073e-13 / (1 + 0.47419) = 1.9043e-13
    expectClose(lindemann(P, 220, 1e18), 1.9043e-13, { rel: 2e-4 });
  });

  it("tends to k_low[M] at low density and k_high at high density", () => {
    expectClose(lindemann(P, 250, 1e10), arrhenius(6.5e-34, -1335, 250) * 1e10, { rel: 1e-6 });
    expectClose(lindemann(P, 250, 1e30), arrhenius(2.7e-17, -2199, 250), { rel: 1e-6 });
  });
});

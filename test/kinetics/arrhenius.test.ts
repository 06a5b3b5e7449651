import { describe, expect, it } from "vitest";
import { arrhenius } from "../../lib/kinetics";
import { expectClose } from "../helpers/close";

describe("arrhenius", () => {
  it("gives A exp(−(E/R)/T) for O + O3 at 298 K", () => {
    // JPL 19-5, Table 1-1 (from memory): A = 8.0e-12, E/R = 2060 K, k(298) tabulated 8.0e-15
    expectClose(arrhenius(8.0e-12, 2060, 298), 8.0e-15, { rel: 0.01 });
    // worked by hand: 8.0e-12 × exp(−2060/220) = 8.0e-12 × 8.575e-5 = 6.860e-16
    expectClose(arrhenius(8.0e-12, 2060, 220), 6.86e-16, { rel: 1e-3 });
  });

  it("grows with temperature for a positive E/R and falls for a negative one", () => {
    expect(arrhenius(1e-11, 500, 250)).toBeGreaterThan(arrhenius(1e-11, 500, 200));
    expect(arrhenius(1e-11, -300, 250)).toBeLessThan(arrhenius(1e-11, -300, 200));
  });

  it("applies the optional (T/300)^b factor, which is 1 at 300 K", () => {
    expectClose(arrhenius(2e-12, 100, 300, 2.5), arrhenius(2e-12, 100, 300), { rel: 1e-14 });
    // worked by hand: (150/300)^-1 = 2
    expectClose(arrhenius(2e-12, 0, 150, -1), 4e-12, { rel: 1e-14 });
  });

  it("reduces to A when E/R is 0", () => {
    expect(arrhenius(1.2e-10, 0, 217)).toBe(1.2e-10);
  });
});

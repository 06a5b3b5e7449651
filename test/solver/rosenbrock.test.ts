/**
 * ROS3 (Sandu et al., Atmos. Environ. 31, 3459–3472, 1997): order of accuracy
 * on linear systems with known exact solutions, error control, and the
 * tangent-linear step against finite differences of the step itself.
 */
import { describe, expect, it } from "vitest";
import { integrate, integrateOde, type OdeSystem, solveSteadyState } from "../../lib/solver";
import { expectClose } from "../helpers/close";
import { chapmanMechanism, clOxMechanism, conditions30km } from "./helpers";

/** y' = A y, A = [[−0.5, 1], [−1, −0.5]]: exact y = e^(−t/2) (cos t, −sin t) from y(0) = (1, 0). */
const rotation: OdeSystem = {
  n: 2,
  autonomous: true,
  rhs: (_t, y, f) => {
    f[0] = -0.5 * y[0] + y[1];
    f[1] = -y[0] - 0.5 * y[1];
  },
  jacobian: (_t, _y, J) => J.set([-0.5, 1, -1, -0.5]),
};
const rotationExact = (t: number) => [Math.exp(-t / 2) * Math.cos(t), -Math.exp(-t / 2) * Math.sin(t)];

/** y' = −y + sin t (explicitly time-dependent): exact y = e^(−t)/2 + (sin t − cos t)/2 from y(0) = 0. */
const forced: OdeSystem = {
  n: 1,
  rhs: (t, y, f) => {
    f[0] = -y[0] + Math.sin(t);
  },
  jacobian: (_t, _y, J) => {
    J[0] = -1;
  },
};
const forcedExact = (t: number) => Math.exp(-t) / 2 + (Math.sin(t) - Math.cos(t)) / 2;

function observedOrder(errors: number[]): number[] {
  return errors.slice(1).map((e, i) => Math.log2(errors[i] / e));
}

describe("ROS3 integrator", () => {
  it("is third-order accurate on a linear autonomous system", () => {
    const errors = [0.2, 0.1, 0.05, 0.025].map((h) => {
      const r = integrateOde(rotation, [1, 0], 0, 4, {}, { fixedStep: h });
      const e = rotationExact(4);
      return Math.hypot(r.y[0] - e[0], r.y[1] - e[1]);
    });
    for (const p of observedOrder(errors)) expect(p).toBeGreaterThan(2.85);
    for (const p of observedOrder(errors)) expect(p).toBeLessThan(3.2);
  });

  it("is third-order accurate on a time-dependent linear equation (∂f/∂t term)", () => {
    const errors = [0.2, 0.1, 0.05, 0.025].map((h) =>
      Math.abs(integrateOde(forced, [0], 0, 4, {}, { fixedStep: h }).y[0] - forcedExact(4)),
    );
    for (const p of observedOrder(errors)) expect(p).toBeGreaterThan(2.85);
  });

  it("meets the requested tolerance with error control on a stiff linear system", () => {
    // y1' = −1000 (y1 − cos t) − sin t (y1 = cos t), y2' = −0.5 y2 + 0.5 cos t
    const stiff: OdeSystem = {
      n: 2,
      rhs: (t, y, f) => {
        f[0] = -1000 * (y[0] - Math.cos(t)) - Math.sin(t);
        f[1] = -0.5 * y[1] + 0.5 * Math.cos(t);
      },
      jacobian: (_t, _y, J) => J.set([-1000, 0, 0, -0.5]),
    };
    const exact2 = (t: number) => 0.2 * Math.cos(t) + 0.4 * Math.sin(t) - 0.2 * Math.exp(-t / 2);
    for (const rtol of [1e-4, 1e-7]) {
      const r = integrateOde(stiff, [1, 0], 0, 5, { rtol, atol: rtol });
      expect(r.status).toBe("ok");
      expect(Math.abs(r.y[0] - Math.cos(5))).toBeLessThan(100 * rtol);
      expect(Math.abs(r.y[1] - exact2(5))).toBeLessThan(100 * rtol);
    }
  });

  it("steps onto every breakpoint", () => {
    const seen: number[] = [];
    integrateOde(rotation, [1, 0], 0, 4, { breakpoints_s: [1, 2.5] }, { onStep: (t) => seen.push(t) });
    expect(seen).toContain(1);
    expect(seen).toContain(2.5);
    expect(seen[seen.length - 1]).toBe(4);
  });
});

describe("chemistry integration", () => {
  it("relaxes the Chapman system to its steady state", () => {
    const mech = chapmanMechanism();
    const cond = conditions30km();
    const ss = solveSteadyState(mech, cond);
    const r = integrate(mech, cond, { duration_s: 1e10, initial_cm3: { O3: 1e11 } }, { rtol: 1e-6, atol: 1e-6 });
    expect(r.status).toBe("ok");
    expectClose(r.y[mech.speciesIndex.O3], ss.numberDensity_cm3[mech.speciesIndex.O3], { rel: 1e-4 }, "O3");
  });

  it("conserves an exactly conserved pool to 1e-10 relative", () => {
    const mech = clOxMechanism();
    const cond = { T_K: 230, M_cm3: 1e17, J_s: {}, held_cm3: { O3: 1e12, O: 1e7, O2: 2e16 }, poolTotals_cm3: {} };
    const r = integrate(mech, cond, { duration_s: 1e4, initial_cm3: { Cl: 1e9, ClO: 0 } });
    expect(r.status).toBe("ok");
    expectClose(r.y[0] + r.y[1], 1e9, { rel: 1e-10 }, "Cl + ClO");
  });
});

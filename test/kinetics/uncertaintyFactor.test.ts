import { describe, expect, it } from "vitest";
import { uncertaintyFactor } from "../../lib/kinetics";
import { expectClose } from "../helpers/close";

describe("uncertaintyFactor (JPL 19-5: f(T) = f(298) exp|g(1/T − 1/298)|)", () => {
  it("equals f(298) at 298 K", () => {
    expect(uncertaintyFactor({ f298: 1.15, g: 200 }, 298)).toBe(1.15);
  });

  it("grows away from 298 K on both sides, because the exponent is an absolute value", () => {
    // by hand: 1.15 × exp(200 × |1/220 − 1/298|) = 1.15 × exp(0.237949) = 1.45894
    expectClose(uncertaintyFactor({ f298: 1.15, g: 200 }, 220), 1.45894, { rel: 1e-5 });
    expect(uncertaintyFactor({ f298: 1.15, g: 200 }, 320)).toBeGreaterThan(1.15);
  });

  it("stays f(298) at every temperature when g is 0", () => {
    expect(uncertaintyFactor({ f298: 1.3, g: 0 }, 180)).toBe(1.3);
  });
});

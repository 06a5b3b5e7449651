import { describe, expect, it } from "vitest";
import { chapmanGrazing, erfcx, sunsetZenith_deg } from "../../lib/atmosphere";
import { InputError } from "../../lib/errors";
import { expectClose } from "../helpers/close";

/**
 * Slant column of an exponential atmosphere along a straight ray from radius
 * X (in scale heights) at zenith angle χ, divided by the vertical column:
 * ∫ exp(−(r(t) − X)) dt with r(t) = √(X² + t² + 2Xt·cos χ), by the midpoint
 * rule — the definition of the Chapman function (identity check).
 */
function rayIntegral(X: number, zenith_deg: number): number {
  const c = Math.cos((zenith_deg * Math.PI) / 180);
  const dt = 0.002;
  let sum = 0;
  for (let t = dt / 2; t < 3000; t += dt) {
    const r = Math.sqrt(X * X + t * t + 2 * X * t * c);
    const e = r - X;
    if (e > 60 && t > -X * c) break;
    sum += Math.exp(-e) * dt;
  }
  return sum;
}

describe("chapmanGrazing", () => {
  for (const X of [300, 900, 1300]) {
    for (const chi of [0, 45, 75, 85, 89, 90]) {
      it(`matches the ray integral for X = ${X}, χ = ${chi}° (within 1e-5)`, () => {
        expectClose(chapmanGrazing(X, chi), rayIntegral(X, chi), { rel: 1e-5 });
      });
    }
  }

  for (const chi of [91, 93, 95]) {
    it(`matches the ray integral through the tangent point for X = 1000, χ = ${chi}° (within 1e-4)`, () => {
      expectClose(chapmanGrazing(1000, chi), rayIntegral(1000, chi), { rel: 1e-4 });
    });
  }

  it("is 1 overhead and tends to sec χ as the atmosphere becomes thin (plane-parallel limit)", () => {
    expectClose(chapmanGrazing(1000, 0), 1, { rel: 1e-6 });
    expectClose(chapmanGrazing(1e7, 60), 2, { rel: 1e-5 });
    expectClose(chapmanGrazing(1e7, 80), 1 / Math.cos((80 * Math.PI) / 180), { rel: 1e-4 });
  });

  it("throws if X is not positive or the zenith angle is outside 0–180°", () => {
    expect(() => chapmanGrazing(0, 10)).toThrow(InputError);
    expect(() => chapmanGrazing(900, 181)).toThrow(/zenith angle/);
  });
});

describe("erfcx", () => {
  it("matches tabulated erfc values times exp(y²)", () => {
    // erfc(0.5) = 0.4795001222, erfc(1) = 0.1572992071, erfc(2) = 0.004677734981,
    // erfc(3) = 2.209049700e-5 (Abramowitz & Stegun Table 7.1, from memory)
    expectClose(erfcx(0), 1, { rel: 1e-14 });
    expectClose(erfcx(0.5), 0.4795001222 * Math.exp(0.25), { rel: 1e-9 });
    expectClose(erfcx(1), 0.1572992071 * Math.exp(1), { rel: 1e-9 });
    expectClose(erfcx(2), 0.004677734981 * Math.exp(4), { rel: 1e-9 });
    expectClose(erfcx(3), 2.2090497e-5 * Math.exp(9), { rel: 1e-7 });
  });

  it("is continuous where the series hands over to the continued fraction", () => {
    expectClose(erfcx(2 - 1e-9), erfcx(2), { rel: 1e-8 });
  });

  it("approaches 1/(y√π) for large y", () => {
    expectClose(erfcx(1e4), 1 / (1e4 * Math.sqrt(Math.PI)), { rel: 1e-8 });
  });

  it("throws for a negative argument", () => {
    expect(() => erfcx(-1)).toThrow(InputError);
  });
});

describe("sunsetZenith_deg", () => {
  it("is 90° at the ground and about 95.55° at 30 km (R = 6371 km)", () => {
    expect(sunsetZenith_deg(0)).toBe(90);
    expectClose(sunsetZenith_deg(30), 90 + (Math.acos(6371 / 6401) * 180) / Math.PI, { rel: 1e-12 });
    expectClose(sunsetZenith_deg(30), 95.55, { abs: 0.01 });
  });

  it("throws for a negative altitude", () => {
    expect(() => sunsetZenith_deg(-1)).toThrow(InputError);
  });
});

/**
 * Exponential integrals E1(x) and E2(x), x > 0, by the rational
 * approximations of Abramowitz & Stegun 5.1.53 (0 < x ≤ 1, |error| < 2e-7)
 * and 5.1.56 (x ≥ 1, relative error of x·eˣ·E1(x) < 5e-5), with
 * E2(x) = e^(−x) − x·E1(x) (A&S 5.1.14). Coefficients from memory, checked in
 * test/photolysis/expint.test.ts against direct integration.
 */

/** E1(x) = ∫₁^∞ e^(−xt)/t dt for x > 0. */
export function expint1(x: number): number {
  if (x <= 1) {
    return (
      -Math.log(x) -
      0.57721566 +
      x * (0.99999193 + x * (-0.24991055 + x * (0.05519968 + x * (-0.00976004 + x * 0.00107857))))
    );
  }
  if (x > 700) return 0;
  const q = (x * x + 2.334733 * x + 0.250621) / (x * x + 3.330657 * x + 1.681534);
  return (q * Math.exp(-x)) / x;
}

/** E2(x) = ∫₁^∞ e^(−xt)/t² dt for x ≥ 0 (E2(0) = 1). */
export function expint2(x: number): number {
  if (x <= 0) return 1;
  if (x <= 1) return Math.exp(-x) - x * expint1(x);
  if (x > 700) return 0;
  const q = (x * x + 2.334733 * x + 0.250621) / (x * x + 3.330657 * x + 1.681534);
  return Math.exp(-x) * (1 - q);
}

import { expect } from "vitest";

/**
 * Asserts |actual − expected| ≤ rel·|expected| + abs. The tolerance is part of
 * every call so that a reader sees how close a check is.
 */
export function expectClose(actual: number, expected: number, tol: { rel?: number; abs?: number }, what = ""): void {
  const rel = tol.rel ?? 0;
  const abs = tol.abs ?? 0;
  const bound = rel * Math.abs(expected) + abs;
  const diff = Math.abs(actual - expected);
  if (!(Number.isFinite(actual) && diff <= bound)) {
    expect.fail(
      `${what ? `${what}: ` : ""}expected ${actual} to be within ${bound.toExponential(3)} of ${expected} (difference ${diff.toExponential(3)}; rel ${rel}, abs ${abs})`,
    );
  }
  expect(diff).toBeLessThanOrEqual(bound);
}

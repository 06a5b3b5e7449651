/**
 * Exact small-integer helpers for pathway multiplicities (Lehmann 2004 keeps
 * every pathway as a vector of positive integers): greatest common divisor and
 * the rational form p/q of a stoichiometric coefficient by continued fractions.
 */
import { InputError } from "../errors";

const DEFAULTS = {
  /** largest denominator accepted for a fractional coefficient */
  maxDenominator: 1000,
  /** |x − p/q| accepted as exact */
  tolerance: 1e-9,
} as const;

export function gcd(a: number, b: number): number {
  let x = Math.abs(a);
  let y = Math.abs(b);
  while (y) {
    const t = x % y;
    x = y;
    y = t;
  }
  return x;
}

/** `x` as [numerator, denominator] with denominator ≥ 1, or null when no small fraction matches. */
export function toRational(x: number, maxDenominator: number = DEFAULTS.maxDenominator): [number, number] | null {
  if (!Number.isFinite(x)) return null;
  const sign = x < 0 ? -1 : 1;
  const ax = Math.abs(x);
  let h0 = 0;
  let h1 = 1;
  let k0 = 1;
  let k1 = 0;
  let r = ax;
  for (let i = 0; i < 40; i++) {
    const a = Math.floor(r);
    const h2 = a * h1 + h0;
    const k2 = a * k1 + k0;
    if (k2 > maxDenominator) break;
    h0 = h1;
    h1 = h2;
    k0 = k1;
    k1 = k2;
    if (Math.abs(ax - h1 / k1) <= DEFAULTS.tolerance * Math.max(1, ax)) return [sign * h1, k1];
    const frac = r - a;
    if (frac < 1e-15) break;
    r = 1 / frac;
  }
  return k1 > 0 && Math.abs(ax - h1 / k1) <= DEFAULTS.tolerance * Math.max(1, ax) ? [sign * h1, k1] : null;
}

/** Like `toRational` but throws an InputError naming `path` when `x` is no small fraction. */
export function rationalOrThrow(x: number, path: string): [number, number] {
  const q = toRational(x);
  if (!q)
    throw new InputError(path, `coefficient ${x} is not a fraction with denominator ≤ ${DEFAULTS.maxDenominator}`);
  return q;
}

/**
 * Smallest positive integers a, c with a·p = c·d for positive rationals p, d
 * (the multiplicities that make a producer of p and a consumer of d molecules
 * exchange the same number L = a·p of molecules).
 */
export function matchingMultipliers(p: [number, number], d: [number, number]): { a: number; c: number; L: number } {
  const P = p[0] * d[1];
  const D = d[0] * p[1];
  const g = gcd(P, D);
  const a = D / g;
  const c = P / g;
  return { a, c, L: (a * p[0]) / p[1] };
}

/** Real vector (its first n entries) with rational ratios to the smallest integer vector proportional to it, or null. */
export function integerProportional(v: ArrayLike<number>, n: number = v.length): number[] | null {
  let min = Number.POSITIVE_INFINITY;
  for (let i = 0; i < n; i++) if (v[i] > 0 && v[i] < min) min = v[i];
  if (!Number.isFinite(min)) return null;
  const num: number[] = new Array(n);
  const den: number[] = new Array(n);
  let l = 1;
  for (let i = 0; i < n; i++) {
    const x = v[i] / min;
    const r = Math.round(x);
    // most ratios are whole numbers: skip the continued fraction for them
    if (Math.abs(x - r) <= DEFAULTS.tolerance * Math.max(1, x)) {
      num[i] = r;
      den[i] = 1;
      continue;
    }
    const q = toRational(x);
    if (!q) return null;
    num[i] = q[0];
    den[i] = q[1];
    l = (l * q[1]) / gcd(l, q[1]);
    if (l > 1e6) return null;
  }
  const out: number[] = new Array(n);
  let g = 0;
  for (let i = 0; i < n; i++) {
    out[i] = Math.round((num[i] * l) / den[i]);
    g = gcd(g, out[i]);
  }
  if (g > 1) for (let i = 0; i < n; i++) out[i] /= g;
  return out;
}

/**
 * Symmetric logarithmic scale for signed rates (Ox produced < 0 < Ox destroyed):
 * t = sign(v) · (FLOOR + (1 − FLOOR) · log-position of |v| in [lo, hi]), so that
 * the smallest resolved value already leaves the neutral centre; |v| ≤ lo → 0.
 */
import { logScale } from "./logScale";

export const SIGNED_LOG_SCALE_DEFAULTS = {
  /** decades shown below the largest magnitude; default 6 */
  decades: 6,
  /** |t| of the smallest resolved magnitude; default 0.15 */
  floor: 0.15,
};

export interface SignedLogScale {
  lo: number;
  hi: number;
  /** −1…1 */
  normalize(v: number): number;
  /** ticks, offset 0–1 across the whole ramp (0 = −hi, 0.5 = 0, 1 = +hi) */
  ticks(): { offset: number; value: number; label: string }[];
}

export function signedLogScale(
  values: readonly number[],
  options: Partial<typeof SIGNED_LOG_SCALE_DEFAULTS> = {},
): SignedLogScale {
  const { decades, floor } = { ...SIGNED_LOG_SCALE_DEFAULTS, ...options };
  if (!(floor >= 0 && floor < 1)) throw new RangeError(`signedLogScale: invalid floor: ${floor}`);
  const mags = logScale(
    values.map((v) => Math.abs(v)),
    { decades },
  );
  const normalize = (v: number): number => {
    if (!Number.isFinite(v) || Math.abs(v) <= mags.lo) return 0;
    return Math.sign(v) * (floor + (1 - floor) * mags.normalize(Math.abs(v)));
  };
  const ticks = () => {
    const pos = mags.ticks(4);
    const t = (off: number) => floor + (1 - floor) * off;
    const right = pos.map((p) => ({ offset: 0.5 + t(p.offset) / 2, value: p.value, label: p.label }));
    const left = pos.map((p) => ({ offset: 0.5 - t(p.offset) / 2, value: -p.value, label: `−${p.label}` }));
    return [...left.reverse(), { offset: 0.5, value: 0, label: "0" }, ...right];
  };
  return { lo: mags.lo, hi: mags.hi, normalize, ticks };
}

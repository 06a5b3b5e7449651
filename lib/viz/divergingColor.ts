/**
 * Diverging ramp for odd oxygen: blue (produced) ← warm grey → orange (destroyed).
 *
 * Method: two OKLCh arms meeting at a near-neutral centre, each arm's lightness
 * falling linearly with |t| and equal on both sides (Ottosson 2020 for the
 * colour space). Blue against orange stays distinct for protan, deutan and
 * tritan vision because the arms differ in the blue–yellow opponent axis.
 */
import { type Oklch, oklchToHex } from "./colorSpace";

export const DIVERGING_CENTRE: Oklch = { L: 0.9, C: 0.008, h: 80 };
/** t = −1: Ox produced */
export const DIVERGING_PRODUCED: Oklch = { L: 0.42, C: 0.14, h: 255 };
/** t = +1: Ox destroyed */
export const DIVERGING_DESTROYED: Oklch = { L: 0.42, C: 0.13, h: 45 };

/** Colour at t ∈ [−1, 1] (clamped); negative = produced, positive = destroyed. */
export function divergingColor(t: number): string {
  const x = Number.isFinite(t) ? Math.min(1, Math.max(-1, t)) : 0;
  const end = x < 0 ? DIVERGING_PRODUCED : DIVERGING_DESTROYED;
  const f = Math.abs(x);
  // chroma grows faster than lightness falls so that small values already show their side
  const fc = Math.sqrt(f);
  return oklchToHex({
    L: DIVERGING_CENTRE.L + (end.L - DIVERGING_CENTRE.L) * f,
    C: DIVERGING_CENTRE.C + (end.C - DIVERGING_CENTRE.C) * fc,
    h: end.h,
  });
}

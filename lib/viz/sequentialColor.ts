/**
 * Sequential ramp for "more flux": pale straw → sea green → deep indigo.
 *
 * Method: piecewise-linear interpolation in OKLCh between anchors chosen for
 * this project, with lightness falling strictly from the first anchor to the
 * last (Ottosson 2020 for the colour space). Monotone lightness keeps the
 * order readable with any colour-vision deficiency and in greyscale.
 */
import { type Oklch, oklchToHex } from "./colorSpace";

/** Anchors at t = 0, 1/3, 2/3, 1; L falls monotonically. */
export const SEQUENTIAL_ANCHORS: readonly Oklch[] = [
  { L: 0.91, C: 0.075, h: 95 },
  { L: 0.72, C: 0.11, h: 160 },
  { L: 0.5, C: 0.1, h: 215 },
  { L: 0.27, C: 0.11, h: 285 },
];

function lerpHue(h0: number, h1: number, f: number): number {
  return h0 + (h1 - h0) * f;
}

/** Colour at t ∈ [0, 1] (clamped); 0 = least flux, 1 = most. */
export function sequentialColor(t: number): string {
  const x = Number.isFinite(t) ? Math.min(1, Math.max(0, t)) : 0;
  const seg = Math.min(SEQUENTIAL_ANCHORS.length - 2, Math.floor(x * (SEQUENTIAL_ANCHORS.length - 1)));
  const f = x * (SEQUENTIAL_ANCHORS.length - 1) - seg;
  const p = SEQUENTIAL_ANCHORS[seg];
  const q = SEQUENTIAL_ANCHORS[seg + 1];
  return oklchToHex({ L: p.L + (q.L - p.L) * f, C: p.C + (q.C - p.C) * f, h: lerpHue(p.h, q.h, f) });
}

/**
 * Colour-vision-deficiency simulation for the palette tests: Machado, Oliveira
 * & Fernandes (2009), "A physiologically-based model for simulation of color
 * vision deficiency", severity 1.0 matrices on linear sRGB. The coefficients
 * are from memory; the test checks that each row sums to 1 (white stays white),
 * which a mis-remembered digit would likely break.
 */
import { hexToOklab, oklabToHex, oklabToLinearRgb } from "@/lib/viz/colorSpace";

export const MACHADO_2009: Record<"protan" | "deutan" | "tritan", number[][]> = {
  protan: [
    [0.152286, 1.052583, -0.204868],
    [0.114503, 0.786281, 0.099216],
    [-0.003882, -0.048116, 1.051998],
  ],
  deutan: [
    [0.367322, 0.860646, -0.227968],
    [0.280085, 0.672501, 0.047413],
    [-0.01182, 0.04294, 0.968881],
  ],
  tritan: [
    [1.255528, -0.076749, -0.178779],
    [-0.078411, 0.930809, 0.147602],
    [0.004733, 0.691367, 0.3039],
  ],
};

/** The colour as seen with the given deficiency, as OKLab. */
export function simulate(hex: string, kind: keyof typeof MACHADO_2009) {
  const rgb = oklabToLinearRgb(hexToOklab(hex));
  const m = MACHADO_2009[kind];
  const out = m.map((row) => Math.min(1, Math.max(0, row[0] * rgb[0] + row[1] * rgb[1] + row[2] * rgb[2])));
  // back through hex so the result is an ordinary sRGB colour
  const lin2 = out.map((c) => (c <= 0.0031308 ? 12.92 * c : 1.055 * c ** (1 / 2.4) - 0.055));
  const hex2 = `#${lin2
    .map((c) =>
      Math.round(c * 255)
        .toString(16)
        .padStart(2, "0"),
    )
    .join("")}`;
  return hexToOklab(hex2);
}

/** The colour as seen with the given deficiency, as sRGB hex (clamped to the gamut). */
export function simulateHex(hex: string, kind: keyof typeof MACHADO_2009): string {
  return oklabToHex(simulate(hex, kind));
}

export interface Cielab {
  L: number;
  a: number;
  b: number;
}

/**
 * CIELAB (CIE 15:2004) of an sRGB colour: sRGB decoding and the linear-RGB →
 * XYZ matrix of IEC 61966-2-1, white point D65 (Xn 0.95047, Yn 1, Zn 1.08883).
 */
export function hexToCielab(hex: string): Cielab {
  const rgb = [1, 3, 5].map((i) => {
    const c = Number.parseInt(hex.slice(i, i + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  const X = 0.4124 * rgb[0] + 0.3576 * rgb[1] + 0.1805 * rgb[2];
  const Y = 0.2126 * rgb[0] + 0.7152 * rgb[1] + 0.0722 * rgb[2];
  const Z = 0.0193 * rgb[0] + 0.1192 * rgb[1] + 0.9505 * rgb[2];
  const f = (t: number) => (t > (6 / 29) ** 3 ? Math.cbrt(t) : t / (3 * (6 / 29) ** 2) + 4 / 29);
  const [fx, fy, fz] = [f(X / 0.95047), f(Y), f(Z / 1.08883)];
  return { L: 116 * fy - 16, a: 500 * (fx - fy), b: 200 * (fy - fz) };
}

/** ΔE*ab (CIE 1976): the Euclidean distance in CIELAB. */
export const deltaE76 = (x: Cielab, y: Cielab) => Math.hypot(x.L - y.L, x.a - y.a, x.b - y.b);

export { oklabToHex };

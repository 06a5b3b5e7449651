/**
 * Colour conversions between sRGB hex strings and OKLab / OKLCh.
 *
 * Method: Björn Ottosson, "A perceptual color space for image processing"
 * (2020, bottosson.github.io/posts/oklab); sRGB transfer function from
 * IEC 61966-2-1. L is perceived lightness 0–1; a, b are opponent axes.
 */

export interface Oklab {
  L: number;
  a: number;
  b: number;
}

export interface Oklch {
  L: number;
  /** chroma, 0 to about 0.37 */
  C: number;
  /** hue angle, degrees */
  h: number;
}

const toLinear = (c: number): number => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);
const fromLinear = (c: number): number => (c <= 0.0031308 ? 12.92 * c : 1.055 * c ** (1 / 2.4) - 0.055);
const clamp01 = (x: number): number => Math.min(1, Math.max(0, x));

/** "#rrggbb" → OKLab. */
export function hexToOklab(hex: string): Oklab {
  const m = /^#([0-9a-f]{6})$/i.exec(hex);
  if (!m) throw new RangeError(`colorSpace: invalid hex colour: ${hex}`);
  const n = Number.parseInt(m[1], 16);
  const r = toLinear(((n >> 16) & 255) / 255);
  const g = toLinear(((n >> 8) & 255) / 255);
  const b = toLinear((n & 255) / 255);
  const l = Math.cbrt(0.4122214708 * r + 0.5363325363 * g + 0.0514459929 * b);
  const mm = Math.cbrt(0.2119034982 * r + 0.6806995451 * g + 0.1073969566 * b);
  const s = Math.cbrt(0.0883024619 * r + 0.2817188376 * g + 0.6299787005 * b);
  return {
    L: 0.2104542553 * l + 0.793617785 * mm - 0.0040720468 * s,
    a: 1.9779984951 * l - 2.428592205 * mm + 0.4505937099 * s,
    b: 0.0259040371 * l + 0.7827717662 * mm - 0.808675766 * s,
  };
}

/** OKLab → linear sRGB, unclamped (components outside 0–1 are out of gamut). */
export function oklabToLinearRgb({ L, a, b }: Oklab): [number, number, number] {
  const l = (L + 0.3963377774 * a + 0.2158037573 * b) ** 3;
  const m = (L - 0.1055613458 * a - 0.0638541728 * b) ** 3;
  const s = (L - 0.0894841775 * a - 1.291485548 * b) ** 3;
  return [
    4.0767416621 * l - 3.3077115913 * m + 0.2309699292 * s,
    -1.2684380046 * l + 2.6097574011 * m - 0.3413193965 * s,
    -0.0041960863 * l - 0.7034186147 * m + 1.707614701 * s,
  ];
}

export function inGamut(lab: Oklab, eps = 1e-6): boolean {
  return oklabToLinearRgb(lab).every((c) => c >= -eps && c <= 1 + eps);
}

/** OKLab → "#rrggbb", clamping each channel into the sRGB gamut. */
export function oklabToHex(lab: Oklab): string {
  const hex = oklabToLinearRgb(lab)
    .map((c) => Math.round(fromLinear(clamp01(c)) * 255))
    .map((v) => v.toString(16).padStart(2, "0"))
    .join("");
  return `#${hex}`;
}

export function oklchToOklab({ L, C, h }: Oklch): Oklab {
  const rad = (h * Math.PI) / 180;
  return { L, a: C * Math.cos(rad), b: C * Math.sin(rad) };
}

/**
 * OKLCh → hex, reducing chroma (never lightness or hue) until the colour fits
 * sRGB, so that a ramp designed for monotone lightness keeps it.
 */
export function oklchToHex(lch: Oklch): string {
  let C = lch.C;
  for (let i = 0; i < 40 && C > 0 && !inGamut(oklchToOklab({ ...lch, C })); i++) C *= 0.95;
  return oklabToHex(oklchToOklab({ ...lch, C }));
}

/** Euclidean distance in OKLab (ΔE_ok). */
export function deltaE(x: Oklab, y: Oklab): number {
  return Math.hypot(x.L - y.L, x.a - y.a, x.b - y.b);
}

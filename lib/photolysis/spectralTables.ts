/**
 * Per-bin tables built once from the data files: cross section × quantum
 * yield (cm²) of every channel on the wavelength grid, bin-averaged with 8
 * midpoints; temperature-dependent ones (O3 and its two channels, N2O, Cl2, HNO3)
 * on a 180–320 K grid every 5 K, interpolated linearly in T at call time.
 * Also the O2 absorption outside the Schumann–Runge bands, the bands'
 * opacity-distribution bounds, and the Rayleigh cross section.
 * Units: cm², K.
 */
import { brclCrossSection_cm2 } from "./brclCrossSection";
import { PHOTOLYSIS_CHANNELS } from "./channels";
import { cl2CrossSection_cm2 } from "./cl2CrossSection";
import { hno3CrossSection_cm2 } from "./hno3CrossSection";
import { interpolateNodes, type Nodes } from "./interpolateNodes";
import { n2oCrossSection_cm2 } from "./n2oCrossSection";
import { o1dQuantumYield } from "./o1dQuantumYield";
import { o3CrossSection_cm2 } from "./o3CrossSection";
import { prebuiltSpectralTables } from "./prebuiltSpectralTables";
import { rayleighCrossSection_cm2 } from "./rayleighCrossSection";
import { CROSS_SECTIONS, LYMAN_ALPHA_CROSS_SECTIONS, NO_DELTA_BANDS } from "./tables/crossSections";
import { BRONO2_BR_YIELD, QUANTUM_YIELDS } from "./tables/quantumYields";
import { SRB_GRID, SRB_SIGMA_MAX, SRB_SIGMA_MIN } from "./tables/schumannRunge";
import { binMean, WAVELENGTH_GRID } from "./wavelengthGrid";

/** Temperatures of the T-dependent tables, K. */
export const T_GRID_K = { first: 180, step: 5, count: 29 } as const;

/** Channels whose σ·φ depends on temperature. */
export const T_DEPENDENT_CHANNELS = ["O3_O1D", "O3_O", "N2O", "Cl2", "HNO3"] as const;

export interface SpectralTables {
  /** σ·φ per bin, cm², of every temperature-independent channel */
  fixed: Record<string, Float64Array>;
  /** σ·φ per bin per grid temperature, cm², of the T-dependent channels */
  byTemperature: Record<string, Float64Array[]>;
  /** O3 absorption cross section per bin per grid temperature, cm² */
  o3ByTemperature: Float64Array[];
  /** O2 absorption cross section per bin outside the Schumann–Runge bands, cm² (0 inside them) */
  o2: Float64Array;
  /** Schumann–Runge opacity distribution bounds per bin, cm² (0 outside the bands) */
  srMin: Float64Array;
  srMax: Float64Array;
  /** Rayleigh cross section per bin, cm² */
  rayleigh: Float64Array;
  /** per channel, the first and one-past-last bin with σ·φ > 0 (the J sum skips the rest) */
  binRange: Record<string, [number, number]>;
}

const G = WAVELENGTH_GRID;

function perBin(f: (lambda_nm: number) => number, skipSr = false): Float64Array {
  const out = new Float64Array(G.n);
  for (let i = 0; i < G.n; i++) {
    if (i === G.lymanAlpha) continue;
    if (skipSr && i >= G.srFirst && i < G.srEnd) continue;
    out[i] = binMean(f, G.lower_nm[i], G.upper_nm[i]);
  }
  return out;
}

const xs = (nodes: Nodes) => (l: number) => interpolateNodes(nodes, l);
const yieldOf = (nodes: Nodes) => (l: number) => interpolateNodes(nodes, l, { mode: "linear", clamp: true });

/** ClONO2 → Cl + NO3 yield (JPL expression, from memory). */
function clono2ClYield(lambda_nm: number): number {
  if (lambda_nm < 308) return 0.6;
  if (lambda_nm > 364) return 1;
  return 7.143e-3 * lambda_nm - 1.6;
}

/** σ·φ as a function of wavelength (nm) for every temperature-independent channel but O2. */
const FIXED_SPECS: Record<string, (l: number) => number> = {
  NO2: (l) => xs(CROSS_SECTIONS.NO2.points)(l) * yieldOf(QUANTUM_YIELDS.NO2.points)(l),
  NO3_NO: (l) => xs(CROSS_SECTIONS.NO3.points)(l) * yieldOf(QUANTUM_YIELDS.NO3_NO.points)(l),
  NO3_NO2: (l) => xs(CROSS_SECTIONS.NO3.points)(l) * yieldOf(QUANTUM_YIELDS.NO3_NO2.points)(l),
  N2O5: xs(CROSS_SECTIONS.N2O5.points),
  HO2NO2: xs(CROSS_SECTIONS.HO2NO2.points),
  H2O2: xs(CROSS_SECTIONS.H2O2.points),
  HOCl: xs(CROSS_SECTIONS.HOCl.points),
  ClONO2_Cl: (l) => xs(CROSS_SECTIONS.ClONO2.points)(l) * clono2ClYield(l),
  ClONO2_ClO: (l) => xs(CROSS_SECTIONS.ClONO2.points)(l) * (1 - clono2ClYield(l)),
  Cl2O2: xs(CROSS_SECTIONS.Cl2O2.points),
  OClO: xs(CROSS_SECTIONS.OClO.points),
  HCl: xs(CROSS_SECTIONS.HCl.points),
  BrO: xs(CROSS_SECTIONS.BrO.points),
  HOBr: xs(CROSS_SECTIONS.HOBr.points),
  BrONO2_Br: (l) => xs(CROSS_SECTIONS.BrONO2.points)(l) * BRONO2_BR_YIELD,
  BrONO2_BrO: (l) => xs(CROSS_SECTIONS.BrONO2.points)(l) * (1 - BRONO2_BR_YIELD),
  BrCl: brclCrossSection_cm2,
  H2O: xs(CROSS_SECTIONS.H2O.points),
  NO: () => 0,
  HCHO_H: (l) => xs(CROSS_SECTIONS.HCHO.points)(l) * yieldOf(QUANTUM_YIELDS.HCHO_H.points)(l),
  HCHO_H2: (l) => xs(CROSS_SECTIONS.HCHO.points)(l) * yieldOf(QUANTUM_YIELDS.HCHO_H2.points)(l),
  CH3OOH: xs(CROSS_SECTIONS.CH3OOH.points),
  CFCl3: xs(CROSS_SECTIONS.CFCl3.points),
  CF2Cl2: xs(CROSS_SECTIONS.CF2Cl2.points),
};

export function buildSpectralTables(): SpectralTables {
  const o2NonBand = (l: number) =>
    l <= 175.44
      ? interpolateNodes(CROSS_SECTIONS.O2_SRC.points, l)
      : l <= 242
        ? interpolateNodes(CROSS_SECTIONS.O2_HERZBERG.points, l)
        : 0;
  const o2 = perBin(o2NonBand, true);
  o2[G.lymanAlpha] = LYMAN_ALPHA_CROSS_SECTIONS.O2;

  const fixed: Record<string, Float64Array> = { O2: o2 };
  for (const [id, f] of Object.entries(FIXED_SPECS)) fixed[id] = perBin(f);
  fixed.H2O[G.lymanAlpha] = LYMAN_ALPHA_CROSS_SECTIONS.H2O;
  for (const band of NO_DELTA_BANDS) {
    fixed.NO[G.srFirst + (SRB_GRID.first_cm - band.upperWavenumber_cm) / SRB_GRID.step_cm] = band.sigmaPhi_cm2;
  }

  const o3ByTemperature: Float64Array[] = [];
  const byTemperature: Record<string, Float64Array[]> = { O3_O1D: [], O3_O: [], N2O: [], Cl2: [], HNO3: [] };
  for (let k = 0; k < T_GRID_K.count; k++) {
    const T = T_GRID_K.first + k * T_GRID_K.step;
    o3ByTemperature.push(perBin((l) => o3CrossSection_cm2(l, T)));
    byTemperature.O3_O1D.push(perBin((l) => o3CrossSection_cm2(l, T) * o1dQuantumYield(l, T)));
    byTemperature.O3_O.push(perBin((l) => o3CrossSection_cm2(l, T) * (1 - o1dQuantumYield(l, T))));
    byTemperature.N2O.push(perBin((l) => n2oCrossSection_cm2(l, T)));
    byTemperature.Cl2.push(perBin((l) => cl2CrossSection_cm2(l, T)));
    byTemperature.HNO3.push(perBin((l) => hno3CrossSection_cm2(l, T)));
  }

  const srMin = new Float64Array(G.n);
  const srMax = new Float64Array(G.n);
  for (let i = G.srFirst; i < G.srEnd; i++) {
    const mid = 0.5 * (G.lower_nm[i] + G.upper_nm[i]);
    srMin[i] = interpolateNodes(SRB_SIGMA_MIN, mid);
    srMax[i] = interpolateNodes(SRB_SIGMA_MAX, mid);
  }
  const rayleigh = perBin(rayleighCrossSection_cm2);
  rayleigh[G.lymanAlpha] = rayleighCrossSection_cm2(121.6);

  for (const c of PHOTOLYSIS_CHANNELS) {
    if (!fixed[c.id] && !byTemperature[c.id]) throw new Error(`spectralTables: no data for channel ${c.id}`);
  }
  const binRange: Record<string, [number, number]> = {};
  for (const [id, arrays] of [
    ...Object.entries(fixed).map(([id, a]) => [id, [a]] as const),
    ...Object.entries(byTemperature),
  ]) {
    let lo = G.n;
    let hi = 0;
    for (const a of arrays) {
      for (let i = 0; i < G.n; i++) {
        if (a[i] > 0) {
          lo = Math.min(lo, i);
          hi = Math.max(hi, i + 1);
        }
      }
    }
    binRange[id] = id === "O2" ? [0, G.n] : [lo, Math.max(lo, hi)];
  }
  return { fixed, byTemperature, o3ByTemperature, o2, srMin, srMax, rayleigh, binRange };
}

/** Tables from a stored form: V8's serialised one (the command line's bundle), or plain JSON with the arrays as numbers. */
export function reviveSpectralTables(data: unknown): SpectralTables {
  const d = data as Record<string, unknown>;
  // V8's serialised form gives Float64Arrays back (kept as they are, not copied); JSON gives number arrays
  const arr = (v: unknown) => (v instanceof Float64Array ? v : Float64Array.from(v as number[]));
  const each = <T>(o: unknown, f: (v: unknown) => T) =>
    Object.fromEntries(Object.entries(o as Record<string, unknown>).map(([k, v]) => [k, f(v)]));
  return {
    fixed: each(d.fixed, arr),
    byTemperature: each(d.byTemperature, (v) => (v as unknown[]).map(arr)),
    o3ByTemperature: (d.o3ByTemperature as unknown[]).map(arr),
    o2: arr(d.o2),
    srMin: arr(d.srMin),
    srMax: arr(d.srMax),
    rayleigh: arr(d.rayleigh),
    binRange: d.binRange as Record<string, [number, number]>,
  };
}

const prebuilt = prebuiltSpectralTables();

/** The tables: built once at first import, or the ones a bundle stored (prebuiltSpectralTables.ts). */
export const SPECTRAL_TABLES: SpectralTables =
  prebuilt === undefined ? buildSpectralTables() : reviveSpectralTables(prebuilt);

/** Index and weight of a temperature on the grid (clamped to 180–320 K). */
export function temperatureWeights(T_K: number): { k: number; w: number } {
  const x = (Math.min(320, Math.max(180, T_K)) - T_GRID_K.first) / T_GRID_K.step;
  const k = Math.min(Math.floor(x), T_GRID_K.count - 2);
  return { k, w: x - k };
}

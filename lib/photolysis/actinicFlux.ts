/**
 * Actinic flux in every wavelength bin at one altitude and solar zenith angle.
 *
 * Method:
 *  - direct beam: F0·exp(−Σ σ·S) with the slant columns S of O3 (T-dependent
 *    cross sections at the local temperature), O2 (Lyman-α, Schumann–Runge
 *    continuum, Herzberg continuum) and, by default, Rayleigh extinction
 *    (Nicolet 1984) of the air column; in the Schumann–Runge bands the O2
 *    transmission of a log-uniform opacity distribution per interval
 *    (tables/schumannRunge.ts), and the O2 absorption ⟨σ·e^(−σN)⟩ kept
 *    separately for J(O2);
 *  - surface reflection (λ ≥ 206 nm, sun above the horizon): a Lambertian
 *    reflector of effective albedo A at the ground lit by the direct beam
 *    through the whole O3 and O2 column; its isotropic radiance reaches the
 *    altitude attenuated by the column below, giving
 *    F_up = 2·A·μ0·F0·exp(−τ_down)·E2(τ_below) (the 1 + 2Aμ0 enhancement of
 *    Madronich, J. Geophys. Res. 92, 9740, 1987, for a transparent
 *    atmosphere — citation from memory). A = 0.2 (a choice within the 0.1–0.35 range common in
 *    photochemical models) stands for the ground,
 *    clouds and the Rayleigh back-scatter of the lower atmosphere together;
 *    scattered skylight is otherwise omitted.
 * Beyond geometric sunset for the altitude every flux is 0.
 * Units: photons cm⁻² s⁻¹ per bin.
 */
import { airColumnAbove_cm2, O2_FRACTION, ozoneColumnAbove_cm2 } from "../atmosphere";
import { expint1, expint2 } from "./expint";
import { slantColumns } from "./slantColumns";
import { SPECTRAL_TABLES, temperatureWeights } from "./spectralTables";
import type { ActinicFlux, PhotolysisInput, PhotolysisOptions } from "./types";
import { WAVELENGTH_GRID } from "./wavelengthGrid";

export const DEFAULTS = {
  /** effective Lambertian albedo */
  albedo: 0.2,
  /** Rayleigh extinction of the direct beam on */
  rayleigh: true,
  /** shortest wavelength given surface reflection, nm */
  reflectionFrom_nm: 206,
  /** optical depth beyond which a path is taken as dark */
  opaque: 50,
};

/** Fully resolved input of the flux kernel (columns filled in). */
export interface FluxInput {
  altitude_km: number;
  zenith_deg: number;
  T_K: number;
  o3Above_cm2: number;
  o2Above_cm2: number;
  o3Total_cm2: number;
}

/** Work arrays the kernel fills: `flux` per bin, `o2Absorbed` (σ·F for O2 in the band intervals). */
export interface FluxWork {
  flux: Float64Array;
  o2Absorbed: Float64Array;
  /** per-bin O3 cross section at the local temperature */
  o3: Float64Array;
}

export function newFluxWork(): FluxWork {
  const n = WAVELENGTH_GRID.n;
  return { flux: new Float64Array(n), o2Absorbed: new Float64Array(n), o3: new Float64Array(n) };
}

/** Fill the work arrays; returns false (and zeros) beyond geometric sunset. */
export function fillActinicFlux(input: FluxInput, options: PhotolysisOptions, work: FluxWork): boolean {
  const G = WAVELENGTH_GRID;
  const T = SPECTRAL_TABLES;
  const { flux, o2Absorbed, o3 } = work;
  flux.fill(0);
  o2Absorbed.fill(0);
  const slant = slantColumns({
    altitude_km: input.altitude_km,
    zenith_deg: input.zenith_deg,
    T_K: input.T_K,
    o3Above_cm2: input.o3Above_cm2,
    o2Above_cm2: input.o2Above_cm2,
    o3ScaleHeight_km: options.o3ScaleHeight_km,
    o3ColumnAt: options.o3ColumnAt,
  });
  if (!slant.sunlit) return false;

  const { k, w } = temperatureWeights(input.T_K);
  const o3lo = T.o3ByTemperature[k];
  const o3hi = T.o3ByTemperature[k + 1];
  const useRayleigh = options.rayleigh ?? DEFAULTS.rayleigh;
  const albedo = options.albedo ?? DEFAULTS.albedo;
  const mu0 = Math.cos((input.zenith_deg * Math.PI) / 180);
  const reflect = albedo > 0 && mu0 > 0;
  // columns below the altitude, and the slant path through them (plane-parallel, the sun is above the horizon)
  const o3Below = Math.max(0, input.o3Total_cm2 - input.o3Above_cm2);
  const o2Below = O2_FRACTION * Math.max(0, airColumnAbove_cm2(0) - airColumnAbove_cm2(input.altitude_km));
  const secBelow = reflect ? 1 / Math.max(mu0, 0.05) : 0;
  const range = options.wavelengthRange_nm;
  const So3 = slant.o3_cm2;
  const So2 = slant.o2_cm2;
  const Sair = useRayleigh ? slant.air_cm2 : 0;

  for (let i = 0; i < G.n; i++) {
    if (range && (G.lower_nm[i] < range[0] || G.upper_nm[i] > range[1])) continue;
    const sO3 = o3lo[i] + w * (o3hi[i] - o3lo[i]);
    o3[i] = sO3;
    const tauOther = sO3 * So3 + T.rayleigh[i] * Sair;
    if (tauOther > DEFAULTS.opaque) continue;
    const F0 = G.flux_cm2s[i];
    if (i >= G.srFirst && i < G.srEnd) {
      const a = T.srMin[i];
      const b = T.srMax[i];
      const L = Math.log(b / a);
      const base = F0 * Math.exp(-tauOther);
      if (So2 * b < 1e-6) {
        flux[i] = base;
        o2Absorbed[i] = (base * (b - a)) / L;
      } else {
        flux[i] = (base * (expint1(a * So2) - expint1(b * So2))) / L;
        o2Absorbed[i] = (base * Math.exp(-a * So2) * -Math.expm1(-(b - a) * So2)) / (So2 * L);
      }
      continue;
    }
    const sO2 = T.o2[i];
    const tau = tauOther + sO2 * So2;
    let f = tau > DEFAULTS.opaque ? 0 : F0 * Math.exp(-tau);
    if (reflect && G.lower_nm[i] >= DEFAULTS.reflectionFrom_nm) {
      const tauDown = sO3 * (So3 + o3Below * secBelow) + sO2 * (So2 + o2Below * secBelow);
      if (tauDown < DEFAULTS.opaque) {
        f += 2 * albedo * mu0 * F0 * Math.exp(-tauDown) * expint2(sO3 * o3Below + sO2 * o2Below);
      }
    }
    flux[i] = f;
  }
  return true;
}

/** Default columns and total for an input (climatology and standard atmosphere where not given). */
export function resolveColumns(input: PhotolysisInput): FluxInput {
  const z = input.altitude_km;
  const o3Above = input.o3ColumnAbove_cm2 ?? ozoneColumnAbove_cm2(z);
  const o2Above = input.o2ColumnAbove_cm2 ?? O2_FRACTION * airColumnAbove_cm2(z);
  const o3Total = input.o3ColumnTotal_cm2 ?? o3Above + (ozoneColumnAbove_cm2(0) - ozoneColumnAbove_cm2(z));
  return {
    altitude_km: z,
    zenith_deg: input.zenith_deg,
    T_K: input.T_K,
    o3Above_cm2: o3Above,
    o2Above_cm2: o2Above,
    o3Total_cm2: o3Total,
  };
}

/** The actinic flux per bin (new arrays) for diagnostics and plots. */
export function actinicFlux(input: PhotolysisInput, options: PhotolysisOptions = {}): ActinicFlux {
  const work = newFluxWork();
  fillActinicFlux(resolveColumns(input), options, work);
  const G = WAVELENGTH_GRID;
  return {
    lower_nm: G.lower_nm.slice(),
    upper_nm: G.upper_nm.slice(),
    topOfAtmosphere_cm2s: G.flux_cm2s.slice(),
    actinic_cm2s: work.flux.slice(),
  };
}

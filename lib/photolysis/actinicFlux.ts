/**
 * Actinic flux in every wavelength bin at one altitude and solar zenith angle:
 * the direct solar beam plus the diffuse (scattered and reflected) light.
 *
 * Method:
 *  - direct beam: F0·exp(−Σ σ·S) with the slant columns S of O3 (T-dependent
 *    cross sections at the local temperature), O2 (Lyman-α, Schumann–Runge
 *    continuum, Herzberg continuum), Rayleigh extinction (Nicolet 1984) of
 *    the air column and the (delta-scaled) aerosol extinction, along the
 *    curved ray of slantColumns.ts (Chapman function; grazing rays beyond
 *    90°); in the Schumann–Runge bands the O2 transmission of a log-uniform
 *    opacity distribution per interval (tables/schumannRunge.ts), and the O2
 *    absorption ⟨σ·e^(−σN)⟩ kept separately for J(O2);
 *  - diffuse light (λ ≥ 206 nm): multiple Rayleigh and aerosol scattering
 *    and Lambertian reflection at the ground (albedo A, default 0.3), from
 *    the delta-Eddington two-stream solution of the whole column for this
 *    sun (radiativeColumn.ts, twoStream.ts: Toon et al. 1989), interpolated
 *    to the altitude. The column's O3 profile is the default climatology
 *    scaled so that its column above the altitude is the one given.
 * Beyond geometric sunset for the altitude every flux is 0: the twilight
 * skylight that air still lit higher up sends into the shadow is left out.
 * Units: photons cm⁻² s⁻¹ per bin.
 */
import { airColumnAbove_cm2, O2_FRACTION, ozoneColumnAbove_cm2 } from "../atmosphere";
import { expint1 } from "./expint";
import { aerosolSlantDepth, columnO3Above_cm2, diffuseAtO3Scale } from "./radiativeColumn";
import { slantColumns } from "./slantColumns";
import { SPECTRAL_TABLES, temperatureWeights } from "./spectralTables";
import type { ActinicFlux, PhotolysisInput, PhotolysisOptions } from "./types";
import { WAVELENGTH_GRID } from "./wavelengthGrid";

export const DEFAULTS = {
  /** Lambertian surface albedo */
  albedo: 0.3,
  /** aerosol optical depth of the column at 550 nm */
  aerosolOpticalDepth: 0,
  /** Rayleigh extinction and scattering on */
  rayleigh: true,
  /** diffuse light (two-stream) on */
  diffuse: true,
  /**
   * optical depth beyond which a path is taken as dark: near the exponential's underflow
   * (e^−700 ≈ 1e-304), so that a faint direct beam (e.g. through the O2 windows of the
   * Schumann–Runge bands to 10 km at 85°) still gives a species such as N its small source
   */
  opaque: 700,
};

/** Fully resolved input of the flux kernel (columns filled in). */
export interface FluxInput {
  altitude_km: number;
  zenith_deg: number;
  T_K: number;
  o3Above_cm2: number;
  o2Above_cm2: number;
}

/** Work arrays the kernel fills: `flux` per bin, `o2Absorbed` (σ·F for O2 in the band intervals). */
export interface FluxWork {
  flux: Float64Array;
  o2Absorbed: Float64Array;
  /** per-bin O3 cross section at the local temperature */
  o3: Float64Array;
  /** per-bin diffuse actinic flux at the altitude */
  diffuse: Float64Array;
  /** per-bin scratch of the diffuse interpolation */
  scratch: Float64Array;
}

export function newFluxWork(): FluxWork {
  const n = WAVELENGTH_GRID.n;
  return {
    flux: new Float64Array(n),
    o2Absorbed: new Float64Array(n),
    o3: new Float64Array(n),
    diffuse: new Float64Array(n),
    scratch: new Float64Array(n),
  };
}

/** Fill the work arrays; returns false (and zeros) beyond geometric sunset for the altitude. */
export function fillActinicFlux(input: FluxInput, options: PhotolysisOptions, work: FluxWork): boolean {
  const G = WAVELENGTH_GRID;
  const T = SPECTRAL_TABLES;
  const { flux, o2Absorbed, o3, diffuse } = work;
  flux.fill(0);
  o2Absorbed.fill(0);
  diffuse.fill(0);
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
  const useRayleigh = options.rayleigh ?? DEFAULTS.rayleigh;
  const aod = options.aerosolOpticalDepth ?? DEFAULTS.aerosolOpticalDepth;
  if (options.diffuse ?? DEFAULTS.diffuse) {
    const reference = columnO3Above_cm2(input.altitude_km);
    diffuseAtO3Scale(
      {
        zenith_deg: input.zenith_deg,
        albedo: options.albedo ?? DEFAULTS.albedo,
        aerosolOpticalDepth: aod,
        rayleigh: useRayleigh,
      },
      reference > 0 ? input.o3Above_cm2 / reference : 1,
      input.altitude_km,
      diffuse,
      work.scratch,
    );
  }
  const range = options.wavelengthRange_nm;
  const { k, w } = temperatureWeights(input.T_K);
  const o3lo = T.o3ByTemperature[k];
  const o3hi = T.o3ByTemperature[k + 1];
  for (let i = 0; i < G.n; i++) o3[i] = o3lo[i] + w * (o3hi[i] - o3lo[i]);

  const So3 = slant.o3_cm2;
  const So2 = slant.o2_cm2;
  const Sair = useRayleigh ? slant.air_cm2 : 0;
  // air mass factor of the slant path, for the aerosol above the altitude
  const airMass = slant.air_cm2 / (input.o2Above_cm2 / O2_FRACTION);

  for (let i = 0; i < G.n; i++) {
    if (range && (G.lower_nm[i] < range[0] || G.upper_nm[i] > range[1])) continue;
    const lambda = 0.5 * (G.lower_nm[i] + G.upper_nm[i]);
    const tauOther = o3[i] * So3 + T.rayleigh[i] * Sair + aerosolSlantDepth(aod, input.altitude_km, airMass, lambda);
    if (tauOther > DEFAULTS.opaque) {
      flux[i] = diffuse[i];
      continue;
    }
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
    const tau = tauOther + T.o2[i] * So2;
    flux[i] = (tau > DEFAULTS.opaque ? 0 : F0 * Math.exp(-tau)) + diffuse[i];
  }
  return true;
}

/** Default columns for an input (climatology and standard atmosphere where not given). */
export function resolveColumns(input: PhotolysisInput): FluxInput {
  const z = input.altitude_km;
  return {
    altitude_km: z,
    zenith_deg: input.zenith_deg,
    T_K: input.T_K,
    o3Above_cm2: input.o3ColumnAbove_cm2 ?? ozoneColumnAbove_cm2(z),
    o2Above_cm2: input.o2ColumnAbove_cm2 ?? O2_FRACTION * airColumnAbove_cm2(z),
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
    diffuse_cm2s: work.diffuse.slice(),
  };
}

/**
 * The diffuse (scattered and reflected) actinic flux in every wavelength bin
 * from 206 nm up, at every interface of one atmospheric column under one
 * sun: the multiple-scattering part of the light that drives photolysis.
 *
 * Column: 80 layers of 1 km from the ground to 80 km plus one layer holding
 * all the air above 80 km; air and O2 from the U.S. Standard Atmosphere
 * 1976 (O2 fraction 0.209476), O3 from the default climatology (scaled by a
 * factor, so that a given overhead column is honoured), each layer's O3
 * cross section at the standard atmosphere's temperature at its middle.
 * Optical properties per layer and bin:
 *  - absorption by O3 (Hartley, Huggins, Chappuis) and O2 (Herzberg continuum);
 *  - Rayleigh scattering (cross section of rayleighCrossSection.ts, Nicolet
 *    1984), phase-function asymmetry 0;
 *  - optionally a stratospheric sulfate aerosol of optical depth τ550 at
 *    550 nm, spread like the background sulfate surface-area profile, with
 *    Ångström exponent 1, single-scattering albedo 0.99 and asymmetry 0.7
 *    (typical sulfate values; common practice, from memory). The aerosol is
 *    delta-scaled (f = g², Joseph, Wiscombe and Weinman 1976, J. Atmos. Sci.
 *    33, 2452) before it is mixed with the Rayleigh scattering (g = 0, needing
 *    no scaling), so the scaled extinction of every component is known on
 *    its own and slant paths stay sums of slant columns.
 * The direct beam at each interface comes from the slant columns of
 * slantColumns.ts (Chapman function, grazing rays beyond 90°: pseudo-
 * spherical), the diffuse light from twoStream.ts with a Lambertian ground.
 * Below 206 nm (Schumann–Runge bands and continuum, Lyman-α) O2 absorption
 * outweighs scattering by orders of magnitude and only the direct beam is
 * kept (common practice).
 *
 * A field is cached per (zenith angle, albedo, τ550, O3 factor, Rayleigh
 * switch): the levels of a profile and the zenith angles of a repeated
 * 24-hour day share their columns. Behind that cache may sit a store that
 * outlives the process (diffuseFieldStore.ts; the command line's is on disk).
 * Units: km, molecules cm⁻², photons cm⁻² s⁻¹ per bin.
 */
import {
  airColumnAbove_cm2,
  backgroundSulfateSurface_um2cm3,
  O2_FRACTION,
  ozoneColumnAbove_cm2,
  standardAtmosphere,
} from "../atmosphere";
import { type DiffuseField, diffuseFieldStore } from "./diffuseFieldStore";
import { slantColumns } from "./slantColumns";
import { SPECTRAL_TABLES, temperatureWeights } from "./spectralTables";
import { newTwoStreamWork, solveTwoStream, type TwoStreamColumn } from "./twoStream";
import { WAVELENGTH_GRID } from "./wavelengthGrid";

export const DEFAULTS = {
  /** top of the 1 km layers, km */
  top_km: 80,
  /** aerosol single-scattering albedo (sulfate) */
  aerosolOmega: 0.99,
  /** aerosol asymmetry factor (sulfate) */
  aerosolG: 0.7,
  /** Ångström exponent of the aerosol extinction */
  angstrom: 1,
  /** reference wavelength of the aerosol optical depth, nm */
  aerosolReference_nm: 550,
  /** slant optical depth beyond which the direct beam is taken as 0 */
  opaque: 60,
  /** scattering optical depth of the lit part of a column below which (when no light reaches the ground) its diffuse field is taken as 0 */
  negligibleScattering: 1e-6,
  /** layers kept below the deepest interface the beam reaches (optical depth < opaque) */
  layersBelowBeam: 3,
  /** fields kept in the cache */
  cacheSize: 64,
  /**
   * the O3 factors of the cached columns are whole powers of this; a factor in between is
   * interpolated linearly in its logarithm (diffuseAtO3Scale), so that the levels of a profile,
   * whose O3 columns above differ a little from the climatology's, share two columns
   */
  o3ScaleStep: 1.05,
};

/** What a column's diffuse field depends on. */
export interface ColumnSettings {
  /** solar zenith angle at the place, degrees */
  zenith_deg: number;
  /** Lambertian surface albedo, 0–1 */
  albedo: number;
  /** aerosol optical depth of the column at 550 nm, ≥ 0 */
  aerosolOpticalDepth: number;
  /** factor on the default climatology's O3 profile */
  o3Scale: number;
  /** Rayleigh scattering on */
  rayleigh: boolean;
}

export type { DiffuseField } from "./diffuseFieldStore";

interface Geometry {
  layers: number;
  z_km: Float64Array;
  /** layer columns, cm⁻² */
  air: Float64Array;
  o3: Float64Array;
  /** columns above each interface, cm⁻² */
  airAbove: Float64Array;
  o3Above: Float64Array;
  /** interface temperatures, K, and the temperature-grid index/weight of layers and interfaces */
  T_interface: Float64Array;
  kLayer: Int32Array;
  wLayer: Float64Array;
  kInterface: Int32Array;
  wInterface: Float64Array;
  /** share of the aerosol optical depth in each layer, and above each interface */
  aerosolShare: Float64Array;
  aerosolAbove: Float64Array;
}

const GEOMETRY: Geometry = buildGeometry();

/**
 * Per-bin optical data of the column's layers and interfaces, for the bins
 * with diffuse light (index bin − firstBin): the default climatology's O3
 * absorption optical depth of each layer at its temperature, the O2 and
 * Rayleigh optical depths of each layer, and the O3 cross section at each
 * interface's temperature (for the slant paths).
 */
interface ColumnOptics {
  o3Layer: Float64Array;
  o2Layer: Float64Array;
  rayleighLayer: Float64Array;
  o3Interface: Float64Array;
}

let optics: ColumnOptics | undefined;
/** Built on the first column solved (~30 ms of CPU cold), so that a process whose fields all come from a store skips it. */
const columnOptics = (): ColumnOptics => (optics ??= buildOptics());

function buildOptics(): ColumnOptics {
  const G = WAVELENGTH_GRID;
  const T = SPECTRAL_TABLES;
  const geo = GEOMETRY;
  const N = geo.layers;
  const bins = G.n - G.srEnd;
  const o3Layer = new Float64Array(bins * N);
  const o2Layer = new Float64Array(bins * N);
  const rayleighLayer = new Float64Array(bins * N);
  const o3Interface = new Float64Array(bins * (N + 1));
  const sigmaO3 = (b: number, k: number, w: number) =>
    T.o3ByTemperature[k][b] + w * (T.o3ByTemperature[k + 1][b] - T.o3ByTemperature[k][b]);
  for (let j = 0; j < bins; j++) {
    const b = G.srEnd + j;
    for (let k = 0; k < N; k++) {
      o3Layer[j * N + k] = sigmaO3(b, geo.kLayer[k], geo.wLayer[k]) * geo.o3[k];
      o2Layer[j * N + k] = T.o2[b] * O2_FRACTION * geo.air[k];
      rayleighLayer[j * N + k] = T.rayleigh[b] * geo.air[k];
    }
    for (let i = 0; i <= N; i++) o3Interface[j * (N + 1) + i] = sigmaO3(b, geo.kInterface[i], geo.wInterface[i]);
  }
  return { o3Layer, o2Layer, rayleighLayer, o3Interface };
}

function buildGeometry(): Geometry {
  const top = DEFAULTS.top_km;
  const layers = top + 1;
  const z_km = new Float64Array(layers + 1);
  z_km[0] = Number.POSITIVE_INFINITY;
  for (let i = 1; i <= layers; i++) z_km[i] = top + 1 - i;
  const airAbove = new Float64Array(layers + 1);
  const o3Above = new Float64Array(layers + 1);
  for (let i = 1; i <= layers; i++) {
    airAbove[i] = airColumnAbove_cm2(z_km[i]);
    o3Above[i] = ozoneColumnAbove_cm2(z_km[i]);
  }
  const air = new Float64Array(layers);
  const o3 = new Float64Array(layers);
  const kLayer = new Int32Array(layers);
  const wLayer = new Float64Array(layers);
  const T_interface = new Float64Array(layers + 1);
  const kInterface = new Int32Array(layers + 1);
  const wInterface = new Float64Array(layers + 1);
  const sad = new Float64Array(layers);
  for (let k = 0; k < layers; k++) {
    air[k] = airAbove[k + 1] - airAbove[k];
    o3[k] = o3Above[k + 1] - o3Above[k];
    const mid = k === 0 ? top + 5 : z_km[k + 1] + 0.5;
    const tw = temperatureWeights(standardAtmosphere(Math.min(mid, 86)).T_K);
    kLayer[k] = tw.k;
    wLayer[k] = tw.w;
    sad[k] = k === 0 ? 0 : backgroundSulfateSurface_um2cm3(mid);
  }
  for (let i = 0; i <= layers; i++) {
    T_interface[i] = standardAtmosphere(i === 0 ? 86 : z_km[i]).T_K;
    const tw = temperatureWeights(T_interface[i]);
    kInterface[i] = tw.k;
    wInterface[i] = tw.w;
  }
  const total = sad.reduce((a, b) => a + b, 0);
  const aerosolShare = sad.map((s) => s / total);
  const aerosolAbove = new Float64Array(layers + 1);
  for (let i = 1; i <= layers; i++) aerosolAbove[i] = aerosolAbove[i - 1] + aerosolShare[i - 1];
  return {
    layers,
    z_km,
    air,
    o3,
    airAbove,
    o3Above,
    T_interface,
    kLayer,
    wLayer,
    kInterface,
    wInterface,
    aerosolShare,
    aerosolAbove,
  };
}

/** Slant columns of air, O2 and O3 and the slant aerosol fraction to each interface. */
interface Slant {
  air: Float64Array;
  o2: Float64Array;
  o3: Float64Array;
  aerosol: Float64Array;
  sunlit: Uint8Array;
}

function slantToInterfaces(zenith_deg: number, o3Scale: number): Slant {
  const g = GEOMETRY;
  const n = g.layers + 1;
  const s: Slant = {
    air: new Float64Array(n),
    o2: new Float64Array(n),
    o3: new Float64Array(n),
    aerosol: new Float64Array(n),
    sunlit: new Uint8Array(n),
  };
  s.sunlit[0] = 1;
  const o3ColumnAt = (z: number) => o3Scale * ozoneColumnAbove_cm2(Math.min(Math.max(z, 0), 86));
  for (let i = 1; i < n; i++) {
    const c = slantColumns({
      altitude_km: g.z_km[i],
      zenith_deg,
      T_K: g.T_interface[i],
      o3Above_cm2: o3Scale * g.o3Above[i],
      o2Above_cm2: O2_FRACTION * g.airAbove[i],
      o3ColumnAt,
    });
    if (!c.sunlit) continue;
    s.sunlit[i] = 1;
    s.air[i] = c.air_cm2;
    s.o2[i] = c.o2_cm2;
    s.o3[i] = c.o3_cm2;
    // the aerosol follows the air's slant-path enhancement (air mass factor)
    s.aerosol[i] = g.aerosolAbove[i] * (c.air_cm2 / g.airAbove[i]);
  }
  return s;
}

const cache = new Map<string, DiffuseField>();

/** The cached diffuse field of a column (computed on first use). */
export function diffuseField(settings: ColumnSettings): DiffuseField {
  const key = `${settings.zenith_deg}|${settings.albedo}|${settings.aerosolOpticalDepth}|${settings.o3Scale}|${settings.rayleigh}`;
  const hit = cache.get(key);
  if (hit) {
    cache.delete(key);
    cache.set(key, hit);
    return hit;
  }
  const store = diffuseFieldStore();
  let field = store?.get(key);
  if (!field) {
    field = computeDiffuseField(settings);
    store?.put(key, field);
  }
  cache.set(key, field);
  if (cache.size > DEFAULTS.cacheSize) cache.delete(cache.keys().next().value as string);
  return field;
}

/** Computes a column's diffuse field (uncached; diffuseField caches it). */
export function computeDiffuseField(settings: ColumnSettings): DiffuseField {
  const G = WAVELENGTH_GRID;
  const T = SPECTRAL_TABLES;
  const geo = GEOMETRY;
  const N = geo.layers;
  const firstBin = G.srEnd;
  const bins = G.n - firstBin;
  const flux = new Float32Array((N + 1) * bins);
  const slant = slantToInterfaces(settings.zenith_deg, settings.o3Scale);
  const field: DiffuseField = { z_km: geo.z_km, firstBin, bins, flux, sunlit: false };
  if (!slant.sunlit.some((v, i) => i > 0 && v === 1)) return field;
  field.sunlit = true;

  const mu0 = Math.cos((settings.zenith_deg * Math.PI) / 180);
  const col: TwoStreamColumn = {
    layers: N,
    dtau: new Float64Array(N),
    omega: new Float64Array(N),
    g: new Float64Array(N),
    slant: new Float64Array(N + 1),
    beam: 0,
    mu0,
    albedo: settings.albedo,
  };
  const work = newTwoStreamWork(N);
  const out = new Float64Array(N + 1);
  const tauA = settings.aerosolOpticalDepth;
  const wA = DEFAULTS.aerosolOmega;
  const gA = DEFAULTS.aerosolG;
  // delta-scaled aerosol (f = g²)
  const fA = gA * gA;
  const extScale = 1 - wA * fA;
  const wAs = (wA * (1 - fA)) / extScale;
  const gAs = gA / (1 + gA);
  const rayleighOn = settings.rayleigh;
  const o3s = settings.o3Scale;
  const dark = Number.POSITIVE_INFINITY;

  const X = columnOptics();
  for (let b = firstBin; b < G.n; b++) {
    const j = b - firstBin;
    const lambda = 0.5 * (G.lower_nm[b] + G.upper_nm[b]);
    const sO2 = T.o2[b];
    const sR = rayleighOn ? T.rayleigh[b] : 0;
    const aer = tauA > 0 ? tauA * (lambda / DEFAULTS.aerosolReference_nm) ** -DEFAULTS.angstrom * extScale : 0;
    // slant optical depths first: where the beam is spent high up, the light below it is negligible
    col.slant[0] = 0;
    let deepest = 0;
    const si = j * (N + 1);
    for (let i = 1; i <= N; i++) {
      if (!slant.sunlit[i]) {
        col.slant[i] = dark;
        continue;
      }
      const tau = X.o3Interface[si + i] * slant.o3[i] + sO2 * slant.o2[i] + sR * slant.air[i] + aer * slant.aerosol[i];
      if (tau > DEFAULTS.opaque) col.slant[i] = dark;
      else {
        col.slant[i] = tau;
        deepest = i;
      }
    }
    if (deepest === 0) continue;
    // below the depth where the beam is spent no light arrives: end the column there over a black ground
    const layers = deepest === N ? N : Math.min(N, deepest + DEFAULTS.layersBelowBeam);
    let scattering = 0;
    const sl = j * N;
    for (let k = 0; k < layers; k++) {
      const rayleigh = rayleighOn ? X.rayleighLayer[sl + k] : 0;
      const aerosol = aer * geo.aerosolShare[k];
      const scatter = rayleigh + wAs * aerosol;
      const tau = o3s * X.o3Layer[sl + k] + X.o2Layer[sl + k] + rayleigh + aerosol;
      col.dtau[k] = tau;
      col.omega[k] = tau > 0 ? scatter / tau : 0;
      col.g[k] = scatter > 0 ? (gAs * wAs * aerosol) / scatter : 0;
      scattering += scatter;
    }
    // no light reaches the ground and hardly any is scattered on the way: the diffuse field is negligible
    if (layers < N && scattering < DEFAULTS.negligibleScattering) continue;
    col.layers = layers;
    col.albedo = layers === N ? settings.albedo : 0;
    col.beam = G.flux_cm2s[b];
    solveTwoStream(col, work, out);
    for (let i = 0; i <= layers; i++) flux[i * bins + j] = Math.max(out[i], 0);
  }
  return field;
}

/** Slant aerosol optical depth factor (scaled extinction per unit τ550) to a level, for the direct beam there. */
export function aerosolSlantDepth(
  aerosolOpticalDepth: number,
  altitude_km: number,
  airMassFactor: number,
  lambda_nm: number,
): number {
  if (!(aerosolOpticalDepth > 0)) return 0;
  const above = aerosolAbove(altitude_km);
  const wA = DEFAULTS.aerosolOmega;
  const gA = DEFAULTS.aerosolG;
  return (
    aerosolOpticalDepth *
    above *
    airMassFactor *
    (lambda_nm / DEFAULTS.aerosolReference_nm) ** -DEFAULTS.angstrom *
    (1 - wA * gA * gA)
  );
}

/** Share of the column's aerosol optical depth above an altitude (linear within the 1 km layers). */
export function aerosolAbove(altitude_km: number): number {
  const g = GEOMETRY;
  if (altitude_km >= DEFAULTS.top_km) return 0;
  const x = DEFAULTS.top_km + 1 - altitude_km; // interface index, fractional
  const i = Math.min(Math.floor(x), g.layers - 1);
  const f = x - i;
  return g.aerosolAbove[i] + f * (g.aerosolAbove[i + 1] - g.aerosolAbove[i]);
}

/**
 * The diffuse actinic flux of a field at an altitude, per bin, into `out`
 * (bins below `field.firstBin` are left alone): linear in altitude between
 * the 1 km interfaces, and in the air column above 80 km.
 */
export function diffuseAt(field: DiffuseField, altitude_km: number, out: Float64Array): void {
  const { bins, firstBin, flux } = field;
  let i0: number;
  let f: number;
  if (altitude_km >= DEFAULTS.top_km) {
    i0 = 0;
    f = airColumnAbove_cm2(Math.min(altitude_km, 86)) / airColumnAbove_cm2(DEFAULTS.top_km);
  } else {
    const x = DEFAULTS.top_km + 1 - altitude_km;
    i0 = Math.min(Math.floor(x), GEOMETRY.layers - 1);
    f = x - i0;
  }
  const a = i0 * bins;
  const b = (i0 + 1) * bins;
  for (let j = 0; j < bins; j++) out[firstBin + j] = flux[a + j] + f * (flux[b + j] - flux[a + j]);
}

/**
 * The diffuse flux at an altitude for any O3 factor: between the cached columns at the two
 * neighbouring whole powers of DEFAULTS.o3ScaleStep, linear in ln(o3Scale). `scratch` is a
 * per-bin work array. Returns false when no interface of either column sees the sun.
 */
export function diffuseAtO3Scale(
  settings: Omit<ColumnSettings, "o3Scale">,
  o3Scale: number,
  altitude_km: number,
  out: Float64Array,
  scratch: Float64Array,
): boolean {
  if (!(o3Scale > 0)) {
    // no O3 at all: a column of its own
    const none = diffuseField({ ...settings, o3Scale: 0 });
    if (none.sunlit) diffuseAt(none, altitude_km, out);
    return none.sunlit;
  }
  const q = Math.log(o3Scale) / Math.log(DEFAULTS.o3ScaleStep);
  const lo = Math.floor(q + 1e-9);
  const w = Math.max(0, q - lo);
  const at = (power: number) => diffuseField({ ...settings, o3Scale: DEFAULTS.o3ScaleStep ** power });
  const a = at(lo);
  if (w < 1e-9) {
    if (a.sunlit) diffuseAt(a, altitude_km, out);
    return a.sunlit;
  }
  const b = at(lo + 1);
  if (!a.sunlit && !b.sunlit) return false;
  out.fill(0);
  scratch.fill(0);
  if (a.sunlit) diffuseAt(a, altitude_km, out);
  if (b.sunlit) diffuseAt(b, altitude_km, scratch);
  for (let i = 0; i < out.length; i++) out[i] += w * (scratch[i] - out[i]);
  return true;
}

/** Default-climatology O3 column above an altitude, cm⁻² (the reference of `o3Scale`). */
export function columnO3Above_cm2(altitude_km: number): number {
  return ozoneColumnAbove_cm2(Math.min(Math.max(altitude_km, 0), 86));
}

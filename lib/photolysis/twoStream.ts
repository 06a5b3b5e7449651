/**
 * Diffuse radiation in a layered column by the two-stream method in the
 * Eddington form, after Toon, McKay, Ackerman and Santhanam (1989, J.
 * Geophys. Res. 94, 16287–16301): coefficients of their Table 1,
 *   γ1 = [7 − ω(4 + 3g)]/4,  γ2 = −[1 − ω(4 − 3g)]/4,
 *   γ3 = (2 − 3gμ0)/4,       γ4 = 1 − γ3,
 * and in each homogeneous layer (optical depth t from its top) the diffuse
 * fluxes as two decaying homogeneous solutions plus the particular solution
 * of the direct-beam source S(t) = D_top·e^(−t/μ_eff) (their eqs. 23–24),
 *   F↑ = c1·Γ·e^(−λt) + c2·e^(−λ(Δτ−t)) + P↑·S(t),
 *   F↓ = c1·e^(−λt)   + c2·Γ·e^(−λ(Δτ−t)) + P↓·S(t),
 * λ = √(γ1² − γ2²), Γ = γ2/(γ1 + λ),
 * P↑ = ω[(γ1 − 1/μ)γ3 + γ2γ4]/(λ² − 1/μ²), P↓ = ω[(γ1 + 1/μ)γ4 + γ2γ3]/(λ² − 1/μ²).
 * The direct beam's attenuation in each layer is pseudo-spherical: 1/μ_eff
 * is the increase of the slant optical depth across the layer over its
 * vertical optical depth (Dahlback and Stamnes 1991, Planet. Space Sci. 39,
 * 671), so the beam at every interface is the one of the curved atmosphere.
 *
 * The layers are joined by the adding method (e.g. Liou, An Introduction to
 * Atmospheric Radiation, 2nd ed. 2002, §6.5): each layer's diffuse
 * reflectance R = Γ(1 − E²)/(1 − Γ²E²) and transmittance
 * T = E(1 − Γ²)/(1 − Γ²E²), E = e^(−λΔτ), and the diffuse light its direct
 * beam sends out of its top and bottom, are combined from the top down and
 * from the ground up; the fluxes at each interface follow from the two
 * stacks. It solves the same equations as the continuity conditions of
 * Toon et al. at O(layers) cost and without a linear system (the test
 * compares both).
 *
 * Boundary conditions: no diffuse light enters at the top; the ground is a
 * Lambertian reflector of albedo A for the diffuse and the direct light.
 * Result: the diffuse actinic flux at each interface, 2·(F↑ + F↓), which is
 * 4π times the mean radiance in the Eddington approximation. Delta scaling
 * of the optical properties is the caller's (radiativeColumn.ts). Known
 * limit of the Eddington form: a thick, purely absorbing layer reflects a
 * few per cent negatively (Γ < 0); the caller clips fluxes at 0.
 * Units: fluxes in the units of `beam` (photons cm⁻² s⁻¹ normal to the sun).
 */

export const DEFAULTS = {
  /** relative distance of 1/μ_eff from λ below which 1/μ_eff is nudged (the particular solution is singular at λ = 1/μ) */
  resonance: 1e-7,
  /** largest single-scattering albedo used: conservative scattering (λ = 0) is taken as ω = 1 − 1e-10 */
  maxOmega: 1 - 1e-10,
  /** slant optical depth across a layer beyond which its beam is taken as spent within it */
  spent: 50,
};

/** The column as the solver sees it, layers from the top down (delta-scaled where the caller wants it). */
export interface TwoStreamColumn {
  /** number of layers */
  layers: number;
  /** vertical optical depth of each layer */
  dtau: Float64Array;
  /** single-scattering albedo of each layer, 0–1 */
  omega: Float64Array;
  /** asymmetry factor of each layer, −1–1 */
  g: Float64Array;
  /** slant optical depth of the direct beam from the top of the atmosphere to each of the layers + 1 interfaces, top first (+∞ where it is dark) */
  slant: Float64Array;
  /** direct beam normal to the sun at the top, photons cm⁻² s⁻¹ */
  beam: number;
  /** cosine of the solar zenith angle at the ground (≤ 0: no direct light reaches it) */
  mu0: number;
  /** Lambertian surface albedo, 0–1 */
  albedo: number;
}

/** Reusable work arrays for columns of up to `layers` layers. */
export interface TwoStreamWork {
  R: Float64Array;
  T: Float64Array;
  up: Float64Array;
  down: Float64Array;
  aboveR: Float64Array;
  aboveS: Float64Array;
  belowR: Float64Array;
  belowS: Float64Array;
}

export function newTwoStreamWork(layers: number): TwoStreamWork {
  const f = () => new Float64Array(layers + 1);
  return { R: f(), T: f(), up: f(), down: f(), aboveR: f(), aboveS: f(), belowR: f(), belowS: f() };
}

/**
 * Fills `fluxUp[i]` and `fluxDown[i]` with F↑ and F↓ at interface i (0 =
 * top) and returns the diffuse actinic flux 2·(F↑ + F↓) of interface i in
 * `actinic[offset + i·stride]` when that array is given.
 */
export function solveTwoStream(
  col: TwoStreamColumn,
  work: TwoStreamWork,
  actinic?: Float64Array | Float32Array,
  offset = 0,
  stride = 1,
): void {
  const N = col.layers;
  const { R, T, up, down, aboveR, aboveS, belowR, belowS } = work;
  const mu0 = Math.max(col.mu0, 0);
  const slant = col.slant;

  // each layer on its own (black surroundings): R, T, and the diffuse light its beam sends up (top) and down (bottom)
  let Dtop = slant[0] < Number.POSITIVE_INFINITY ? col.beam * Math.exp(-slant[0]) : 0;
  for (let k = 0; k < N; k++) {
    const w = Math.min(col.omega[k], DEFAULTS.maxOmega);
    const g = col.g[k];
    const g1 = (7 - w * (4 + 3 * g)) / 4;
    const g2 = -(1 - w * (4 - 3 * g)) / 4;
    const lam = Math.sqrt((g1 - g2) * (g1 + g2));
    const G = g2 / (g1 + lam);
    const dt = col.dtau[k];
    const E = Math.exp(-lam * dt);
    const d = 1 - G * G * E * E;
    R[k] = (G * (1 - E * E)) / d;
    T[k] = (E * (1 - G * G)) / d;
    const across = slant[k + 1] - slant[k];
    const es = across < DEFAULTS.spent ? Math.exp(-across) : 0;
    if (!(w > 0) || !(Dtop > 0) || !(dt > 0)) {
      up[k] = 0;
      down[k] = 0;
      Dtop *= es;
      continue;
    }
    let inv = es > 0 ? Math.max(across / dt, 1e-9) : DEFAULTS.spent / dt;
    if (Math.abs(lam * lam - inv * inv) < DEFAULTS.resonance * inv * inv) inv *= 1 + 1e-4;
    const g3 = (2 - 3 * g * mu0) / 4;
    const g4 = 1 - g3;
    const denom = lam * lam - inv * inv;
    const pUp = (w * ((g1 - inv) * g3 + g2 * g4)) / denom;
    const pDown = (w * ((g1 + inv) * g4 + g2 * g3)) / denom;
    // F↓(0) = 0 and F↑(Δτ) = 0 fix c1, c2
    const c1 = (Dtop * (-pDown + G * E * pUp * es)) / d;
    const c2 = -pUp * Dtop * es - G * E * c1;
    up[k] = c1 * G + c2 * E + pUp * Dtop;
    down[k] = c1 * E + c2 * G + pDown * Dtop * es;
    Dtop *= es;
  }

  // stack above each interface: its reflectance for light from below, and the diffuse light it sends down
  aboveR[0] = 0;
  aboveS[0] = 0;
  for (let k = 0; k < N; k++) {
    const r = 1 / (1 - aboveR[k] * R[k]);
    aboveR[k + 1] = R[k] + T[k] * aboveR[k] * T[k] * r;
    aboveS[k + 1] = T[k] * (aboveS[k] + aboveR[k] * up[k]) * r + down[k];
  }
  // stack below each interface, ground included: its reflectance for light from above, and the light it sends up
  const Dground = slant[N] < Number.POSITIVE_INFINITY ? col.beam * Math.exp(-slant[N]) : 0;
  belowR[N] = col.albedo;
  belowS[N] = col.albedo * mu0 * Dground;
  for (let k = N - 1; k >= 0; k--) {
    const r = 1 / (1 - belowR[k + 1] * R[k]);
    belowR[k] = R[k] + T[k] * belowR[k + 1] * T[k] * r;
    belowS[k] = T[k] * (belowS[k + 1] + belowR[k + 1] * down[k]) * r + up[k];
  }
  // interfaces: the two stacks' light with its multiple reflections between them (work.up/down reused for F↑/F↓)
  for (let i = 0; i <= N; i++) {
    const Fdown = (aboveS[i] + aboveR[i] * belowS[i]) / (1 - aboveR[i] * belowR[i]);
    const Fup = belowS[i] + belowR[i] * Fdown;
    if (actinic) actinic[offset + i * stride] = 2 * (Fup + Fdown);
    aboveS[i] = Fup;
    belowS[i] = Fdown;
  }
}

/** Upward and downward diffuse fluxes at every interface (new arrays; for tests and diagnostics). */
export function twoStreamFluxes(col: TwoStreamColumn): { up: Float64Array; down: Float64Array } {
  const work = newTwoStreamWork(col.layers);
  solveTwoStream(col, work);
  return { up: work.aboveS.slice(0, col.layers + 1), down: work.belowS.slice(0, col.layers + 1) };
}

/**
 * The wavelength bins of the photolysis calculation, 121–750 nm, and the
 * extraterrestrial photon flux in each (photons cm⁻² s⁻¹ per bin):
 *  - Lyman-α, 121.1–122.1 nm, with the integrated line flux;
 *  - 125–175.44 nm in 5 nm bins (O2 Schumann–Runge continuum);
 *  - 175.44–206.19 nm in 17 intervals of 500 cm⁻¹ (Schumann–Runge bands);
 *  - 206.19–420 nm in 1 nm bins (Herzberg continuum, Hartley and Huggins bands);
 *  - 420–750 nm in 5 nm bins (visible).
 * Flux: the irradiance nodes of tables/solarSpectrum.ts, linear between nodes,
 * converted by λ/(h·c) and integrated over each bin with 8 midpoints.
 * Units: nm, photons cm⁻² s⁻¹.
 */

import { interpolateNodes } from "./interpolateNodes";
import { prebuiltWavelengthGrid } from "./prebuiltWavelengthGrid";
import { SRB_GRID } from "./tables/schumannRunge";
import { LYMAN_ALPHA_FLUX_cm2s, SOLAR_IRRADIANCE } from "./tables/solarSpectrum";

const H_PLANCK_Js = 6.62607015e-34;
const C_LIGHT_m_s = 299792458;
const SUBSAMPLES = 8;

export interface WavelengthGrid {
  /** number of bins */
  n: number;
  /** lower bin edges, nm */
  lower_nm: Float64Array;
  /** upper bin edges, nm */
  upper_nm: Float64Array;
  /** extraterrestrial photon flux in each bin, photons cm⁻² s⁻¹ */
  flux_cm2s: Float64Array;
  /** index of the Lyman-α bin */
  lymanAlpha: number;
  /** first Schumann–Runge band interval */
  srFirst: number;
  /** one past the last Schumann–Runge band interval */
  srEnd: number;
}

/** Photon flux per nm (photons cm⁻² s⁻¹ nm⁻¹) of the solar nodes at a wavelength. */
export function solarPhotonFlux_cm2snm(lambda_nm: number): number {
  const w = interpolateNodes(SOLAR_IRRADIANCE, lambda_nm, { mode: "linear" });
  return (w * lambda_nm * 1e-9) / (H_PLANCK_Js * C_LIGHT_m_s) / 1e4;
}

/** Mean of f over [a, b] by the midpoint rule with a fixed number of points. */
export function binMean(f: (lambda_nm: number) => number, a: number, b: number, points = SUBSAMPLES): number {
  let sum = 0;
  for (let k = 0; k < points; k++) sum += f(a + ((k + 0.5) * (b - a)) / points);
  return sum / points;
}

function buildGrid(): WavelengthGrid {
  const edges: Array<[number, number]> = [[121.1, 122.1]];
  for (let l = 125; l < 170; l += 5) edges.push([l, l + 5]);
  edges.push([170, 1e7 / SRB_GRID.first_cm]);
  const srFirst = edges.length;
  for (let nu = SRB_GRID.first_cm; nu > SRB_GRID.last_cm; nu -= SRB_GRID.step_cm) {
    edges.push([1e7 / nu, 1e7 / (nu - SRB_GRID.step_cm)]);
  }
  const srEnd = edges.length;
  edges.push([1e7 / SRB_GRID.last_cm, 207]);
  for (let l = 207; l < 420; l++) edges.push([l, l + 1]);
  for (let l = 420; l < 750; l += 5) edges.push([l, l + 5]);
  const n = edges.length;
  const lower_nm = new Float64Array(n);
  const upper_nm = new Float64Array(n);
  const flux_cm2s = new Float64Array(n);
  edges.forEach(([a, b], i) => {
    lower_nm[i] = a;
    upper_nm[i] = b;
    flux_cm2s[i] = i === 0 ? LYMAN_ALPHA_FLUX_cm2s : binMean(solarPhotonFlux_cm2snm, a, b) * (b - a);
  });
  return { n, lower_nm, upper_nm, flux_cm2s, lymanAlpha: 0, srFirst, srEnd };
}

/**
 * A grid from its stored form (V8's serialised one, as the command line's bundle keeps it), or undefined when it
 * is not a grid of this shape (a damaged or older file): the caller builds it then.
 */
export function reviveWavelengthGrid(data: unknown): WavelengthGrid | undefined {
  const d = data as Partial<WavelengthGrid> | null;
  if (!d || typeof d !== "object" || !Number.isInteger(d.n)) return undefined;
  const n = d.n as number;
  const arrays = [d.lower_nm, d.upper_nm, d.flux_cm2s];
  if (!arrays.every((a) => a instanceof Float64Array && a.length === n)) return undefined;
  if (![d.lymanAlpha, d.srFirst, d.srEnd].every((i) => Number.isInteger(i) && (i as number) >= 0 && (i as number) <= n))
    return undefined;
  return d as WavelengthGrid;
}

/** The fixed wavelength grid: built once at first import, or the one a bundle stored (prebuiltWavelengthGrid.ts). */
export const WAVELENGTH_GRID: WavelengthGrid = reviveWavelengthGrid(prebuiltWavelengthGrid()) ?? buildGrid();

/**
 * Photolysis frequencies J = Σ_bins σ(λ, T)·φ(λ, T)·F(λ), s⁻¹, for every
 * shared channel at one altitude and solar zenith angle, with the actinic
 * flux F of actinicFlux.ts and the per-bin tables of spectralTables.ts
 * (≈ 310 bins, 121–750 nm). Zero for every channel beyond geometric sunset
 * for the altitude. Users may fix any J or scale all computed ones.
 * Hot path: one module-level work buffer (single-threaded use; the result is
 * a new object every call). Units: s⁻¹.
 */

import { idRecord, ownValue } from "../idRecord";
import { fillActinicFlux, newFluxWork, resolveColumns } from "./actinicFlux";
import { photolysisChannels } from "./channels";
import { checkPhotolysisInput } from "./checkPhotolysisInput";
import { SPECTRAL_TABLES, temperatureWeights } from "./spectralTables";
import type { PhotolysisInput, PhotolysisOptions } from "./types";
import { WAVELENGTH_GRID } from "./wavelengthGrid";

const DEFAULTS = {
  /** factor on computed J */
  jScale: 1,
};

/** Reused work arrays of the flux kernel (filled and read within one call). */
const WORK = newFluxWork();

/** J (s⁻¹) by channel id for every channel of photolysisChannels (or the requested subset). */
export function photolysisFrequencies(input: PhotolysisInput, options: PhotolysisOptions = {}): Record<string, number> {
  checkPhotolysisInput(input, options);
  const ids = options.channels ?? photolysisChannels;
  const scale = options.jScale ?? DEFAULTS.jScale;
  const fixed = options.fixed ?? {};
  const out = idRecord<number>();
  const sunlit = fillActinicFlux(resolveColumns(input), options, WORK);
  const { flux, o2Absorbed } = WORK;
  const { k, w } = temperatureWeights(input.T_K);
  for (const id of ids) {
    const given = ownValue(fixed, id);
    if (given !== undefined) {
      out[id] = given;
      continue;
    }
    if (!sunlit) {
      out[id] = 0;
      continue;
    }
    let J = 0;
    const [first, end] = SPECTRAL_TABLES.binRange[id];
    const table = SPECTRAL_TABLES.fixed[id];
    if (table) {
      for (let i = first; i < end; i++) J += table[i] * flux[i];
    } else {
      const lo = SPECTRAL_TABLES.byTemperature[id][k];
      const hi = SPECTRAL_TABLES.byTemperature[id][k + 1];
      for (let i = first; i < end; i++) J += (lo[i] + w * (hi[i] - lo[i])) * flux[i];
    }
    if (id === "O2") {
      for (let i = WAVELENGTH_GRID.srFirst; i < WAVELENGTH_GRID.srEnd; i++) J += o2Absorbed[i];
    }
    out[id] = J * scale;
  }
  return out;
}

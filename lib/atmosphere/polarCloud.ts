/**
 * Which polar stratospheric cloud a condition has and the surface area its
 * particles offer. The cloud type is "none", "NAT", "ice", or "auto": auto
 * compares T with the frost point (Marti and Mauersberger 1993) and the NAT
 * existence temperature (Hanson and Mauersberger 1988) at the local H2O and
 * HNO3; ice below the frost point, NAT below T_NAT, none above.
 *
 * Default surface areas (from memory, typical of the ranges reported from
 * in-situ and satellite PSC observations; e.g. WMO/UNEP Scientific Assessment
 * of Ozone Depletion 2006, ch. 4): NAT (type Ia) 1 µm² cm⁻³ (observed about
 * 0.1–10), ice (type II) 200 µm² cm⁻³ (observed about 50–1000). A user value
 * overrides them. The particles are not grown, and neither denitrification
 * nor dehydration is modelled (docs/heterogeneous.md).
 *
 * Units: K, hPa, µm² cm⁻³.
 */
import { frostPoint_K } from "./frostPoint";
import { natExistenceTemperature_K } from "./natExistenceTemperature";

export type CloudType = "none" | "NAT" | "ice" | "auto";
export type CloudPresent = "none" | "NAT" | "ice";

export const CLOUD_DEFAULTS = {
  /** default cloud type of a condition */
  type: "none" as CloudType,
  /** µm² cm⁻³ */
  natSurface_um2cm3: 1,
  /** µm² cm⁻³ */
  iceSurface_um2cm3: 200,
  /** allowed user surface areas by type, µm² cm⁻³ (ranges wider than observed; common practice) */
  natRange_um2cm3: [0, 100] as const,
  iceRange_um2cm3: [0, 10000] as const,
};

export interface CloudInput {
  type: CloudType;
  /** K */
  T_K: number;
  /** water vapour partial pressure, hPa */
  pH2O_hPa: number;
  /** nitric acid partial pressure, hPa (gas and cloud together: the total available) */
  pHNO3_hPa: number;
  /** user surface area of the cloud present, µm² cm⁻³; default by type */
  surface_um2cm3?: number;
}

export interface CloudState {
  /** the type asked for */
  type: CloudType;
  /** the cloud used */
  present: CloudPresent;
  /** µm² cm⁻³ */
  natSurface_um2cm3: number;
  /** µm² cm⁻³ */
  iceSurface_um2cm3: number;
  /** NAT existence temperature, K (null without HNO3 or H2O) */
  T_NAT_K: number | null;
  /** frost point, K (null without H2O) */
  frostPoint_K: number | null;
}

/** The cloud of a condition; throws RangeError for a surface area outside its type's range. */
export function polarCloud(input: CloudInput): CloudState {
  const T_NAT_K =
    input.pHNO3_hPa > 0 && input.pH2O_hPa > 0 ? natExistenceTemperature_K(input.pHNO3_hPa, input.pH2O_hPa) : null;
  const T_ice_K = input.pH2O_hPa > 0 ? frostPoint_K(input.pH2O_hPa) : null;
  let present: CloudPresent = input.type === "auto" ? "none" : input.type;
  if (input.type === "auto") {
    if (T_ice_K !== null && input.T_K <= T_ice_K) present = "ice";
    else if (T_NAT_K !== null && input.T_K <= T_NAT_K) present = "NAT";
  }
  const area = (kind: "NAT" | "ice"): number => {
    if (present !== kind) return 0;
    const [lo, hi] = kind === "NAT" ? CLOUD_DEFAULTS.natRange_um2cm3 : CLOUD_DEFAULTS.iceRange_um2cm3;
    const v =
      input.surface_um2cm3 ?? (kind === "NAT" ? CLOUD_DEFAULTS.natSurface_um2cm3 : CLOUD_DEFAULTS.iceSurface_um2cm3);
    if (!(v >= lo && v <= hi))
      throw new RangeError(`a ${kind} cloud's surface area must be in ${lo}–${hi} µm² cm⁻³, got ${v}`);
    return v;
  };
  return {
    type: input.type,
    present,
    natSurface_um2cm3: area("NAT"),
    iceSurface_um2cm3: area("ice"),
    T_NAT_K,
    frostPoint_K: T_ice_K,
  };
}

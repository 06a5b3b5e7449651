/**
 * The surface area density a surface reaction sees: liquid sulfate (also
 * supercooled ternary solution), NAT or ice, from the conditions.
 *
 * Units: cm² cm⁻³.
 */
import type { KineticsEnv, SurfaceKind } from "./types";

export function surfaceArea_cm2cm3(surface: SurfaceKind, env: KineticsEnv): number {
  switch (surface) {
    case "nat":
      return env.natSurface_cm2cm3 ?? 0;
    case "ice":
      return env.iceSurface_cm2cm3 ?? 0;
    default:
      return env.aerosolSurface_cm2cm3 ?? 0;
  }
}

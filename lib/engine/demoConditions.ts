/**
 * Example conditions offered in the explorer and the docs. Every one is an
 * invented scenario, labelled so: a place and time chosen to show a regime,
 * not a measured case.
 */
import type { ConditionInput } from "./types";

export interface DemoCondition {
  id: string;
  /** short label for a menu, ending in "(invented)" */
  label: string;
  /** what the scenario shows */
  description: string;
  mechanismId: string;
  condition: ConditionInput;
}

/**
 * An invented cold air parcel in a late-winter Arctic polar vortex: 19 km,
 * 190 K, noon on 1 March at 70° N (sun about 78° from the zenith), 6 ppmv of
 * water, so that the frost point (about 190.4 K at the standard 64.7 hPa) is
 * just reached and the automatic cloud type finds ice; chlorine and bromine
 * totals of old vortex air (Cly 3.3 ppbv, Bry 20 pptv, NOy 10 ppbv).
 */
export const POLAR_VORTEX_DEMO: DemoCondition = {
  id: "polar-vortex",
  label: "Cold late-winter vortex parcel (invented)",
  description:
    "Invented scenario: an air parcel in a late-winter Arctic polar vortex at 19 km and 190 K, with ice clouds where the frost point is reached and a low noon sun. Chlorine is activated on the cloud particles; the ClO dimer and ClO–BrO cycles destroy the ozone.",
  mechanismId: "reference",
  condition: {
    altitude_km: 19,
    T_K: 190,
    latitude_deg: 70,
    date: "2026-03-01",
    localSolarTime_h: 12,
    mode: "instantaneous",
    cloud: "auto",
    held: { H2O: 6e-6 },
    poolTotals: { Cly: 3.3e-9, Bry: 2e-11, NOy: 1e-8 },
  },
};

export const DEMO_CONDITIONS: readonly DemoCondition[] = [POLAR_VORTEX_DEMO];

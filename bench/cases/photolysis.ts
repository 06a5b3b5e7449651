/**
 * Photolysis and atmosphere benchmarks: all J at one level, a 61-level
 * profile (10–60 km), a 24-hour diurnal set of 49 zenith angles, and the
 * standard atmosphere + climatology lookups the engine makes per level.
 *
 * The diffuse light of a column is cached per zenith angle, albedo, aerosol
 * optical depth and O3 scale (lib/photolysis/radiativeColumn.ts). "warm" cases
 * repeat one zenith, so after the first run they read the cache; "cold" cases
 * shift the zenith by a few micro-degrees every run, so every run solves the
 * two-stream column again (a different zenith is a different cache key).
 */
import { climatologyAt, defaultOzoneDensity_cm3, solarZenithAngle, standardAtmosphere } from "../../lib/atmosphere";
import { conditionAt, photolysisFrequencies, photolysisProfile } from "../../lib/photolysis";
import { computeDiffuseField } from "../../lib/photolysis/radiativeColumn";
import type { BenchCase } from "../types";

const LEVELS = Array.from({ length: 61 }, (_, i) => 10 + (50 * i) / 60);
const O3_LEVELS = LEVELS.map(defaultOzoneDensity_cm3);
const HOURS = Array.from({ length: 49 }, (_, i) => i * 0.5);
const DAY_ZENITH = HOURS.map((h) => solarZenithAngle({ latitude_deg: 45, dayOfYear: 79, localSolarTime_h: h }));
/** a zenith offset new on every call, so that no run reads a cached column */
let fresh = 0;
const nudge = () => ++fresh * 1e-6;

export const cases: BenchCase[] = [
  {
    name: "photolysis: all J at one level (30 km, SZA 30°), warm: column cached",
    run: () => photolysisFrequencies({ altitude_km: 30, zenith_deg: 30, T_K: 226.5 }),
  },
  {
    name: "photolysis: all J at one level (30 km, SZA 30°), cold: two-stream column solved",
    run: () => photolysisFrequencies({ altitude_km: 30, zenith_deg: 30 + nudge(), T_K: 226.5 }),
  },
  {
    name: "photolysis: two-stream column alone (SZA 30°, albedo 0.3, 81 layers, all bins ≥ 206 nm)",
    run: () => computeDiffuseField({ zenith_deg: 30, albedo: 0.3, aerosolOpticalDepth: 0, o3Scale: 1, rayleigh: true }),
  },
  {
    name: "photolysis: all J at one level with given columns (40 km, SZA 60°)",
    run: () =>
      photolysisFrequencies({
        altitude_km: 40,
        zenith_deg: 60,
        T_K: 250.4,
        o3ColumnAbove_cm2: 2.3e17,
        o2ColumnAbove_cm2: 1.3e22,
      }),
  },
  {
    name: "photolysis: 61-level profile, default climatology columns",
    run: () => photolysisProfile({ altitudes_km: LEVELS, zenith_deg: 30 }),
    note: "61 calls of photolysisFrequencies, one column (cached after the first run)",
  },
  {
    name: "photolysis: 61-level profile, cold: its column solved",
    run: () => photolysisProfile({ altitudes_km: LEVELS, zenith_deg: 30 + nudge() }),
  },
  {
    name: "photolysis: 61-level profile, O3 columns from the levels above",
    run: () => photolysisProfile({ altitudes_km: LEVELS, zenith_deg: 30, o3_cm3: O3_LEVELS }),
  },
  {
    name: "photolysis: 24-hour day at 30 km, 49 zenith angles (45°N, equinox), warm",
    run: () => DAY_ZENITH.map((zenith_deg) => photolysisFrequencies({ altitude_km: 30, zenith_deg, T_K: 226.5 })),
  },
  {
    name: "photolysis: 24-hour day at 30 km, 49 zenith angles (45°N, equinox), cold: every column solved",
    run: () => {
      const d = nudge();
      return DAY_ZENITH.map((z) => photolysisFrequencies({ altitude_km: 30, zenith_deg: z + d, T_K: 226.5 }));
    },
    note: "25 of the 49 angles are sunlit at the level; night levels cost nothing",
  },
  {
    name: "atmosphere: standard atmosphere + climatology at one level",
    run: () => [standardAtmosphere(33.3), climatologyAt(33.3)],
  },
  {
    name: "conditions: conditionAt (T, p, [M], sun, held amounts, every J)",
    run: () => conditionAt({ altitude_km: 30, latitude_deg: 45, date: "2026-06-21", localSolarTime_h: 10 }),
  },
];

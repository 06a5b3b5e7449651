/**
 * INVENTED DEMO DATA — not measurements, not a climatology, not from any
 * publication. Two made-up atmospheres for examples and screenshots only:
 * temperatures are the U.S. Standard Atmosphere 1976 with an invented smooth
 * anomaly centred at 30 km (−14 K "cold", +9 K "warm"), pressures integrated
 * hydrostatically from the standard 10 km pressure with that temperature, O3
 * and H2O the default climatology times invented factors. Every view must
 * label them as invented demo data.
 */
import type { DemoProfile } from "./types";

const PROVENANCE =
  "invented demo data: standard-atmosphere temperatures with an invented anomaly, hydrostatic pressures, climatology O3 and H2O times invented factors";

export const INVENTED_COLD_PROFILE: DemoProfile = {
  id: "invented-cold",
  title: "Invented cold stratosphere (demo data)",
  provenance: `${PROVENANCE} (−14 K at 30 km; O3 × 0.85, H2O × 1.1)`,
  levels: [
    { z_km: 10, T_K: 221.4, p_hPa: 265.0, mixingRatios: { O3: 7.7e-8, H2O: 6.6e-5 } },
    { z_km: 12.5, T_K: 213.7, p_hPa: 179.2, mixingRatios: { O3: 2.2e-7, H2O: 1.1e-5 } },
    { z_km: 15, T_K: 212.2, p_hPa: 120.2, mixingRatios: { O3: 5.1e-7, H2O: 5.0e-6 } },
    { z_km: 17.5, T_K: 210.3, p_hPa: 80.4, mixingRatios: { O3: 1.0e-6, H2O: 4.6e-6 } },
    { z_km: 20, T_K: 208.2, p_hPa: 53.59, mixingRatios: { O3: 1.7e-6, H2O: 4.8e-6 } },
    { z_km: 22.5, T_K: 208.6, p_hPa: 35.67, mixingRatios: { O3: 2.8e-6, H2O: 5.1e-6 } },
    { z_km: 25, T_K: 209.2, p_hPa: 23.77, mixingRatios: { O3: 3.9e-6, H2O: 5.3e-6 } },
    { z_km: 27.5, T_K: 210.5, p_hPa: 15.88, mixingRatios: { O3: 5.1e-6, H2O: 5.5e-6 } },
    { z_km: 30, T_K: 212.5, p_hPa: 10.64, mixingRatios: { O3: 6.1e-6, H2O: 5.7e-6 } },
    { z_km: 32.5, T_K: 216.0, p_hPa: 7.17, mixingRatios: { O3: 6.7e-6, H2O: 6.0e-6 } },
    { z_km: 35, T_K: 224.2, p_hPa: 4.884, mixingRatios: { O3: 6.7e-6, H2O: 6.3e-6 } },
    { z_km: 37.5, T_K: 232.9, p_hPa: 3.376, mixingRatios: { O3: 6.3e-6, H2O: 6.5e-6 } },
    { z_km: 40, T_K: 241.9, p_hPa: 2.366, mixingRatios: { O3: 5.5e-6, H2O: 6.8e-6 } },
    { z_km: 42.5, T_K: 251.0, p_hPa: 1.681, mixingRatios: { O3: 4.6e-6, H2O: 7.0e-6 } },
    { z_km: 45, T_K: 259.7, p_hPa: 1.208, mixingRatios: { O3: 3.6e-6, H2O: 7.3e-6 } },
    { z_km: 47.5, T_K: 267.7, p_hPa: 0.8781, mixingRatios: { O3: 2.7e-6, H2O: 7.4e-6 } },
    { z_km: 50, T_K: 268.8, p_hPa: 0.6418, mixingRatios: { O3: 2.0e-6, H2O: 7.5e-6 } },
    { z_km: 52.5, T_K: 266.6, p_hPa: 0.4688, mixingRatios: { O3: 1.4e-6, H2O: 7.4e-6 } },
    { z_km: 55, T_K: 260.2, p_hPa: 0.3408, mixingRatios: { O3: 1.0e-6, H2O: 7.3e-6 } },
    { z_km: 57.5, T_K: 253.6, p_hPa: 0.2459, mixingRatios: { O3: 7.8e-7, H2O: 7.2e-6 } },
    { z_km: 60, T_K: 246.9, p_hPa: 0.1759, mixingRatios: { O3: 5.9e-7, H2O: 7.2e-6 } },
  ],
};

export const INVENTED_WARM_PROFILE: DemoProfile = {
  id: "invented-warm",
  title: "Invented warm stratosphere (demo data)",
  provenance: `${PROVENANCE} (+9 K at 30 km; O3 × 1.05, H2O × 0.9)`,
  levels: [
    { z_km: 10, T_K: 224.4, p_hPa: 265.0, mixingRatios: { O3: 9.5e-8, H2O: 5.4e-5 } },
    { z_km: 12.5, T_K: 218.5, p_hPa: 180.5, mixingRatios: { O3: 2.8e-7, H2O: 8.7e-6 } },
    { z_km: 15, T_K: 219.5, p_hPa: 122.4, mixingRatios: { O3: 6.3e-7, H2O: 4.1e-6 } },
    { z_km: 17.5, T_K: 220.7, p_hPa: 83.19, mixingRatios: { O3: 1.2e-6, H2O: 3.8e-6 } },
    { z_km: 20, T_K: 222.1, p_hPa: 56.69, mixingRatios: { O3: 2.1e-6, H2O: 4.0e-6 } },
    { z_km: 22.5, T_K: 225.8, p_hPa: 38.81, mixingRatios: { O3: 3.4e-6, H2O: 4.1e-6 } },
    { z_km: 25, T_K: 229.5, p_hPa: 26.75, mixingRatios: { O3: 4.8e-6, H2O: 4.3e-6 } },
    { z_km: 27.5, T_K: 232.7, p_hPa: 18.54, mixingRatios: { O3: 6.3e-6, H2O: 4.5e-6 } },
    { z_km: 30, T_K: 235.5, p_hPa: 12.91, mixingRatios: { O3: 7.6e-6, H2O: 4.7e-6 } },
    { z_km: 32.5, T_K: 238.3, p_hPa: 9.038, mixingRatios: { O3: 8.2e-6, H2O: 4.9e-6 } },
    { z_km: 35, T_K: 244.4, p_hPa: 6.368, mixingRatios: { O3: 8.3e-6, H2O: 5.1e-6 } },
    { z_km: 37.5, T_K: 250.2, p_hPa: 4.526, mixingRatios: { O3: 7.8e-6, H2O: 5.4e-6 } },
    { z_km: 40, T_K: 255.8, p_hPa: 3.242, mixingRatios: { O3: 6.8e-6, H2O: 5.6e-6 } },
    { z_km: 42.5, T_K: 261.3, p_hPa: 2.34, mixingRatios: { O3: 5.6e-6, H2O: 5.8e-6 } },
    { z_km: 45, T_K: 267.0, p_hPa: 1.701, mixingRatios: { O3: 4.4e-6, H2O: 5.9e-6 } },
    { z_km: 47.5, T_K: 272.5, p_hPa: 1.245, mixingRatios: { O3: 3.3e-6, H2O: 6.0e-6 } },
    { z_km: 50, T_K: 271.8, p_hPa: 0.9142, mixingRatios: { O3: 2.4e-6, H2O: 6.1e-6 } },
    { z_km: 52.5, T_K: 268.3, p_hPa: 0.6697, mixingRatios: { O3: 1.7e-6, H2O: 6.1e-6 } },
    { z_km: 55, T_K: 261.1, p_hPa: 0.4876, mixingRatios: { O3: 1.3e-6, H2O: 6.0e-6 } },
    { z_km: 57.5, T_K: 254.1, p_hPa: 0.3521, mixingRatios: { O3: 9.6e-7, H2O: 5.9e-6 } },
    { z_km: 60, T_K: 247.1, p_hPa: 0.252, mixingRatios: { O3: 7.3e-7, H2O: 5.8e-6 } },
  ],
};

/** Both invented demo profiles. */
export const DEMO_PROFILES: readonly DemoProfile[] = [INVENTED_COLD_PROFILE, INVENTED_WARM_PROFILE];

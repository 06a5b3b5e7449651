/**
 * Default mid-latitude (about 45°N), annual-mean composition, 0–86 km, for
 * 2020s surface levels of the long-lived gases. Mixing ratios in mol/mol
 * (pool totals: mol of the pool's atoms per mol of air), interpolated
 * log-linearly between nodes by climatologyAt.
 *
 * Every profile except O2, N2 and O3 at 10–70 km is "approximate, from memory": rounded
 * values meant to resemble satellite and balloon climatologies of the
 * middle atmosphere; none is copied from a single published table. Each
 * profile's `source` says what it is meant to match.
 */
import type { ClimatologySpecies, MixingRatioProfile } from "../types";

const FLAT = [0, 86];

export const CLIMATOLOGY: Readonly<Record<ClimatologySpecies, MixingRatioProfile>> = {
  O2: {
    z_km: FLAT,
    mixingRatio: [0.209476, 0.209476],
    source: "U.S. Standard Atmosphere 1976, sea-level dry-air composition, constant below 86 km",
  },
  N2: {
    z_km: FLAT,
    mixingRatio: [0.78084, 0.78084],
    source: "U.S. Standard Atmosphere 1976, sea-level dry-air composition, constant below 86 km",
  },
  H2O: {
    z_km: [0, 2, 4, 6, 8, 10, 12, 14, 16, 18, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 86],
    mixingRatio: [
      6e-3, 4e-3, 2e-3, 9e-4, 3e-4, 6e-5, 1.2e-5, 5e-6, 4.2e-6, 4.2e-6, 4.4e-6, 4.8e-6, 5.2e-6, 5.7e-6, 6.2e-6, 6.6e-6,
      6.8e-6, 6.5e-6, 5.5e-6, 3.5e-6, 2e-6,
    ],
    source:
      "approximate, from memory: moist troposphere, ~4 ppmv hygropause, rising to ~6.5–7 ppmv at 45–50 km as CH4 is oxidised (2·CH4 + H2O ≈ 7.5–8 ppmv)",
  },
  CH4: {
    z_km: [0, 10, 12, 14, 16, 18, 20, 25, 30, 35, 40, 45, 50, 55, 60, 70, 80, 86],
    mixingRatio: [
      1.92e-6, 1.9e-6, 1.88e-6, 1.82e-6, 1.75e-6, 1.68e-6, 1.6e-6, 1.5e-6, 1.25e-6, 1.0e-6, 0.75e-6, 0.5e-6, 0.3e-6,
      0.2e-6, 0.15e-6, 0.08e-6, 0.04e-6, 0.03e-6,
    ],
    source:
      "approximate, from memory: ~1.9 ppmv in the troposphere (2020s), ~1.5 at 25 km, ~1.0 at 35 km, ~0.5 at 45 km, ~0.2–0.3 at 50–55 km",
  },
  N2O: {
    z_km: [0, 10, 12, 14, 16, 18, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 86],
    mixingRatio: [
      336e-9, 335e-9, 330e-9, 325e-9, 315e-9, 300e-9, 275e-9, 200e-9, 130e-9, 70e-9, 30e-9, 12e-9, 5e-9, 1e-9, 0.3e-9,
      0.1e-9, 0.05e-9,
    ],
    source:
      "approximate, from memory: ~336 ppbv in the troposphere (2020s), falling through the stratosphere by photolysis and O(1D) reaction",
  },
  O3: {
    // 10–70 km: the mid-latitude ozone model of the U.S. Standard Atmosphere 1976 (annual mean at
    // 45° N; Krueger and Minzner 1976, J. Geophys. Res. 81, 4477), as tabulated in ppmv in
    // Anderson et al. 1986, AFGL Atmospheric Constituent Profiles (0–120 km), AFGL-TR-86-0110,
    // table 1f ("U.S. Standard"). Below 10 km present-day tropospheric values and above 70 km the
    // daytime mesosphere, both approximate, from memory.
    z_km: [
      0, 2, 4, 6, 8, 10, 11, 12, 13, 14, 15, 16, 17, 18, 19, 20, 21, 22, 23, 24, 25, 27.5, 30, 32.5, 35, 37.5, 40, 42.5,
      45, 47.5, 50, 55, 60, 65, 70, 75, 80, 86,
    ],
    mixingRatio: [
      30e-9, 40e-9, 50e-9, 55e-9, 65e-9, 0.131e-6, 0.215e-6, 0.31e-6, 0.385e-6, 0.503e-6, 0.651e-6, 0.87e-6, 1.19e-6,
      1.59e-6, 2.03e-6, 2.58e-6, 3.03e-6, 3.65e-6, 4.17e-6, 4.63e-6, 5.12e-6, 5.8e-6, 6.55e-6, 7.37e-6, 7.84e-6, 7.8e-6,
      7.3e-6, 6.2e-6, 5.25e-6, 4.1e-6, 3.1e-6, 1.8e-6, 1.1e-6, 0.7e-6, 0.3e-6, 0.15e-6, 0.1e-6, 0.1e-6,
    ],
    source:
      "10–70 km: U.S. Standard Atmosphere 1976 mid-latitude ozone model (annual mean, 45° N; Krueger and Minzner 1976, J. Geophys. Res. 81, 4477; ppmv of Anderson et al. 1986, AFGL-TR-86-0110, table 1f); below 10 km and above 70 km approximate, from memory (present-day troposphere, daytime mesosphere)",
  },
  CO: {
    z_km: [0, 5, 10, 12, 14, 16, 20, 30, 40, 50, 60, 70, 80, 86],
    mixingRatio: [120e-9, 100e-9, 80e-9, 50e-9, 30e-9, 20e-9, 15e-9, 12e-9, 15e-9, 25e-9, 50e-9, 200e-9, 1e-6, 3e-6],
    source:
      "approximate, from memory: ~100 ppbv troposphere, 10–20 ppbv stratospheric minimum, rising into the mesosphere from CO2 photolysis",
  },
  H2: {
    z_km: [0, 10, 20, 30, 40, 50, 60, 70, 80, 86],
    mixingRatio: [530e-9, 530e-9, 500e-9, 500e-9, 520e-9, 550e-9, 600e-9, 800e-9, 2e-6, 3e-6],
    source:
      "approximate, from memory: ~0.53 ppmv troposphere, ~0.5 ppmv through the stratosphere (CH4 oxidation balances loss), rising in the mesosphere",
  },
  CFCl3: {
    z_km: [0, 10, 12, 14, 16, 18, 20, 22, 24, 26, 28, 30, 35, 40, 86],
    mixingRatio: [
      224e-12, 224e-12, 220e-12, 205e-12, 180e-12, 150e-12, 110e-12, 70e-12, 35e-12, 15e-12, 5e-12, 1.5e-12, 0.1e-12,
      0.01e-12, 1e-17,
    ],
    source:
      "approximate, from memory: ~224 pptv in the troposphere (early 2020s), photolysed away between 18 and 30 km",
  },
  CF2Cl2: {
    z_km: [0, 10, 12, 14, 16, 18, 20, 22, 24, 26, 28, 30, 32, 35, 40, 45, 50, 86],
    mixingRatio: [
      495e-12, 495e-12, 492e-12, 485e-12, 465e-12, 440e-12, 400e-12, 350e-12, 290e-12, 220e-12, 150e-12, 95e-12, 55e-12,
      20e-12, 4e-12, 0.7e-12, 0.1e-12, 1e-16,
    ],
    source:
      "approximate, from memory: ~495 pptv in the troposphere (early 2020s), photolysed away between 20 and 40 km",
  },
  Cly: {
    z_km: [0, 10, 12, 14, 16, 18, 20, 22, 24, 26, 28, 30, 35, 40, 86],
    mixingRatio: [
      0.1e-9, 0.1e-9, 0.2e-9, 0.45e-9, 0.8e-9, 1.2e-9, 1.6e-9, 2.0e-9, 2.4e-9, 2.7e-9, 2.95e-9, 3.1e-9, 3.25e-9, 3.3e-9,
      3.3e-9,
    ],
    source:
      "approximate, from memory: upper-stratospheric plateau 3.3 ppbv, i.e. the 3.60 ppbv of early 2006 (Froidevaux et al., GRL 33, L23812, 2006) less ~0.8 %/yr; lower values below as source gases release chlorine",
  },
  Bry: {
    z_km: [0, 10, 12, 14, 16, 18, 20, 22, 25, 86],
    mixingRatio: [1e-12, 1e-12, 3e-12, 6e-12, 10e-12, 14e-12, 17e-12, 19e-12, 20e-12, 20e-12],
    source:
      "approximate, from memory: stratospheric plateau 20 pptv, consistent with 21.5 ± 2.5 pptv in 2005 (Dorf et al., ACP 8, 7265, 2008) and the slow halon decline since",
  },
  NOy: {
    z_km: [0, 10, 12, 14, 16, 18, 20, 25, 30, 35, 40, 45, 50, 55, 60, 70, 80, 86],
    mixingRatio: [
      0.5e-9, 0.58e-9, 0.95e-9, 1.33e-9, 2.0e-9, 3.2e-9, 5.1e-9, 10.5e-9, 16e-9, 17.5e-9, 17e-9, 15e-9, 12e-9, 9e-9,
      6e-9, 2.5e-9, 1e-9, 1e-9,
    ],
    source:
      "approximate, from memory: mid-latitude NOy peaking at 15–20 ppbv near 30–40 km; at 10–25 km from this climatology's N2O by the compact lower-stratosphere correlation NOy ≈ 0.5 ppbv + 0.075·(336 ppbv − N2O) (slope within the −0.06 to −0.09 of mid-latitude aircraft measurements, e.g. Fahey et al. 1990, Nature 344, 321; from memory), which joins the 16 ppbv at 30 km",
  },
};

/**
 * Quantum yields as nodes (nm, yield), interpolated linearly between nodes;
 * below the first node the first value holds, above the last node the last
 * value holds. Approximate, from memory (JPL-evaluation-like, ≈ 298 K);
 * temperature dependence omitted except for O(1D) from O3 (o1dQuantumYield.ts).
 * Channels not listed here have a yield of 1 for the named products.
 */

type Nodes = ReadonlyArray<readonly [number, number]>;

export interface QuantumYieldTable {
  source: string;
  points: Nodes;
}

export const QUANTUM_YIELDS = {
  /** NO2 → NO + O(3P): 1 up to ~395 nm, falling to 0 by ~425 nm (298 K). */
  NO2: {
    source: "approximate, from memory: unity below 395 nm, falling to ~0 by 425 nm at 298 K",
    points: [
      [395, 1.0],
      [398, 0.95],
      [400, 0.89],
      [402, 0.81],
      [404, 0.7],
      [406, 0.55],
      [408, 0.4],
      [410, 0.27],
      [412, 0.18],
      [415, 0.09],
      [420, 0.03],
      [424, 0.01],
      [430, 0.0],
    ],
  },
  /** NO3 → NO + O2 */
  NO3_NO: {
    source:
      "approximate, from memory: only between ~585 and 640 nm, at most ~0.2 (halved from a remembered ~0.35 so that J(NO3 → NO + O2) is near the typical ~0.02 s⁻¹)",
    points: [
      [584, 0.0],
      [590, 0.08],
      [595, 0.15],
      [600, 0.18],
      [610, 0.15],
      [620, 0.1],
      [630, 0.05],
      [640, 0.02],
      [645, 0.0],
    ],
  },
  /** NO3 → NO2 + O */
  NO3_NO2: {
    source: "approximate, from memory: unity below 585 nm, falling to ~0 by 680 nm as fluorescence takes over",
    points: [
      [584, 1.0],
      [590, 0.8],
      [595, 0.6],
      [600, 0.55],
      [610, 0.45],
      [620, 0.35],
      [630, 0.3],
      [640, 0.25],
      [650, 0.15],
      [660, 0.1],
      [670, 0.05],
      [680, 0.0],
    ],
  },
  /** HCHO → H + HCO */
  HCHO_H: {
    source: "approximate, from memory",
    points: [
      [250, 0.3],
      [270, 0.5],
      [290, 0.7],
      [300, 0.75],
      [320, 0.7],
      [330, 0.55],
      [335, 0.45],
      [340, 0.3],
      [345, 0.1],
      [350, 0.0],
    ],
  },
  /** HCHO → H2 + CO */
  HCHO_H2: {
    source: "approximate, from memory",
    points: [
      [250, 0.5],
      [270, 0.45],
      [290, 0.3],
      [300, 0.25],
      [320, 0.3],
      [330, 0.45],
      [335, 0.55],
      [340, 0.65],
      [345, 0.7],
      [350, 0.6],
      [355, 0.4],
      [360, 0.15],
      [365, 0.0],
    ],
  },
} as const satisfies Record<string, QuantumYieldTable>;

/** BrONO2 → Br + NO3 (the rest BrO + NO2); approximate, from memory (JPL: ~0.85). */
export const BRONO2_BR_YIELD = 0.85;

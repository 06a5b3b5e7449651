/**
 * Turns a rate as written in a document (JPL symbols: A, E/R, k0, n, kinf, m,
 * Fc; γ of an uptake) into the `RateLaw` data the kinetics module evaluates, and warns about
 * parameter values that suggest a unit mistake. Ranges are common practice for
 * gas-phase atmospheric kinetics (molecule cm⁻³ units, NASA/JPL 19-5 tables).
 */
import type { RateLaw } from "../kinetics/types";
import type { DiagnosticSink, DocPath } from "./diagnostics";
import type { RateEntry } from "./types";

/** Plausible ranges of parameters, by kinetic order where it matters. */
export const PLAUSIBLE = {
  /** s⁻¹ (unimolecular A) */
  A1: [1e-12, 1e20],
  /** cm³ molecule⁻¹ s⁻¹ (bimolecular A) */
  A2: [1e-20, 1e-8],
  /** cm⁶ molecule⁻² s⁻¹ (A of an Arrhenius term written with + M, or a third-order reaction) */
  A3: [1e-40, 1e-28],
  /** cm⁶ molecule⁻² s⁻¹ */
  k0: [1e-40, 1e-26],
  /** cm³ molecule⁻¹ s⁻¹ */
  kinf: [1e-16, 1e-8],
  /** cm³ molecule⁻¹ s⁻¹ (chemical activation k0) */
  k0act: [1e-20, 1e-8],
  /** s⁻¹ (chemical activation k∞) */
  kinfAct: [1, 1e20],
  /** cm³ molecule⁻¹ (equilibrium constant A) */
  KA: [1e-35, 1e-18],
  /** |E/R|, K */
  EoverR: 25000,
  /** |n|, |m| */
  exponent: 15,
  /** fixed J, s⁻¹ */
  J: 1,
} as const;

const unitsOf: Record<string, string> = {
  A1: "s⁻¹",
  A2: "cm³ molecule⁻¹ s⁻¹",
  A3: "cm⁶ molecule⁻² s⁻¹",
  k0: "cm⁶ molecule⁻² s⁻¹",
  kinf: "cm³ molecule⁻¹ s⁻¹",
  k0act: "cm³ molecule⁻¹ s⁻¹",
  kinfAct: "s⁻¹",
  KA: "cm³ molecule⁻¹",
};

function range(sink: DiagnosticSink, path: DocPath, value: number, key: keyof typeof unitsOf, what: string): void {
  const [lo, hi] = PLAUSIBLE[key as keyof typeof PLAUSIBLE] as readonly [number, number];
  if (value < lo || value > hi) {
    sink.warn(
      path,
      "unit-suspect",
      `${what} = ${value} is outside ${lo}–${hi} ${unitsOf[key]}, which suggests a unit mistake (molecule cm⁻³ units expected)`,
    );
  }
}

/** The gases of a surface reaction, from its equation. */
export interface SurfaceGases {
  /** g mol⁻¹ */
  gasMolarMass_gmol: number;
  /** the second reactant (e.g. HCl), if the equation has one */
  partner?: { species: string; molarMass_gmol: number };
}

/** Uptake probabilities below this are kept but suggest a typing slip (common practice: measured γ ≥ 1e-6). */
export const GAMMA_FLOOR = 1e-6;
/** Plausible particle radii of the liquid-aerosol law, µm (stratospheric sulfate and STS; common practice). */
export const RADIUS_RANGE_um = [0.01, 10] as const;

/**
 * The compiled law. `order` is the number of concentration factors the rate
 * multiplies (reactants plus M for an Arrhenius law written with + M);
 * `forward` resolves a reverse rate's forward reaction id to its law.
 */
export function rateLawFromEntry(
  e: RateEntry,
  path: DocPath,
  order: number,
  sink: DiagnosticSink,
  forward: (id: string) => RateLaw | undefined,
  /** for a surface law: the gas taken up (its molar mass, g mol⁻¹) and its gas-phase partner, if any */
  surface?: SurfaceGases,
): RateLaw | undefined {
  const gasMolarMass_gmol = surface?.gasMolarMass_gmol;
  const expo = (v: number | undefined, key: string) => {
    if (v !== undefined && Math.abs(v) > PLAUSIBLE.exponent) {
      sink.warn([...path, key], "unit-suspect", `${key} = ${v} is an unusually large temperature exponent`);
    }
  };
  const fc = (v: number | undefined) => {
    if (v !== undefined && v > 1)
      sink.error([...path, "Fc"], "range", `Fc is a broadening factor in (0, 1], found ${v}`);
  };
  switch (e.law) {
    case "arrhenius": {
      const EoverR_K = e["E/R"] ?? 0;
      if (Math.abs(EoverR_K) > PLAUSIBLE.EoverR) {
        sink.warn(
          [...path, "E/R"],
          "unit-suspect",
          `E/R = ${EoverR_K} K is very large; E/R is the activation energy over R, in K`,
        );
      }
      const key = order <= 1 ? "A1" : order === 2 ? "A2" : "A3";
      range(
        sink,
        [...path, "A"],
        e.A,
        key,
        order <= 1 ? "a unimolecular A" : order === 2 ? "a bimolecular A" : "a third-order A",
      );
      expo(e.b, "b");
      const law: RateLaw = { law: "arrhenius", A: e.A, EoverR_K };
      if (e.b !== undefined && e.b !== 0) law.b = e.b;
      return law;
    }
    case "termolecular": {
      range(sink, [...path, "k0"], e.k0, "k0", "k0");
      if (e.kinf !== undefined) range(sink, [...path, "kinf"], e.kinf, "kinf", "kinf");
      if (e.m !== undefined && e.kinf === undefined) {
        sink.warn([...path, "m"], "unused", "m is given without kinf; the low-pressure limit ignores it");
      }
      expo(e.n, "n");
      expo(e.m, "m");
      fc(e.Fc);
      const law: RateLaw = { law: "termolecular", k0_300: e.k0, n: e.n ?? 0 };
      if (e.kinf !== undefined) {
        law.kinf_300 = e.kinf;
        law.m = e.m ?? 0;
      }
      if (e.Fc !== undefined) law.Fc = e.Fc;
      return law;
    }
    case "chemical-activation": {
      range(sink, [...path, "k0"], e.k0, "k0act", "k0 of a chemical-activation channel");
      range(sink, [...path, "kinf"], e.kinf, "kinfAct", "kinf of a chemical-activation channel");
      expo(e.n, "n");
      expo(e.m, "m");
      fc(e.Fc);
      const law: RateLaw = { law: "chemical-activation", k0_300: e.k0, n: e.n ?? 0, kinf_300: e.kinf, m: e.m ?? 0 };
      if (e.Fc !== undefined) law.Fc = e.Fc;
      return law;
    }
    case "lindemann": {
      range(sink, [...path, "low", "A"], e.low.A, "A3", "the low-pressure A");
      range(sink, [...path, "high", "A"], e.high.A, "A2", "the high-pressure A");
      return {
        law: "lindemann",
        low: { A: e.low.A, EoverR_K: e.low["E/R"] ?? 0 },
        high: { A: e.high.A, EoverR_K: e.high["E/R"] ?? 0 },
      };
    }
    case "equilibrium-reverse": {
      range(sink, [...path, "K", "A"], e.K.A, "KA", "the equilibrium constant's A");
      let fwd: RateLaw | undefined;
      if (typeof e.forward === "string") {
        fwd = forward(e.forward);
        if (!fwd) return undefined;
      } else {
        fwd = rateLawFromEntry(e.forward, [...path, "forward"], 2, sink, forward);
        if (!fwd) return undefined;
      }
      return { law: "equilibrium-reverse", forward: fwd, Keq_A_cm3: e.K.A, Keq_B_K: e.K.B };
    }
    case "uptake": {
      if (gasMolarMass_gmol === undefined) {
        sink.error(
          [...path, "law"],
          "uptake",
          "an uptake rate needs one gas reactant of known composition (its molar mass sets the molecular speed)",
        );
        return undefined;
      }
      if (e.gamma < GAMMA_FLOOR)
        sink.warn(
          [...path, "gamma"],
          "implausible",
          `gamma = ${e.gamma} is below ${GAMMA_FLOOR}: no measured uptake is this small`,
        );
      const law: RateLaw = { law: "uptake", gamma: e.gamma, molarMass_gmol: gasMolarMass_gmol };
      if (e.surface && e.surface !== "sulfate") law.surface = e.surface;
      if (surface?.partner) law.partner = surface.partner;
      return law;
    }
    case "liquid-aerosol": {
      if (gasMolarMass_gmol === undefined) {
        sink.error([...path, "law"], "uptake", "a liquid-aerosol rate needs the gas taken up as its first reactant");
        return undefined;
      }
      const law: RateLaw = { law: "liquid-aerosol", process: e.process, molarMass_gmol: gasMolarMass_gmol };
      if (e.radius_um !== undefined) {
        const [lo, hi] = RADIUS_RANGE_um;
        if (e.radius_um < lo || e.radius_um > hi)
          sink.warn(
            [...path, "radius_um"],
            "implausible",
            `radius_um = ${e.radius_um} µm is outside ${lo}–${hi} µm, the sizes of stratospheric liquid particles`,
          );
        law.radius_cm = e.radius_um * 1e-4;
      }
      return law;
    }
    case "photolysis": {
      if (e.J !== undefined) {
        if (e.J > PLAUSIBLE.J)
          sink.warn(
            [...path, "J"],
            "unit-suspect",
            `a fixed J of ${e.J} s⁻¹ is larger than any atmospheric photolysis frequency`,
          );
        return { law: "photolysis-fixed", J_s: e.J };
      }
      const law: RateLaw = { law: "photolysis", channel: e.channel! };
      if (e.factor !== undefined && e.factor !== 1) law.factor = e.factor;
      return law;
    }
  }
}

/**
 * The photolysis channels every built-in mechanism may use (the shared names
 * of the project), with their products and the data each J is built from.
 */

import { HNO3_SOURCE } from "./hno3CrossSection";

export interface PhotolysisChannel {
  /** channel id, e.g. "O3_O1D" */
  id: string;
  /** the photolysed molecule */
  molecule: string;
  /** reaction written out */
  reaction: string;
  /** cross section and quantum yield used, with their sources */
  data: string;
}

const YIELD_1 = "quantum yield 1 for the named products (all photolysis assigned to this channel)";

export const PHOTOLYSIS_CHANNELS: readonly PhotolysisChannel[] = [
  {
    id: "O2",
    molecule: "O2",
    reaction: "O2 + hv -> 2 O",
    data: "Lyman-α (σ = 1e-20 cm²), Schumann–Runge continuum table, Schumann–Runge bands by a log-uniform opacity distribution per 500 cm⁻¹ interval (Fang et al. 1974 method), Herzberg continuum to 242 nm; all approximate, from memory; yield 1",
  },
  {
    id: "O3_O1D",
    molecule: "O3",
    reaction: "O3 + hv -> O(1D) + O2",
    data: "O3 cross section with Huggins-band T dependence (approximate, from memory) × O(1D) yield of Matsumi et al. 2002",
  },
  {
    id: "O3_O",
    molecule: "O3",
    reaction: "O3 + hv -> O + O2",
    data: "O3 cross section (approximate, from memory) × (1 − O(1D) yield)",
  },
  {
    id: "NO2",
    molecule: "NO2",
    reaction: "NO2 + hv -> NO + O",
    data: "cross section and yield approximate, from memory",
  },
  {
    id: "NO3_NO",
    molecule: "NO3",
    reaction: "NO3 + hv -> NO + O2",
    data: "cross section and yield approximate, from memory",
  },
  {
    id: "NO3_NO2",
    molecule: "NO3",
    reaction: "NO3 + hv -> NO2 + O",
    data: "cross section and yield approximate, from memory",
  },
  { id: "N2O5", molecule: "N2O5", reaction: "N2O5 + hv -> NO2 + NO3", data: `approximate, from memory; ${YIELD_1}` },
  {
    id: "HNO3",
    molecule: "HNO3",
    reaction: "HNO3 + hv -> OH + NO2",
    data: `${HNO3_SOURCE}; ${YIELD_1}`,
  },
  {
    id: "HO2NO2",
    molecule: "HO2NO2",
    reaction: "HO2NO2 + hv -> HO2 + NO2",
    data: `approximate, from memory; ${YIELD_1} (JPL gives ~0.2 to OH + NO3); near-infrared overtone photolysis omitted`,
  },
  { id: "H2O2", molecule: "H2O2", reaction: "H2O2 + hv -> 2 OH", data: `approximate, from memory; ${YIELD_1}` },
  { id: "HOCl", molecule: "HOCl", reaction: "HOCl + hv -> OH + Cl", data: `approximate, from memory; ${YIELD_1}` },
  {
    id: "ClONO2_Cl",
    molecule: "ClONO2",
    reaction: "ClONO2 + hv -> Cl + NO3",
    data: "cross section approximate, from memory; yield 0.6 below 308 nm, 7.143e-3·λ − 1.6 for 308–364 nm, 1 above (JPL expression, from memory)",
  },
  {
    id: "ClONO2_ClO",
    molecule: "ClONO2",
    reaction: "ClONO2 + hv -> ClO + NO2",
    data: "cross section approximate, from memory; yield 1 − yield(Cl + NO3)",
  },
  {
    id: "Cl2O2",
    molecule: "Cl2O2",
    reaction: "Cl2O2 + hv -> Cl + ClOO",
    data: `approximate, from memory; ${YIELD_1} (JPL gives ~0.8–0.9 for Cl + ClOO)`,
  },
  { id: "OClO", molecule: "OClO", reaction: "OClO + hv -> O + ClO", data: `approximate, from memory; ${YIELD_1}` },
  {
    id: "Cl2",
    molecule: "Cl2",
    reaction: "Cl2 + hv -> 2 Cl",
    data: "Maric et al. 1993 two-band expression with T dependence (JPL-recommended, constants from memory); yield 1",
  },
  {
    id: "HCl",
    molecule: "HCl",
    reaction: "HCl + hv -> H + Cl",
    data: "approximate, from memory; yield 1; Lyman-α omitted",
  },
  { id: "BrO", molecule: "BrO", reaction: "BrO + hv -> Br + O", data: `approximate, from memory; ${YIELD_1}` },
  { id: "HOBr", molecule: "HOBr", reaction: "HOBr + hv -> OH + Br", data: `approximate, from memory; ${YIELD_1}` },
  {
    id: "BrONO2_Br",
    molecule: "BrONO2",
    reaction: "BrONO2 + hv -> Br + NO3",
    data: "approximate, from memory; yield 0.85",
  },
  {
    id: "BrONO2_BrO",
    molecule: "BrONO2",
    reaction: "BrONO2 + hv -> BrO + NO2",
    data: "approximate, from memory; yield 0.15",
  },
  {
    id: "BrCl",
    molecule: "BrCl",
    reaction: "BrCl + hv -> Br + Cl",
    data: `two log-normal bands, approximate, from memory; ${YIELD_1}`,
  },
  {
    id: "N2O",
    molecule: "N2O",
    reaction: "N2O + hv -> N2 + O(1D)",
    data: "Selwyn et al. 1977 polynomial with T dependence (JPL-recommended, coefficients from memory); yield 1",
  },
  {
    id: "H2O",
    molecule: "H2O",
    reaction: "H2O + hv -> H + OH",
    data: `Lyman-α σ = 1.5e-17 cm² and a 125–205 nm table, approximate, from memory; ${YIELD_1}`,
  },
  {
    id: "NO",
    molecule: "NO",
    reaction: "NO + hv -> N + O",
    data: "δ(0,0) and δ(1,0) band predissociation as an effective σ·φ in two Schumann–Runge intervals, scaled to ~5e-6 s⁻¹ unattenuated (order of Minschwaner & Siskind 1993), approximate, from memory",
  },
  {
    id: "HCHO_H",
    molecule: "HCHO",
    reaction: "HCHO + hv -> H + HCO",
    data: "cross section and yield approximate, from memory",
  },
  {
    id: "HCHO_H2",
    molecule: "HCHO",
    reaction: "HCHO + hv -> H2 + CO",
    data: "cross section and yield approximate, from memory",
  },
  {
    id: "CH3OOH",
    molecule: "CH3OOH",
    reaction: "CH3OOH + hv -> CH3O + OH",
    data: `approximate, from memory; ${YIELD_1}`,
  },
  {
    id: "CFCl3",
    molecule: "CFCl3",
    reaction: "CFCl3 + hv -> Cl + products",
    data: "approximate, from memory; T dependence omitted; yield 1",
  },
  {
    id: "CF2Cl2",
    molecule: "CF2Cl2",
    reaction: "CF2Cl2 + hv -> Cl + products",
    data: "approximate, from memory; T dependence omitted; yield 1",
  },
];

/** Every channel id, in the order of the shared list. */
export const photolysisChannels: string[] = PHOTOLYSIS_CHANNELS.map((c) => c.id);

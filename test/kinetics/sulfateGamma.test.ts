/**
 * Liquid sulfate composition and the γ of ClONO2 and HOCl after Shi et al.
 * (2001, J. Geophys. Res. 106, 24259) as recommended in JPL 19-5, Section 5
 * (coefficients from memory). Worked values are recomputed by hand from the
 * published fit; docs/references.md, "Heterogeneous chemistry".
 */
import { describe, expect, it } from "vitest";
import { partnerLimitedGamma, sulfateComposition, sulfateGammas } from "@/lib/kinetics";
import { expectClose } from "../helpers/close";

/** 50 hPa in atm and the partial pressures of the check: 5 ppmv H2O, 1.5 ppbv HCl, 1 ppbv ClONO2 */
const P_atm = 50 / 1013.25;
const state = (T_K: number, hcl = 1.5e-9, clono2 = 1e-9) => ({
  T_K,
  pH2O_atm: 5e-6 * P_atm,
  pHCl_atm: hcl * P_atm,
  pClONO2_atm: clono2 * P_atm,
});

describe("sulfate composition (Shi et al. 2001, Appendix; from memory)", () => {
  it("gives 59.5 wt % H2SO4 at 200 K and 42.5 wt % at 190 K for 5 ppmv H2O at 50 hPa (recomputed by hand from the fit)", () => {
    // 200 K: p° = 3.16e-3 mbar, a_w = 0.079, m = 14.96 mol/kg → 59.5 wt %
    const warm = sulfateComposition(200, 5e-6 * P_atm);
    expectClose(warm.waterActivity, 0.079, { rel: 0.01 });
    expectClose(warm.wt_percent, 59.5, { abs: 0.2 });
    // 190 K: p° = 6.7e-4 mbar, a_w = 0.373, m = 7.54 mol/kg → 42.5 wt %
    const cold = sulfateComposition(190, 5e-6 * P_atm);
    expectClose(cold.waterActivity, 0.373, { rel: 0.01 });
    expectClose(cold.wt_percent, 42.5, { abs: 0.2 });
  });

  it("dilutes as the air cools toward the frost point: the water uptake of cold sulfate (common practice)", () => {
    const wt = [220, 210, 200, 195, 190, 188].map((T) => sulfateComposition(T, 5e-6 * P_atm).wt_percent);
    for (let i = 1; i < wt.length; i++) expect(wt[i]).toBeLessThan(wt[i - 1]);
    expect(wt[0]).toBeGreaterThan(70); // about 75 wt % in warm background air
    expect(wt[wt.length - 1]).toBeLessThan(40);
  });
});

describe("γ on liquid sulfate (JPL 19-5 §5 after Shi et al. 2001; from memory)", () => {
  it("makes ClONO2 + H2O about 4e-4 at 220 K and about 0.01 at 200 K, the range of the evaluation's figure (from memory)", () => {
    const g220 = sulfateGammas(state(220)).ClONO2_H2O;
    expect(g220).toBeGreaterThan(1e-4);
    expect(g220).toBeLessThan(1e-3);
    const g200 = sulfateGammas(state(200)).ClONO2_H2O;
    expect(g200).toBeGreaterThan(3e-3);
    expect(g200).toBeLessThan(3e-2);
  });

  it("grows steeply as T falls toward the frost point: ClONO2 + HCl and HOCl + HCl rise by more than 100× from 205 to 192 K and exceed 0.05 there", () => {
    const at205 = sulfateGammas(state(205));
    const at192 = sulfateGammas(state(192));
    expect(at192.ClONO2_HCl / at205.ClONO2_HCl).toBeGreaterThan(100);
    expect(at192.HOCl_HCl / at205.HOCl_HCl).toBeGreaterThan(100);
    expect(at192.ClONO2_HCl).toBeGreaterThan(0.05);
    const temps = [215, 210, 205, 200, 196, 192, 189];
    const g = temps.map((T) => sulfateGammas(state(T)).ClONO2_HCl);
    for (let i = 1; i < g.length; i++) expect(g[i]).toBeGreaterThan(g[i - 1]);
  });

  it("keeps every γ in [0, 1], the total ClONO2 γ below 1 and its two channels summing to it", () => {
    for (const T of [185, 190, 195, 200, 210, 230, 260]) {
      const g = sulfateGammas(state(T));
      for (const v of Object.values(g)) {
        expect(v).toBeGreaterThanOrEqual(0);
        expect(v).toBeLessThanOrEqual(1);
      }
      expect(g.ClONO2_H2O + g.ClONO2_HCl).toBeLessThan(1);
    }
  });

  it("makes the HCl channels vanish linearly as HCl → 0 (the rate is limited by the HCl that arrives), hydrolysis staying", () => {
    const a = sulfateGammas(state(192, 1e-12));
    const b = sulfateGammas(state(192, 2e-12));
    expectClose(b.ClONO2_HCl / a.ClONO2_HCl, 2, { rel: 0.02 });
    expectClose(b.HOCl_HCl / a.HOCl_HCl, 2, { rel: 0.02 });
    expect(sulfateGammas(state(192, 0)).ClONO2_HCl).toBe(0);
    expect(sulfateGammas(state(192, 0)).ClONO2_H2O).toBeGreaterThan(0.01);
  });
});

describe("partner-limited γ (after the HCl depletion factor of Shi et al. 2001)", () => {
  it("is the evaluation's γ when the partner is plentiful and the partner's collision limit when it is scarce", () => {
    // ClONO2 97.46 g/mol, HCl 36.46 g/mol: √(36.46/97.46) = 0.612 (Shi et al. 2001)
    expectClose(partnerLimitedGamma(0.2, 1, 97.46, 1e6, 36.46), 0.2, { rel: 1e-6 });
    // [HCl] → 0: γ[ClONO2] v̄_ClONO2 → [HCl] v̄_HCl, i.e. γ_eff → [HCl]/(0.612 [ClONO2])
    expectClose(partnerLimitedGamma(0.2, 1e9, 97.46, 1e3, 36.46), 1e3 / (0.6116 * 1e9), { rel: 1e-3 });
    expect(partnerLimitedGamma(0.2, 1e9, 97.46, 0, 36.46)).toBe(0);
  });
});

import { describe, expect, it } from "vitest";
import { airScaleHeight_km, DEMO_PROFILES } from "../../lib/atmosphere";
import { expectClose } from "../helpers/close";

describe("the invented demo profiles", () => {
  it("say that they are invented demo data", () => {
    expect(DEMO_PROFILES.length).toBe(2);
    for (const d of DEMO_PROFILES) {
      expect(d.provenance).toMatch(/invented demo data/);
      expect(d.title).toMatch(/demo/i);
    }
    expect(new Set(DEMO_PROFILES.map((d) => d.id)).size).toBe(2);
  });

  it("are hydrostatic: ln(p₁/p₂) = Δz/H at the mean temperature (within 0.5 %)", () => {
    for (const d of DEMO_PROFILES) {
      for (let i = 1; i < d.levels.length; i++) {
        const a = d.levels[i - 1];
        const b = d.levels[i];
        const H = airScaleHeight_km((a.z_km + b.z_km) / 2, (a.T_K + b.T_K) / 2);
        expectClose(Math.log(a.p_hPa / b.p_hPa), (b.z_km - a.z_km) / H, { rel: 5e-3 }, `${d.id} at ${b.z_km} km`);
      }
    }
  });
});

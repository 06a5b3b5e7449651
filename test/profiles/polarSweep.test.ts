/**
 * A sweep with the automatic cloud type decides the cloud at each level from
 * that level's temperature (docs/heterogeneous.md, "Clouds in the
 * conditions"). The profile is invented: a cold vortex column.
 */
import { describe, expect, it } from "vitest";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import { parseProfileCsv } from "@/lib/profiles/parseProfileCsv";
import { planSweep } from "@/lib/profiles/planSweep";
import { runLevelBatch } from "@/lib/profiles/runLevelBatch";
import { inlineExecutor, runSweep } from "@/lib/profiles/runSweep";

/** invented cold column: NAT-cold at 18 km, ice-cold at 20 km, warm at 24 km (5 ppmv H2O) */
const CSV = "altitude (km),T (K),p (hPa),H2O (ppmv)\n18,193,70,5\n20,187,55,5\n24,205,30,5\n";

describe("polar clouds in a profile sweep", () => {
  it("finds NAT, ice and none at the levels whose temperature calls for them", async () => {
    const mech = loadBuiltinMechanism("reference").mechanism;
    const ref = { id: "reference", title: mech.title };
    const profile = parseProfileCsv(CSV);
    const plan = planSweep(
      {
        mechanismId: "reference",
        profile: { kind: "csv", csv: CSV },
        grid: { step_km: 2 },
        condition: { cloud: "auto", latitude_deg: 70 },
      },
      profile,
      mech,
    );
    const result = await runSweep(
      plan,
      inlineExecutor((b) => runLevelBatch(mech, ref, b), 1),
      {
        engineVersion: "test",
        mechanism: ref,
        profile: { id: "invented", title: "invented cold column", source: "upload", demo: false, note: "" },
      },
      { parallel: "sequential" },
    );
    const at = (z: number) => result.levels.find((l) => l.altitude_km === z);
    expect(at(18)?.condition?.cloud).toBe("NAT");
    expect(at(20)?.condition?.cloud).toBe("ice");
    expect(at(24)?.condition?.cloud).toBeUndefined();
    expect(at(20)?.condition?.cloudSurface_um2cm3).toBe(200);
  }, 120000);
});

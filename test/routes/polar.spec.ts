import { expect, test } from "@playwright/test";

/**
 * The cloud fields and the surface laws through the JSON routes: bad values
 * are 400s that name the field (and, for documents, the line); the OpenAPI
 * document describes the cloud fields.
 */
test.describe("polar clouds and surface laws over HTTP", () => {
  test("a cloud type or cloud surface out of range is a 400 naming the field", async ({ request }) => {
    const cases: [Record<string, unknown>, string][] = [
      [{ altitude_km: 19, cloud: "cirrus" }, "condition.cloud"],
      [{ altitude_km: 19, cloud: "ice", cloudSurface_um2cm3: 2e4 }, "condition.cloudSurface_um2cm3"],
      [{ altitude_km: 19, T_K: 192, cloud: "NAT", cloudSurface_um2cm3: 500 }, "condition.cloudSurface_um2cm3"],
    ];
    for (const [condition, path] of cases) {
      const r = await request.post("/api/analyses", { data: { mechanismId: "reference", condition } });
      expect(r.status(), JSON.stringify(condition)).toBe(400);
      const { error } = await r.json();
      expect(error.path).toBe(path);
      expect(error.message.length).toBeGreaterThan(10);
    }
  });

  test("a surface law with a missing parameter is refused with its field and line", async ({ request }) => {
    const text = [
      "title: surface law test",
      'version: "1"',
      "description: a liquid-aerosol law without its process",
      "species:",
      "  - { id: H2O, role: held, mixingRatio: 5e-6 }",
      "  - { id: HNO3, role: held, mixingRatio: 1e-9 }",
      "  - { id: HCl, role: solved }",
      "  - { id: ClONO2, role: solved }",
      "  - { id: Cl2, role: solved }",
      "reactions:",
      "  - id: S1",
      "    equation: ClONO2 + HCl -> Cl2 + HNO3",
      "    rate: { law: liquid-aerosol }",
      "    source: test",
      "",
    ].join("\n");
    const r = await request.post("/api/mechanisms", { data: { text } });
    expect(r.status()).toBe(400);
    const { error } = await r.json();
    expect(error.message).toMatch(/process/);
    expect(error.line).toBe(13);
  });

  test("the OpenAPI document describes the cloud fields", async ({ request }) => {
    const text = JSON.stringify(await (await request.get("/api/openapi.json")).json());
    expect(text).toContain("cloudSurface_um2cm3");
    expect(text).toContain('"NAT"');
  });

  test("the invented vortex parcel converges over HTTP with ice clouds", async ({ request }) => {
    const condition = {
      altitude_km: 19,
      T_K: 190,
      latitude_deg: 70,
      date: "2026-03-01",
      localSolarTime_h: 12,
      cloud: "auto",
      held: { H2O: 6e-6 },
      poolTotals: { Cly: 3.3e-9, Bry: 2e-11, NOy: 1e-8 },
    };
    const r = await request.post("/api/analyses", { data: { mechanismId: "reference", condition } });
    expect(r.status()).toBe(201);
    const { result } = await r.json();
    expect(result.steadyState.status).toBe("converged");
    expect(result.condition.cloud.present).toBe("ice");
  });
});

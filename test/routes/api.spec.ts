import { expect, test } from "@playwright/test";

// Route tests against the really started production server (playwright.config.ts webServer). No mocks.

const at40 = {
  mechanismId: "reference",
  condition: { altitude_km: 40, latitude_deg: 45, date: "2026-03-20", localSolarTime_h: 12 },
};

test.describe("service routes", () => {
  test("health answers JSON with versions and the built-in mechanisms", async ({ request }) => {
    const r = await request.get("/api/health");
    expect(r.status()).toBe(200);
    const body = await r.json();
    expect(body.status).toBe("ok");
    expect(body.engineVersion).toMatch(/^\d+\.\d+\.\d+$/);
    expect(body.builtinMechanisms.map((m: { id: string }) => m.id)).toEqual(
      expect.arrayContaining(["oxygen", "oxygen-chlorine", "reference"]),
    );
  });

  test("the OpenAPI document describes every route", async ({ request }) => {
    const doc = await (await request.get("/api/openapi.json")).json();
    expect(doc.openapi).toBe("3.1.0");
    for (const p of [
      "/api/mechanisms",
      "/api/mechanisms/{id}",
      "/api/analyses",
      "/api/analyses/{id}",
      "/api/analyses/{id}/rates.csv",
    ])
      expect(Object.keys(doc.paths)).toContain(p);
  });

  test("the mechanism list has the built-ins with their sizes", async ({ request }) => {
    const body = await (await request.get("/api/mechanisms")).json();
    const ref = body.mechanisms.find((m: { id: string }) => m.id === "reference");
    expect(ref.builtin).toBe(true);
    expect(ref.speciesCount).toBeGreaterThanOrEqual(30);
    expect(ref.reactionCount).toBeGreaterThanOrEqual(80);
  });

  test("an analysis is computed, stored, fetched and exported with units in the CSV headers", async ({ request }) => {
    const created = await request.post("/api/analyses", { data: at40 });
    expect(created.status()).toBe(201);
    const { id, result } = await created.json();
    expect(id).toMatch(/^[A-Za-z0-9_-]{16}$/);
    expect(result.steadyState.status).toBe("converged");
    expect(result.cycles.cycles.length).toBeGreaterThan(0);
    const fractions = result.cycles.budget.byFamily.reduce((s: number, f: { fraction: number }) => s + f.fraction, 0);
    expect(Math.abs(fractions - 1)).toBeLessThan(1e-9);

    const fetched = await (await request.get(`/api/analyses/${id}`)).json();
    expect(fetched.result.steadyState.numberDensity_cm3).toEqual(result.steadyState.numberDensity_cm3);
    expect(fetched.request.condition.altitude_km).toBe(40);

    const rates = await request.get(`/api/analyses/${id}/rates.csv?comments=none`);
    expect(rates.headers()["content-type"]).toContain("text/csv");
    const lines = (await rates.text()).trim().split(/\r\n/);
    expect(lines[0]).toContain("rate (molecules cm-3 s-1)");
    expect(lines.length).toBe(result.steadyState.reactions.length + 1);
    expect(
      (await (await request.get(`/api/analyses/${id}/species.csv?comments=none`)).text()).split("\r\n")[0],
    ).toContain("number_density (molecules cm-3)");
    expect(
      (await (await request.get(`/api/analyses/${id}/cycles.csv?comments=none`)).text()).split("\r\n")[0],
    ).toContain("chain_length");
    const json = await request.get(`/api/analyses/${id}.json`);
    expect(json.headers()["content-disposition"]).toContain("attachment");
    expect((await json.json()).id).toBe(id);
  });

  test("an out-of-range condition is a 400 naming the field, and nothing is stored", async ({ request }) => {
    const cases: [Record<string, unknown>, string][] = [
      [{ altitude_km: 100 }, "condition.altitude_km"],
      [{ altitude_km: 30, T_K: 400 }, "condition.T_K"],
      [{ altitude_km: 30, p_hPa: -1 }, "condition.p_hPa"],
      [{ altitude_km: 30, zenith_deg: 200 }, "condition.zenith_deg"],
      [{ altitude_km: 30, latitude_deg: 91 }, "condition.latitude_deg"],
      [{ altitude_km: 30, date: "2026-13-45" }, "condition.date"],
    ];
    for (const [condition, path] of cases) {
      const r = await request.post("/api/analyses", { data: { mechanismId: "reference", condition } });
      expect(r.status(), path).toBe(400);
      const { error } = await r.json();
      expect(error.path).toBe(path);
      expect(error.code).toBe("invalid-request");
      expect(error.message.length).toBeGreaterThan(10);
    }
  });

  test("unknown ids are 404 with a JSON error", async ({ request }) => {
    for (const url of [
      "/api/analyses/AAAAAAAAAAAAAAAA",
      "/api/mechanisms/m-0000",
      "/api/analyses/AAAAAAAAAAAAAAAA/rates.csv",
    ]) {
      const r = await request.get(url);
      expect(r.status(), url).toBe(404);
      expect((await r.json()).error.code).toBe("not-found");
    }
    const r = await request.post("/api/analyses", {
      data: { mechanismId: "no-such-mechanism", condition: { altitude_km: 30 } },
    });
    expect(r.status()).toBe(404);
  });

  test("a body that is not JSON, or too large, is refused", async ({ baseURL }) => {
    // Raw bodies through fetch: the request fixture would re-encode a string body as JSON.
    const post = (body: string) =>
      fetch(`${baseURL}/api/analyses`, { method: "POST", headers: { "content-type": "application/json" }, body });
    const bad = await post("{not json");
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.code).toBe("invalid-json");
    const big = await post(
      JSON.stringify({ mechanismId: "reference", condition: { altitude_km: 30 }, pad: "x".repeat(300_000) }),
    );
    expect(big.status).toBe(413);
    expect((await big.json()).error.code).toBe("too-large");
  });

  test("50 concurrent analyses all complete, and equal conditions give equal numbers", async ({ request }) => {
    const altitudes = Array.from({ length: 50 }, (_, i) => 20 + (i % 5) * 10);
    const responses = await Promise.all(
      altitudes.map((z) =>
        request.post("/api/analyses", { data: { mechanismId: "reference", condition: { altitude_km: z } } }),
      ),
    );
    const bodies = await Promise.all(responses.map((r) => r.json()));
    for (const r of responses) expect(r.status()).toBe(201);
    const ids = new Set(bodies.map((b) => b.id));
    expect(ids.size).toBe(50);
    const byZ = new Map<number, number[]>();
    bodies.forEach((b, i) => {
      const o3Loss = b.result.cycles.budget.loss_cm3s as number;
      byZ.set(altitudes[i], [...(byZ.get(altitudes[i]) ?? []), o3Loss]);
    });
    for (const losses of byZ.values()) for (const l of losses) expect(l).toBe(losses[0]);
  });
});

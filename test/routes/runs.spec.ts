import { expect, test } from "@playwright/test";
import { finish } from "./finishJob";

// Route tests of runs over days against the started production server (no mocks).

const small = {
  mechanismId: "reference",
  condition: { altitude_km: 20, latitude_deg: 45, date: "2026-03-20" },
  days: 2,
};
const HEADER = "time_h,T_K,p_hPa,latitude_deg";

test.describe("run routes", () => {
  test("a run is queued, reports progress in days, is stored with a permalink, and exports CSV and JSON", async ({
    request,
  }) => {
    const r = await request.post("/api/runs", { data: small });
    expect(r.status()).toBe(202);
    const job = await r.json();
    expect(r.headers().location).toBe(job.statusUrl);
    const done = await finish(request, job.id);
    expect(done.state).toBe("done");
    expect(done.total).toBe(2);
    expect(done.resultUrl).toBe(`/runs/${done.resultId}`);
    expect(done.resultApiUrl).toBe(`/api/runs/${done.resultId}`);

    const rec = await (await request.get(`/api/runs/${done.resultId}`)).json();
    const result = rec.body.result;
    expect(result.status).toBe("ok");
    expect(result.hours.t_h).toHaveLength(2 * 24 + 1);
    expect(result.daily).toHaveLength(2);
    for (const d of result.daily) expect(d.closure).toBeLessThan(0.01);

    const daily = await request.get(`/api/runs/${done.resultId}/daily.csv?comments=none`);
    expect(daily.headers()["content-type"]).toContain("text/csv");
    const lines = (await daily.text()).trim().split("\r\n");
    expect(lines[0]).toContain("O3 change (ppbv/day)");
    expect(lines).toHaveLength(3);
    const hours = (await (await request.get(`/api/runs/${done.resultId}/hours.csv?comments=none`)).text()).split(
      "\r\n",
    );
    expect(hours[0]).toContain("O3 (ppbv)");
    expect((await request.get(`/api/runs/${done.resultId}/rates.csv`)).status()).toBe(200);
    expect((await request.get(`/api/runs/${done.resultId}/valueOf`)).status()).toBe(404);
    const json = await request.get(`/api/runs/${done.resultId}.json`);
    expect(json.headers()["content-disposition"]).toContain(`run-${done.resultId}.json`);

    const page = await request.get(`/runs/${done.resultId}`);
    expect(page.status()).toBe(200);
    // an hour opens as a stored analysis of that instant (not a steady state), with its own exports
    const hourPage = await request.get(`/runs/${done.resultId}/at/12`);
    expect(hourPage.status()).toBe(200);
    expect(hourPage.url()).toContain(`/a/${done.resultId}-h12`);
    const hour = await (await request.get(`/api/analyses/${done.resultId}-h12`)).json();
    expect(hour.result.steadyState.status).toBe("instant");
    expect(hour.result.steadyState.rate_cm3s).toEqual(result.hours.rate_cm3s[12]);
    expect((await request.get(`/api/analyses/${done.resultId}-h12/rates.csv`)).status()).toBe(200);
    expect((await request.get(`/runs/${done.resultId}/at/999`)).status()).toBe(404);
  });

  test("a bad trajectory names the row and the column; the limits give 4xx before anything is queued", async ({
    request,
  }) => {
    const bad = await request.post("/api/runs", {
      data: { ...small, trajectory: { csv: `${HEADER}\n0,200,50,70\n24,hot,50,70\n48,200,50,70\n` } },
    });
    expect(bad.status()).toBe(400);
    expect((await bad.json()).error.path).toBe('trajectory.csv row 3, column "T_K"');

    expect((await request.post("/api/runs", { data: { ...small, days: 61 } })).status()).toBe(400);
    const rows = Array.from({ length: 10_001 }, (_, i) => `${i / 2},200,50,70`).join("\n");
    const many = await request.post("/api/runs", { data: { ...small, trajectory: { csv: `${HEADER}\n${rows}\n` } } });
    expect(many.status()).toBe(400);
    expect((await many.json()).error.message).toContain("more than 10000 rows");
    const short = await request.post("/api/runs", {
      data: { ...small, trajectory: { csv: `${HEADER}\n0,200,50,70\n24,200,50,70\n` } },
    });
    expect(short.status()).toBe(400);
    expect((await short.json()).error.path).toBe("trajectory");
    expect((await request.get("/api/runs/AAAAAAAAAAAAAAAAAAAAAA")).status()).toBe(404);
  });

  test("a cancelled run stops within a second and stores nothing", async ({ request }) => {
    const job = await (await request.post("/api/runs", { data: { ...small, days: 60 } })).json();
    for (let i = 0; i < 300; i++) {
      const s = await (await request.get(`/api/jobs/${job.id}`)).json();
      if (s.done > 0) break;
      await new Promise((r) => setTimeout(r, 100));
    }
    const t0 = Date.now();
    const cancelled = await (await request.delete(`/api/jobs/${job.id}`)).json();
    const end = await finish(request, job.id);
    expect(Date.now() - t0).toBeLessThan(1000);
    expect(cancelled.state).toBe("cancelled");
    expect(end.state).toBe("cancelled");
    expect(end.resultId).toBeUndefined();
  });

  test("the catalogue offers the invented demos and the OpenAPI document describes the routes", async ({ request }) => {
    const cat = await (await request.get("/api/runs")).json();
    expect(cat.demos.map((d: { id: string }) => d.id)).toContain("invented-vortex-parcel");
    for (const d of cat.demos) expect(`${d.title} ${d.note}`.toLowerCase()).toContain("invented");
    const doc = await (await request.get("/api/openapi.json")).json();
    for (const p of ["/api/runs", "/api/runs/{id}", "/api/runs/{id}/daily.csv"]) expect(doc.paths[p]).toBeTruthy();
    expect(doc.components.schemas.RunRequest).toBeTruthy();
  });
});

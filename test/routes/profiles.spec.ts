import { expect, test } from "@playwright/test";
import { finish } from "./finishJob";

// Route tests of sweeps, comparisons and jobs against the started production server (no mocks).

const small = {
  mechanismId: "oxygen-chlorine",
  profile: { kind: "standard" },
  grid: { from_km: 30, to_km: 40, step_km: 5 },
};

test.describe("profile routes", () => {
  test("a sweep is queued, reports progress, is stored with a permalink and exports CSV", async ({ request }) => {
    const r = await request.post("/api/profiles", { data: small });
    expect(r.status()).toBe(202);
    const job = await r.json();
    expect(job.id).toMatch(/^[A-Za-z0-9_-]{16}$/);
    expect(job.statusUrl).toBe(`/api/jobs/${job.id}`);
    expect(r.headers().location).toBe(job.statusUrl);
    const done = await finish(request, job.id);
    expect(done.state).toBe("done");
    expect(done.done).toBe(3);
    expect(done.total).toBe(3);
    expect(done.resultUrl).toBe(`/profiles/${done.resultId}`);

    const rec = await (await request.get(`/api/profiles/${done.resultId}`)).json();
    const levels = rec.body.result.levels;
    expect(levels.map((l: { altitude_km: number }) => l.altitude_km)).toEqual([30, 35, 40]);
    for (const l of levels) {
      expect(l.status).toBe("converged");
      const sum = l.budget.byFamily.reduce((s: number, f: { fraction: number }) => s + f.fraction, 0);
      expect(Math.abs(sum - 1)).toBeLessThan(1e-9);
    }
    // a level equals a single analysis at its condition
    const single = await (await request.post("/api/analyses", { data: levels[1].request })).json();
    const rel =
      Math.abs(single.result.cycles.budget.loss_cm3s - levels[1].budget.loss_cm3s) / levels[1].budget.loss_cm3s;
    expect(rel).toBeLessThan(1e-6);

    const csv = await request.get(`/api/profiles/${done.resultId}/levels.csv?comments=none`);
    expect(csv.headers()["content-type"]).toContain("text/csv");
    const lines = (await csv.text()).trim().split("\r\n");
    expect(lines[0]).toContain("Ox loss (molecules cm-3 s-1)");
    expect(lines.length).toBe(4);
    expect(
      (await (await request.get(`/api/profiles/${done.resultId}/cycles.csv?comments=none`)).text()).split("\r\n")[0],
    ).toContain("chain_length");
    expect(await (await request.get(`/api/profiles/${done.resultId}/profile.csv`)).text()).toContain(
      "altitude (km),T (K),p (hPa)",
    );
    expect((await request.get(`/api/profiles/${done.resultId}/nope.csv`)).status()).toBe(404);
    const page = await request.get(`/profiles/${done.resultId}`);
    expect(page.status()).toBe(200);
  });

  test("a bad CSV profile is a 400 naming the row and column, and nothing is queued", async ({ request }) => {
    const cases: [string, string, string][] = [
      ["altitude (km),T (K),p (hPa)\n20,216.65,55.29\n25,warm,25.49\n", 'my.csv row 3, column "T (K)"', "not a number"],
      ["altitude (km),T (K)\n20,216.65\n", "my.csv row 1 (header)", "missing column"],
      [
        "altitude (km),T (K),p (hPa)\n25,221,25\n20,216,55\n30,226,12\n",
        'my.csv row 4, column "altitude (km)"',
        "monotonic",
      ],
      [
        "altitude (km),T (K),p (bar)\n20,216.65,0.055\n",
        'my.csv row 1, column 3 "p (bar)"',
        'unknown pressure unit "bar"',
      ],
    ];
    for (const [csv, path, msg] of cases) {
      const r = await request.post("/api/profiles", {
        data: { ...small, profile: { kind: "csv", csv, name: "my.csv" }, grid: undefined },
      });
      expect(r.status(), path).toBe(400);
      const { error } = await r.json();
      expect(error.path).toBe(path);
      expect(error.message).toContain(msg);
    }
  });

  test("bad sweep requests are 400s or 404s naming the field", async ({ request }) => {
    const bad: [Record<string, unknown>, number, string][] = [
      [{ ...small, profile: { kind: "demo", id: "nope" } }, 400, "profile.id"],
      [{ ...small, grid: { from_km: 50, to_km: 40 } }, 400, "grid.to_km"],
      [{ ...small, grid: { step_km: 0 } }, 400, "grid.step_km"],
      [{ ...small, condition: { held: { XYZ: 1e-9 } } }, 400, "condition.held.XYZ"],
      [{ ...small, mechanismId: "no-such-mechanism" }, 404, "mechanismId"],
    ];
    for (const [body, status, path] of bad) {
      const r = await request.post("/api/profiles", { data: body });
      expect(r.status(), path).toBe(status);
      expect((await r.json()).error.path).toBe(path);
    }
  });

  test("the profile list offers the default and the two invented demo profiles with their CSV", async ({ request }) => {
    const { profiles } = await (await request.get("/api/profiles")).json();
    expect(profiles.map((p: { id: string }) => p.id)).toEqual(["standard", "invented-cold", "invented-warm"]);
    expect(profiles.filter((p: { demo: boolean }) => p.demo).length).toBe(2);
    expect(profiles[1].csv).toContain("# demo: invented data");
  });

  test("a comparison of a sweep with itself is stored with zero difference and a CSV", async ({ request }) => {
    const sweep = await finish(request, (await (await request.post("/api/profiles", { data: small })).json()).id);
    const r = await request.post("/api/comparisons", {
      data: { a: { sweepId: sweep.resultId }, b: { sweepId: sweep.resultId } },
    });
    expect(r.status()).toBe(202);
    const done = await finish(request, (await r.json()).id);
    expect(done.state).toBe("done");
    expect(done.resultUrl).toBe(`/compare/${done.resultId}`);
    const rec = await (await request.get(`/api/comparisons/${done.resultId}`)).json();
    for (const l of rec.body.result.levels) {
      expect(l.difference.loss_cm3s).toBe(0);
      expect(l.difference.explaining).toEqual([]);
    }
    const csv = await request.get(`/api/comparisons/${done.resultId}/comparison.csv?comments=none`);
    expect((await csv.text()).split("\r\n")[0]).toContain("B - A Ox loss (molecules cm-3 s-1)");
    expect((await request.get(`/compare/${done.resultId}`)).status()).toBe(200);
  });

  test("a comparison of two Cly totals runs both sweeps and stores each with its own permalink", async ({
    request,
  }) => {
    const side = (cly: number) => ({ ...small, condition: { poolTotals: { Cly: cly } } });
    const r = await request.post("/api/comparisons", {
      data: { a: side(2e-9), b: side(4e-9), labels: { a: "low", b: "high" } },
    });
    const done = await finish(request, (await r.json()).id);
    expect(done.state).toBe("done");
    expect(done.total).toBe(6);
    const rec = await (await request.get(`/api/comparisons/${done.resultId}`)).json();
    expect(rec.body.result.labels).toEqual({ a: "low", b: "high" });
    for (const l of rec.body.result.levels) {
      expect(l.difference.loss_cm3s).toBeGreaterThan(0);
      expect(l.difference.explaining[0].family).toContain("ClOx");
    }
    expect((await request.get(`/api/profiles/${rec.body.result.b.sweepId}`)).status()).toBe(200);
  });

  test("a comparison naming a missing sweep is a 404 naming the side", async ({ request }) => {
    const r = await request.post("/api/comparisons", { data: { a: { sweepId: "AAAAAAAAAAAAAAAA" }, b: small } });
    expect(r.status()).toBe(404);
    expect((await r.json()).error.path).toBe("a.sweepId");
    const bad = await request.post("/api/comparisons", { data: { a: small, b: { ...small, grid: { step_km: -1 } } } });
    expect(bad.status()).toBe(400);
    expect((await bad.json()).error.path).toBe("b.grid.step_km");
  });

  test("jobs can be cancelled, unknown jobs are 404, and status streams as server-sent events", async ({ request }) => {
    const job = await (
      await request.post("/api/profiles", { data: { ...small, grid: { from_km: 20, to_km: 60, step_km: 1 } } })
    ).json();
    const cancelled = await (await request.delete(`/api/jobs/${job.id}`)).json();
    expect(cancelled.state).toBe("cancelled");
    expect((await finish(request, job.id)).resultId).toBeUndefined();
    expect((await request.get("/api/jobs/AAAAAAAAAAAAAAAA")).status()).toBe(404);
    expect((await request.get("/api/jobs/bad")).status()).toBe(404);
    const events = await request.get(`/api/jobs/${job.id}/events`);
    expect(events.headers()["content-type"]).toContain("text/event-stream");
    const text = await events.text();
    expect(text).toContain("event: status");
    expect(text).toContain('"state":"cancelled"');
  });

  test("the OpenAPI document describes the profile, comparison and job routes", async ({ request }) => {
    const doc = await (await request.get("/api/openapi.json")).json();
    for (const p of [
      "/api/profiles",
      "/api/profiles/{id}",
      "/api/profiles/{id}/levels.csv",
      "/api/comparisons",
      "/api/comparisons/{id}",
      "/api/comparisons/{id}/comparison.csv",
      "/api/jobs/{id}",
    ])
      expect(Object.keys(doc.paths)).toContain(p);
    expect(doc.components.schemas.SweepRequest.required).toEqual(["mechanismId", "profile"]);
  });
});

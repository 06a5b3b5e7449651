import { expect, test } from "@playwright/test";

// Uncertainty and sensitivity through the real server: synchronous options on POST /api/analyses,
// and the job route with progress, stored result and CSV exports.

const condition = { altitude_km: 40, zenith_deg: 40 };

test.describe("uncertainty routes", () => {
  test("an analysis asked for 40 samples and sensitivities stores ranges and ranked coefficients", async ({
    request,
  }) => {
    const r = await request.post("/api/analyses", {
      data: {
        mechanismId: "oxygen-chlorine",
        condition,
        options: { uncertaintySamples: 40, uncertaintySeed: 7, sensitivity: true },
      },
    });
    expect(r.status()).toBe(201);
    const { id, result } = await r.json();
    const mc = result.uncertainty.monteCarlo;
    expect(mc.succeeded + mc.failed).toBe(40);
    const loss = mc.summaries.find((o: { key: string }) => o.key === "oxLoss");
    expect(loss.p05).toBeLessThanOrEqual(loss.median);
    expect(loss.median).toBeLessThanOrEqual(loss.p95);
    expect(result.uncertainty.sensitivity.parameters.length).toBeGreaterThan(10);

    const csv = await request.get(`/api/analyses/${id}/uncertainty.csv?comments=none`);
    expect(csv.status()).toBe(200);
    expect((await csv.text()).split("\r\n")[0]).toMatch(/median/);
    const sens = await request.get(`/api/analyses/${id}/sensitivities.csv`);
    expect(sens.status()).toBe(200);

    // The same seed gives the same ranges (seeded and reproducible).
    const again = await (
      await request.post("/api/analyses", {
        data: {
          mechanismId: "oxygen-chlorine",
          condition,
          options: { uncertaintySamples: 40, uncertaintySeed: 7, sensitivity: true },
        },
      })
    ).json();
    expect(again.result.uncertainty.monteCarlo.summaries).toEqual(mc.summaries);
  });

  test("the uncertainty job reports progress, ends done, and its result is a stored analysis", async ({ request }) => {
    const started = await request.post("/api/uncertainty", {
      data: { analysis: { mechanismId: "oxygen-chlorine", condition, options: { uncertaintySamples: 60 } } },
    });
    expect(started.status()).toBe(202);
    let job = await started.json();
    const end = Date.now() + 60_000;
    while (job.state !== "done" && job.state !== "failed" && Date.now() < end) {
      await new Promise((r) => setTimeout(r, 300));
      job = await (await request.get(job.statusUrl)).json();
    }
    expect(job.state).toBe("done");
    expect(job.done).toBe(job.total);
    const stored = await (await request.get(job.resultApiUrl)).json();
    expect(stored.result.uncertainty.monteCarlo.succeeded + stored.result.uncertainty.monteCarlo.failed).toBe(60);
    // the shared job route sees the same job
    const shared = await request.get(`/api/jobs/${job.id}`);
    expect(shared.status()).toBe(200);
  });

  test("bad uncertainty requests are 400 naming the field, unknown jobs 404", async ({ request }) => {
    const bad = await request.post("/api/analyses", {
      data: { mechanismId: "oxygen", condition, options: { uncertaintySamples: -3 } },
    });
    expect(bad.status()).toBe(400);
    expect((await bad.json()).error.path).toBe("options.uncertaintySamples");
    const unknown = await request.get("/api/uncertainty/jobs/AAAAAAAAAAAAAAAA");
    expect(unknown.status()).toBe(404);
  });
});

import { spawn } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { type APIRequestContext, expect, test } from "@playwright/test";
import { finish } from "./finishJob";
import { smallAssessment } from "./smallAssessment";

// The pages of stored records (issue 21: deleted records answer 410 Gone; issue 24: a store that
// cannot be read is an error page, not a 404). Against the started server (playwright.config.ts),
// and for the failing store against a second server of our own.

const minimal = readFileSync("test/fixtures/mechanisms/chapman-minimal.yaml", "utf8");
const UNKNOWN = "AAAAAAAAAAAAAAAA";
const sweep = { mechanismId: "oxygen", profile: { kind: "standard" }, grid: { from_km: 30, to_km: 40, step_km: 5 } };

/** The page answers 410 with the human page that says what was deleted. */
async function expectGone(request: APIRequestContext, url: string, what: string) {
  const r = await request.get(url, { maxRedirects: 0 });
  expect(r.status(), url).toBe(410);
  expect(r.headers()["content-type"]).toContain("text/html");
  // React separates adjacent text with empty comments
  const html = (await r.text()).replaceAll("<!-- -->", "");
  expect(html, url).toContain(`This ${what} was deleted`);
  expect(r.headers()["content-security-policy"], url).toMatch(/'nonce-/);
}

test.describe("pages of deleted records answer 410 Gone with a page saying so", () => {
  test("a stored analysis: /a/{id} is 200, and 410 after DELETE; an unknown id stays 404", async ({ request }) => {
    const a = await (
      await request.post("/api/analyses", { data: { mechanismId: "oxygen", condition: { altitude_km: 35 } } })
    ).json();
    expect((await request.get(`/a/${a.id}`)).status()).toBe(200);
    await request.delete(`/api/analyses/${a.id}`, { headers: { "x-deletion-token": a.deletionToken } });
    await expectGone(request, `/a/${a.id}`, "stored analysis");
    await expectGone(request, `/a/${a.id}?view=cycles`, "stored analysis");
    const unknown = await request.get(`/a/${UNKNOWN}`);
    expect(unknown.status()).toBe(404);
    expect(await unknown.text()).toContain("No stored analysis under this address");
  });

  test("a profile sweep and a comparison of it: /profiles/{id} and /compare/{id}", async ({ request }) => {
    const started = await (await request.post("/api/profiles", { data: sweep })).json();
    const s = await finish(request, started.id);
    expect(s.state).toBe("done");
    const cmp = await (
      await request.post("/api/comparisons", { data: { a: { sweepId: s.resultId }, b: { sweepId: s.resultId } } })
    ).json();
    expect(cmp.deletionToken).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const c = await finish(request, cmp.id);
    expect(c.state).toBe("done");
    expect((await request.get(`/profiles/${s.resultId}`)).status()).toBe(200);
    expect((await request.get(`/compare/${c.resultId}`)).status()).toBe(200);

    await request.delete(`/api/profiles/${s.resultId}`, { headers: { "x-deletion-token": started.deletionToken } });
    await expectGone(request, `/profiles/${s.resultId}`, "profile sweep");
    expect((await request.get(`/compare/${c.resultId}`)).status()).toBe(200);
    await request.delete(`/api/comparisons/${c.resultId}`, { headers: { "x-deletion-token": cmp.deletionToken } });
    await expectGone(request, `/compare/${c.resultId}`, "profile comparison");
    expect((await request.get(`/profiles/${UNKNOWN}`)).status()).toBe(404);
    expect((await request.get(`/compare/${UNKNOWN}`)).status()).toBe(404);
  });

  test("an assessment: the student link alone, then both links", async ({ request }) => {
    const a = await (
      await request.post("/api/assessments", { data: smallAssessment("Route test: gone pages", 11) })
    ).json();
    const headers = { "x-deletion-token": a.deletionToken };
    expect((await request.get(`/assess/s/${a.studentId}`)).status()).toBe(200);
    expect((await request.delete(`/api/assessments/student/${a.studentId}`, { headers })).status()).toBe(204);
    await expectGone(request, `/assess/s/${a.studentId}`, "assessment sheets (student link)");
    await expectGone(request, `/assess/s/${a.studentId}?v=1`, "assessment sheets (student link)");
    expect((await request.get(`/assess/i/${a.instructorId}`)).status()).toBe(200);
    expect((await request.delete(`/api/assessments/${a.instructorId}`, { headers })).status()).toBe(204);
    await expectGone(request, `/assess/i/${a.instructorId}`, "assessment (instructor link)");
    expect((await request.get(`/assess/i/${UNKNOWN}`)).status()).toBe(404);
    expect((await request.get(`/assess/s/${UNKNOWN}`)).status()).toBe(404);
  });

  test("an uploaded mechanism: the explorer opened on it", async ({ request }) => {
    const up = await (await request.post("/api/mechanisms", { data: { text: minimal } })).json();
    expect((await request.get(`/explore?m=${up.id}`)).status()).toBe(200);
    await request.delete(`/api/mechanisms/${up.id}`, { headers: { "x-deletion-token": up.deletionToken } });
    await expectGone(request, `/explore?m=${up.id}&z=30`, "uploaded mechanism");
    // the explorer on a built-in mechanism is no record page
    expect((await request.get("/explore?m=reference")).status()).toBe(200);
  });

  test("a run and its hours: /runs/{id} and /runs/{id}/at/{hour}", async ({ request }) => {
    const job = await (
      await request.post("/api/runs", {
        data: { mechanismId: "oxygen", condition: { altitude_km: 30, latitude_deg: 45, date: "2026-03-20" }, days: 1 },
      })
    ).json();
    const done = await finish(request, job.id);
    expect(done.state).toBe("done");
    expect((await request.get(`/runs/${done.resultId}`)).status()).toBe(200);
    expect((await request.get(`/runs/${done.resultId}/at/999`, { maxRedirects: 0 })).status()).toBe(404);
    // DELETE with the token the run's start returned: wrong token 403, then 204, then the pages answer 410
    const url = `/api/runs/${done.resultId}`;
    const wrong = "A".repeat(43);
    expect((await request.delete(url, { headers: { "x-deletion-token": wrong } })).status()).toBe(403);
    expect((await request.delete(url, { headers: { "x-deletion-token": job.deletionToken } })).status()).toBe(204);
    expect((await request.delete(url, { headers: { "x-deletion-token": job.deletionToken } })).status()).toBe(410);
    await expectGone(request, `/runs/${done.resultId}`, "run");
    await expectGone(request, `/runs/${done.resultId}/at/12`, "run");
    expect((await request.get(`/api/runs/${done.resultId}`)).status()).toBe(410);
    expect((await request.get(`/runs/${UNKNOWN}`)).status()).toBe(404);
  });

  test("/gone itself answers 410", async ({ request }) => {
    const r = await request.get("/gone");
    expect(r.status()).toBe(410);
    expect((await r.text()).replaceAll("<!-- -->", "")).toContain("This record was deleted");
  });
});

test.describe("a store that cannot be read", () => {
  test("record pages show the error page with 500, not a 404", async ({ browser }) => {
    test.setTimeout(180_000);
    const port = Number(process.env.E2E_PORT ?? 3210) + 7;
    const dataDir = mkdtempSync(path.join(tmpdir(), "ozone-broken-store-"));
    // not an SQLite file: every read of the store fails
    writeFileSync(path.join(dataDir, "ozone.sqlite"), "this is not a database ".repeat(200));
    const server = spawn("node", ["scripts/serve.mjs", String(port)], {
      env: { ...process.env, OZONE_DATA_DIR: dataDir, NEXT_TELEMETRY_DISABLED: "1", NODE_ENV: "production" },
      stdio: "ignore",
    });
    const base = `http://127.0.0.1:${port}`;
    try {
      const end = Date.now() + 90_000;
      for (;;) {
        const ok = await fetch(`${base}/api/health`).then(
          (r) => r.ok,
          () => false,
        );
        if (ok) break;
        if (Date.now() > end) throw new Error("the second server did not start");
        await new Promise((r) => setTimeout(r, 250));
      }
      for (const url of [
        `/a/${UNKNOWN}`,
        `/profiles/${UNKNOWN}`,
        `/compare/${UNKNOWN}`,
        `/assess/i/${UNKNOWN}`,
        `/assess/s/${UNKNOWN}`,
        `/runs/${UNKNOWN}`,
        `/runs/${UNKNOWN}/at/3`,
      ]) {
        expect((await fetch(`${base}${url}`, { redirect: "manual" })).status, url).toBe(500);
      }
      // the error boundary (a client component) is what a reader sees
      const page = await browser.newPage();
      try {
        const shown = await page.goto(`${base}/a/${UNKNOWN}`);
        expect(shown?.status()).toBe(500);
        await expect(page.getByRole("heading", { name: "Something went wrong on our side" })).toBeVisible();
        await expect(page.getByText("No stored analysis under this address")).toHaveCount(0);
      } finally {
        await page.close();
      }
      // the API says the same: a 500, not "not found"
      expect((await fetch(`${base}/api/analyses/${UNKNOWN}`)).status).toBe(500);
    } finally {
      server.kill("SIGKILL");
      rmSync(dataDir, { recursive: true, force: true });
    }
  });
});

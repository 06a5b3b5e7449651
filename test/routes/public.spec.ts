import { spawn } from "node:child_process";
import { readFileSync } from "node:fs";
import { request as apiRequest, expect, test } from "@playwright/test";
import { finish } from "./finishJob";

// Running in public: deletion with tokens and 410 tombstones, private uploads, refusals of hostile and
// over-limit documents, security headers, rate limits. Against the started server (playwright.config.ts),
// which trusts one proxy hop (OZONE_TRUSTED_PROXIES=1), so that a test can count as another client by
// sending its own X-Forwarded-For.

const minimal = readFileSync("test/fixtures/mechanisms/chapman-minimal.yaml", "utf8");
const analysis = { mechanismId: "oxygen", condition: { altitude_km: 35, zenith_deg: 30 } };
const WRONG_TOKEN = "A".repeat(43);

test.describe("deletion with the token handed out at creation", () => {
  test("an analysis: 201 with a token, a wrong token 403, a malformed one 400, then 204 and 410 Gone, idempotently", async ({
    request,
  }) => {
    const created = await request.post("/api/analyses", { data: analysis });
    expect(created.status()).toBe(201);
    const { id, deletionToken, deletionNote } = await created.json();
    expect(deletionToken).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(deletionNote).toMatch(/deletion token/);

    const wrong = await request.delete(`/api/analyses/${id}`, { headers: { "x-deletion-token": WRONG_TOKEN } });
    expect(wrong.status()).toBe(403);
    expect((await wrong.json()).error.code).toBe("forbidden");
    const malformed = await request.delete(`/api/analyses/${id}`, { headers: { "x-deletion-token": "short" } });
    expect(malformed.status()).toBe(400);
    expect((await malformed.json()).error.code).toBe("invalid-token");
    expect((await request.delete(`/api/analyses/${id}`)).status()).toBe(400);
    expect((await request.get(`/api/analyses/${id}`)).status()).toBe(200);

    const ok = await request.delete(`/api/analyses/${id}`, { headers: { "x-deletion-token": deletionToken } });
    expect(ok.status()).toBe(204);
    for (const url of [`/api/analyses/${id}`, `/api/analyses/${id}.json`, `/api/analyses/${id}/rates.csv`]) {
      const r = await request.get(url);
      expect(r.status(), url).toBe(410);
      expect((await r.json()).error.code).toBe("gone");
    }
    const again = await request.delete(`/api/analyses/${id}`, { headers: { "x-deletion-token": deletionToken } });
    expect(again.status()).toBe(410);
    expect((await request.get("/api/analyses/AAAAAAAAAAAAAAAA")).status()).toBe(404);
  });

  test("an explorer draft can be pinned, idempotently; a deleted one answers 410 there too", async ({ request }) => {
    const created = await request.post("/api/analyses?draft=1", { data: analysis });
    expect(created.status()).toBe(201);
    const { id, deletionToken } = await created.json();
    for (let i = 0; i < 2; i++) {
      const pin = await request.post(`/api/analyses/${id}/pin`);
      expect(pin.status()).toBe(200);
      expect(await pin.json()).toEqual({ id, pinned: true });
    }
    const page = await request.get(`/a/${id}`);
    expect(page.status()).toBe(200);
    expect(await page.text()).toContain("This link is permanent");
    await request.delete(`/api/analyses/${id}`, { headers: { "x-deletion-token": deletionToken } });
    expect((await request.post(`/api/analyses/${id}/pin`)).status()).toBe(410);
  });

  test("a wrong token takes as long as a right one would to be checked (no timing oracle)", async ({ request }) => {
    // Both paths hash the given token and compare 32 bytes in constant time; here the wall-clock medians of
    // 30 wrong tokens against a record with a token and against one without (the same code path) agree.
    const { id } = await (await request.post("/api/analyses", { data: analysis })).json();
    const time = async (url: string) => {
      const t: number[] = [];
      for (let i = 0; i < 30; i++) {
        const t0 = performance.now();
        await request.delete(url, { headers: { "x-deletion-token": `${"B".repeat(42)}${i % 10}` } });
        t.push(performance.now() - t0);
      }
      return t.sort((a, b) => a - b)[15];
    };
    const withToken = await time(`/api/analyses/${id}`);
    const builtin = await time("/api/mechanisms/oxygen");
    // generous: a timing difference a remote attacker could use would be the cost of a hash or a look-up missed
    expect(Math.abs(withToken - builtin)).toBeLessThan(Math.max(withToken, builtin) * 0.8 + 5);
  });

  test("an uploaded mechanism: DELETE with its token, then its link and its analyses answer 410", async ({
    request,
  }) => {
    const up = await (await request.post("/api/mechanisms", { data: { text: minimal } })).json();
    const bad = await request.delete(`/api/mechanisms/${up.id}`, { headers: { "x-deletion-token": WRONG_TOKEN } });
    expect(bad.status()).toBe(403);
    const del = await request.delete(`/api/mechanisms/${up.id}`, { headers: { "x-deletion-token": up.deletionToken } });
    expect(del.status()).toBe(204);
    expect((await request.get(`/api/mechanisms/${up.id}`)).status()).toBe(410);
    const a = await request.post("/api/analyses", { data: { ...analysis, mechanismId: up.id } });
    expect(a.status()).toBe(410);
    const list = await (await request.get("/api/mechanisms")).json();
    expect(list.mechanisms.some((m: { id: string }) => m.id === up.id)).toBe(false);
  });

  test("an assessment: its token revokes the student link alone, or deletes both links", async ({ request }) => {
    const spec = {
      title: "Route test: deletion",
      mechanismId: "oxygen-chlorine",
      variants: 2,
      seed: 7,
      base: { altitude_km: 35, latitude_deg: 45, date: "2026-03-20", localSolarTime_h: 12 },
      ranges: { altitude_km: { min: 30, max: 40 } },
      questions: [{ kind: "dominant-family" }],
    };
    const created = await request.post("/api/assessments", { data: spec });
    expect(created.status()).toBe(201);
    const a = await created.json();
    const headers = { "x-deletion-token": a.deletionToken };
    expect((await request.delete(`/api/assessments/student/${a.studentId}`, { headers })).status()).toBe(204);
    expect((await request.get(`/api/assessments/student/${a.studentId}`)).status()).toBe(410);
    expect((await request.get(`/api/assessments/${a.instructorId}`)).status()).toBe(200);
    expect((await request.delete(`/api/assessments/${a.instructorId}`, { headers })).status()).toBe(204);
    expect((await request.get(`/api/assessments/${a.instructorId}`)).status()).toBe(410);
    expect((await request.get(`/api/assessments/${a.instructorId}/key.csv`)).status()).toBe(410);
  });

  test("a profile sweep: the job's 202 carries the token of the record it stores", async ({ request }) => {
    const started = await request.post("/api/profiles", {
      data: { mechanismId: "oxygen", profile: { kind: "standard" }, grid: { from_km: 30, to_km: 40, step_km: 5 } },
    });
    expect(started.status()).toBe(202);
    const job = await started.json();
    expect(job.deletionToken).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const done = await finish(request, job.id);
    expect(done.state).toBe("done");
    const url = `/api/profiles/${done.resultId}`;
    expect((await request.delete(url, { headers: { "x-deletion-token": WRONG_TOKEN } })).status()).toBe(403);
    expect((await request.delete(url, { headers: { "x-deletion-token": job.deletionToken } })).status()).toBe(204);
    expect((await request.get(url)).status()).toBe(410);
  });
});

test.describe("uploaded mechanisms are reachable only by their link", () => {
  test("a stranger's list does not show another client's upload, while its link still opens it", async ({
    request,
    baseURL,
  }) => {
    const up = await (await request.post("/api/mechanisms", { data: { text: minimal } })).json();
    const mine = await (await request.get("/api/mechanisms")).json();
    expect(mine.mechanisms.some((m: { id: string }) => m.id === up.id)).toBe(true);

    const stranger = await apiRequest.newContext({ baseURL });
    try {
      const theirs = await (await stranger.get("/api/mechanisms")).json();
      expect(theirs.mechanisms.some((m: { id: string }) => m.id === up.id)).toBe(false);
      expect(theirs.mechanisms.every((m: { builtin: boolean }) => m.builtin)).toBe(true);
      const detail = await stranger.get(`/api/mechanisms/${up.id}`);
      expect(detail.status()).toBe(200);
      expect((await detail.json()).text).toBe(minimal);
    } finally {
      await stranger.dispose();
    }
  });

  test("the owner cookie is HttpOnly and SameSite", async ({ request }) => {
    const r = await request.post("/api/mechanisms", { data: { text: minimal } });
    const cookie = r.headers()["set-cookie"] ?? "";
    // the fixture already holds a cookie from an earlier upload in this test file only if it shares a context
    if (cookie) expect(cookie).toMatch(/^ozone-owner=[A-Za-z0-9_-]{43}; Path=\/; Max-Age=\d+; HttpOnly; SameSite=Lax/);
    const fresh = await apiRequest.newContext({ baseURL: test.info().project.use.baseURL });
    try {
      const first = await fresh.post("/api/mechanisms", { data: { text: minimal } });
      expect(first.headers()["set-cookie"]).toMatch(/HttpOnly; SameSite=Lax/);
    } finally {
      await fresh.dispose();
    }
  });
});

test.describe("refusals of hostile and over-limit documents", () => {
  test("a 4 MB body of nested brackets does not stall the server: every health answer comes within a bound", async ({
    baseURL,
  }) => {
    // The health poller runs in a process of its own, so that sending 8 MB from this one does not delay what it measures.
    const poller = spawn(
      process.execPath,
      [
        "-e",
        // answers count from "start" (after the poller's own warm-up) to "stop"
        `const t = []; let state = "warm"; process.stdin.on("data", (d) => { state = String(d).trim(); });
         (async () => { while (state !== "stop") { const t0 = performance.now(); const r = await fetch(process.argv[1]);
           await r.arrayBuffer(); if (state === "start") t.push(performance.now() - t0);
           await new Promise((r) => setTimeout(r, 10)); }
           process.stdout.write(JSON.stringify(t)); process.exit(0); })();`,
        `${baseURL}/api/health`,
      ],
      { stdio: ["pipe", "pipe", "inherit"] },
    );
    let out = "";
    poller.stdout.on("data", (d) => {
      out += d;
    });
    const ended = new Promise((r) => poller.once("exit", r));
    const body = `${"[".repeat(2_000_000)}${"]".repeat(2_000_000)}`;
    await new Promise((r) => setTimeout(r, 1_000));
    poller.stdin.write("start\n");
    await new Promise((r) => setTimeout(r, 100));
    const t0 = performance.now();
    const results = await Promise.all(
      ["application/json", "application/yaml"].map((type) =>
        fetch(`${baseURL}/api/mechanisms`, { method: "POST", headers: { "content-type": type }, body }),
      ),
    );
    const refuse_ms = performance.now() - t0;
    await new Promise((r) => setTimeout(r, 200));
    poller.stdin.write("stop\n");
    await ended;
    const latencies = JSON.parse(out) as number[];
    for (const r of results) {
      expect(r.status).toBe(400);
      const { error } = await r.json();
      expect(error.code).toBe("too-deep");
      expect(error.message).toMatch(/nested too deeply: more than 64 levels/);
      expect(error.line).toBe(1);
    }
    console.log(
      `hostile 4 MB bodies refused in ${refuse_ms.toFixed(0)} ms; ${latencies.length} health answers, worst ${Math.max(...latencies).toFixed(0)} ms`,
    );
    expect(latencies.length).toBeGreaterThan(10);
    // The goal is 200 ms, met at a quieter moment (worst 63 ms seen); on 2 cores shared at a load average of
    // 10–13, single answers reached 216–600 ms. The bound is generous, but 3.5× below the 3.5 s that parsing a
    // 1 MB body on the main thread cost before, and 18× below the 18 s of the 4 MB one.
    expect(Math.max(...latencies)).toBeLessThan(1_000);
  });

  test("YAML nested 100,000 deep gets a clear 'nested too deeply' message, not a stack error", async ({ baseURL }) => {
    const text = `title: deep\nspecies: ${"[".repeat(100_000)}${"]".repeat(100_000)}\nreactions: []\n`;
    const r = await fetch(`${baseURL}/api/mechanisms`, {
      method: "POST",
      headers: { "content-type": "application/yaml" },
      body: text,
    });
    expect(r.status).toBe(400);
    const { error } = await r.json();
    expect(error).toMatchObject({ code: "too-deep", line: 2 });
    expect(error.message).not.toMatch(/call stack/i);
  });

  test("a YAML alias inside its own anchor is a 400 recursive-alias, not a worker busy until the job limit", async ({
    request,
  }) => {
    // the fuzz document of bench/soak.mjs that stalled the 10,000-request run: each held a worker for 30 s (422 timeout)
    const r = await request.post("/api/mechanisms", {
      headers: { "content-type": "application/yaml" },
      data: `a: &a [${"*a, ".repeat(50)}]`,
    });
    expect(r.status()).toBe(400);
    const { error } = await r.json();
    expect(error).toMatchObject({ code: "recursive-alias", line: 1, column: 8 });
  });

  test("every over-limit document is a 413 with the one code too-large (5,001 species)", async ({ request }) => {
    const lines = ["title: big", "species:", "  - { id: M, role: third-body }"];
    for (let i = 0; i < 5_000; i++) lines.push(`  - { id: X${i}, role: solved, atoms: { C: 1 } }`);
    lines.push("reactions: []");
    const r = await request.post("/api/mechanisms", { data: { text: lines.join("\n") } });
    expect(r.status()).toBe(413);
    const { error } = await r.json();
    expect(error.code).toBe("too-large");
    expect(error.message).toMatch(/^species: 5001 species exceed the limit of 5000/);
  });

  test("a document with no solved species or no reactions is refused at upload, naming what is missing", async ({
    request,
  }) => {
    const r = await request.post("/api/mechanisms", {
      data: { text: 'title: empty\nversion: "1"\nspecies: []\nreactions: []\n' },
    });
    expect(r.status()).toBe(400);
    const { error } = await r.json();
    expect(error.code).toBe("empty-mechanism");
    expect(error.problems.map((p: { path: string }) => p.path)).toEqual(["species", "reactions"]);
    expect(error.message).toMatch(/no solved species/);
  });

  for (const map of ["held", "poolTotals", "J"]) {
    // The keys of these maps are the mechanism's ids (a mechanism may name a species or pool
    // "__proto__": test/engine/prototypeIds.test.ts), so the key is refused against the mechanism,
    // exactly like an id it does not have.
    test(`the key __proto__ in condition.${map} is a 400 like every unknown key`, async ({ baseURL }) => {
      const post = async (key: string) => {
        const r = await fetch(`${baseURL}/api/analyses`, {
          method: "POST",
          headers: { "content-type": "application/json" },
          body: `{"mechanismId":"reference","condition":{"altitude_km":30,"${map}":{"${key}":0.001}}}`,
        });
        return { status: r.status, error: (await r.json()).error };
      };
      const proto = await post("__proto__");
      const other = await post("NotAnId");
      expect(proto.status).toBe(400);
      expect(proto.error).toMatchObject({ code: other.error.code, path: `condition.${map}.__proto__` });
      expect(proto.error.message).toBe(other.error.message.replaceAll("NotAnId", "__proto__"));
    });
  }

  test("the error for a binary body quotes a short excerpt with control characters escaped", async ({ baseURL }) => {
    const bytes = new Uint8Array(400).map((_, i) => (i * 37) % 256);
    const r = await fetch(`${baseURL}/api/analyses`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: bytes,
    });
    expect(r.status).toBe(400);
    const { error } = await r.json();
    expect(error.code).toBe("invalid-json");
    // biome-ignore lint/suspicious/noControlCharactersInRegex: the point is that none are left
    expect(error.message).not.toMatch(/[\u0000-\u001f\u007f-\u009f]/);
    expect(error.message.length).toBeLessThan(200);
  });
});

test.describe("security headers", () => {
  for (const path of ["/", "/explore", "/profiles", "/assess", "/api/health", "/api/mechanisms"]) {
    test(`${path} carries the security headers and no X-Powered-By`, async ({ request }) => {
      const r = await request.get(path);
      expect(r.status()).toBe(200);
      const h = r.headers();
      expect(h["x-content-type-options"]).toBe("nosniff");
      expect(h["referrer-policy"]).toBe("no-referrer");
      expect(h["x-powered-by"]).toBeUndefined();
      const csp = h["content-security-policy"] ?? "";
      expect(csp).toContain("frame-ancestors 'none'");
      if (path.startsWith("/api/")) expect(csp).toContain("default-src 'none'");
      else expect(csp).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]+' 'strict-dynamic'/);
    });
  }

  test("each page gets its own nonce, and the page's scripts carry it", async ({ request }) => {
    const nonceOf = (csp: string) => /'nonce-([^']+)'/.exec(csp)?.[1];
    const a = await request.get("/explore");
    const b = await request.get("/explore");
    const na = nonceOf(a.headers()["content-security-policy"]);
    expect(na).toBeTruthy();
    expect(na).not.toBe(nonceOf(b.headers()["content-security-policy"]));
    const html = await a.text();
    const scripts = html.match(/<script\b[^>]*>/g) ?? [];
    expect(scripts.length).toBeGreaterThan(0);
    for (const s of scripts) expect(s).toContain(`nonce="${na}"`);
  });
});

test.describe("rate limits", () => {
  test("a client over its limit (600 a minute by default) gets 429 with Retry-After; other clients do not", async ({
    baseURL,
  }) => {
    const client = `203.0.113.${1 + Math.floor(Math.random() * 250)}`;
    const post = (address: string) =>
      fetch(`${baseURL}/api/analyses`, {
        method: "POST",
        headers: { "content-type": "application/json", "x-forwarded-for": address },
        body: "{}",
      });
    const statuses: number[] = [];
    for (let i = 0; i < 600; i += 20) {
      const batch = await Promise.all(Array.from({ length: 20 }, () => post(client)));
      statuses.push(...batch.map((r) => r.status));
    }
    // an empty body is a 400 after it has been counted
    expect(statuses.every((s) => s === 400)).toBe(true);
    const over = await post(client);
    expect(over.status).toBe(429);
    expect(Number(over.headers.get("retry-after"))).toBeGreaterThan(0);
    expect((await over.json()).error.code).toBe("rate-limited");
    expect((await post(`198.51.100.${1 + Math.floor(Math.random() * 250)}`)).status).toBe(400);
  });
});

import { expect, test } from "@playwright/test";
import Database from "better-sqlite3";

// The explorer's recompute: POST /api/analyses/preview computes and stores nothing; POST /api/analyses with the
// same request stores the same result (the engine is deterministic), which its permalink then shows unchanged.
// Against the started server (playwright.config.ts), whose SQLite store is read here to count the records.

const DB = "test-results/e2e-data/ozone.sqlite";
const request_ = { mechanismId: "reference", condition: { altitude_km: 33.5, latitude_deg: 40, localSolarTime_h: 11 } };

const storedAnalyses = () => {
  const db = new Database(DB, { readonly: true, fileMustExist: true });
  try {
    return (db.prepare("SELECT count(*) AS n FROM analyses").get() as { n: number }).n;
  } finally {
    db.close();
  }
};

/** The result without the one field that is not a property of the request: the wall time. */
const numbersOf = (result: Record<string, unknown>) => ({ ...result, elapsed_ms: undefined });

test.describe("the analysis preview", () => {
  test("answers 200 with the result and no id, and stores nothing", async ({ request }) => {
    // a first stored analysis, so that the store file exists before counting
    expect((await request.post("/api/analyses", { data: request_ })).status()).toBe(201);
    const before = storedAnalyses();
    for (let i = 0; i < 3; i++) {
      const res = await request.post("/api/analyses/preview", { data: request_ });
      expect(res.status()).toBe(200);
      const body = await res.json();
      expect(Object.keys(body)).toEqual(["result"]);
      expect(body.result.steadyState.status).toBe("converged");
      expect(body.result.condition.altitude_km).toBe(33.5);
    }
    expect(storedAnalyses()).toBe(before);
  });

  test("and the stored analysis of the same request, and its permalink, give the same numbers", async ({ request }) => {
    const preview = (await (await request.post("/api/analyses/preview", { data: request_ })).json()).result;
    const created = await request.post("/api/analyses", { data: request_ });
    expect(created.status()).toBe(201);
    const { id, result } = await created.json();
    expect(numbersOf(result)).toEqual(numbersOf(preview));
    const record = await (await request.get(`/api/analyses/${id}`)).json();
    expect(record.request).toEqual(request_);
    expect(numbersOf(record.result)).toEqual(numbersOf(preview));
    // a later preview of the same request still agrees: the permalink stays reproducible
    const again = (await (await request.post("/api/analyses/preview", { data: request_ })).json()).result;
    expect(numbersOf(again)).toEqual(numbersOf(record.result));
  });

  test("answers a request asked before from the recent results: the same JSON text, elapsed_ms included", async ({
    request,
  }) => {
    const body = { mechanismId: "reference", condition: { altitude_km: 27.25, zenith_deg: 55 } };
    const first = await request.post("/api/analyses/preview", { data: body });
    expect(first.headers()["content-type"]).toBe("application/json");
    const text = await first.text();
    // the same request with its keys in another order is the same request
    const reordered = { condition: { zenith_deg: 55, altitude_km: 27.25 }, mechanismId: "reference" };
    expect(await (await request.post("/api/analyses/preview", { data: reordered })).text()).toBe(text);
    const created = await request.post("/api/analyses", { data: body });
    expect(created.headers()["content-type"]).toBe("application/json");
    const { id, result, deletionToken } = await created.json();
    expect(result).toEqual(JSON.parse(text).result);
    expect(typeof deletionToken).toBe("string");
    expect((await (await request.get(`/api/analyses/${id}`)).json()).result).toEqual(result);
  });

  test("refuses a bad request as the storing route does, naming the field", async ({ request }) => {
    const bad = { mechanismId: "reference", condition: { altitude_km: 500 } };
    const res = await request.post("/api/analyses/preview", { data: bad });
    expect(res.status()).toBe(400);
    const stored = await request.post("/api/analyses", { data: bad });
    expect(await res.json()).toEqual(await stored.json());
    expect(
      (
        await request.post("/api/analyses/preview", {
          data: { mechanismId: "no-such-mechanism", condition: { altitude_km: 30 } },
        })
      ).status(),
    ).toBe(404);
  });

  test("is rate-limited like the other POST routes (429 with Retry-After)", async ({ baseURL }) => {
    const client = `192.0.2.${1 + Math.floor(Math.random() * 250)}`;
    const post = () =>
      fetch(`${baseURL}/api/analyses/preview`, {
        method: "POST",
        headers: { "content-type": "application/json", "x-forwarded-for": client },
        body: "{}",
      });
    const statuses: number[] = [];
    // 600 a minute by default (OZONE_RATE_LIMIT); an empty body is a 400 after it has been counted
    for (let i = 0; i < 600; i += 20)
      statuses.push(...(await Promise.all(Array.from({ length: 20 }, post))).map((r) => r.status));
    expect(new Set(statuses)).toEqual(new Set([400]));
    const over = await post();
    expect(over.status).toBe(429);
    expect(Number(over.headers.get("retry-after"))).toBeGreaterThan(0);
  });
});

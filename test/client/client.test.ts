/**
 * The typed client (lib/client) against the OpenAPI document the service
 * serves at /api/openapi.json (lib/service/openapi.ts, which the route
 * returns as it is): every method's route is documented with its HTTP
 * method, and every documented operation has a method or is named below as
 * left out, so a route added to one and not the other fails here. The calls
 * themselves are checked against a stub fetch.
 */
import { describe, expect, it } from "vitest";
import { ApiError, CLIENT_FILES, CLIENT_ROUTES, OzoneCyclesClient } from "@/lib/client";
import { openApiDocument } from "@/lib/service/openapi";

/** Documented operations the client has no method for, and why. */
const LEFT_OUT = new Set([
  "get /api/jobs/{id}/events", // server-sent events: a stream, not a JSON call (waitForJob polls instead)
  "get /api/analyses/{id}.json", // the same record as GET /api/analyses/{id}, as a download
  "get /api/profiles/{id}.json",
  "get /api/comparisons/{id}.json",
  "get /api/runs/{id}.json",
  "post /api/assessments/preview", // the builder page's helper
  "get /api/assessments/{id}/key.csv", // the instructor's downloads: open them in a browser
  "get /api/assessments/{id}/key.json",
  "get /api/assessments/{id}/answers-template.csv",
  "post /api/assessments/{id}/marks",
  "post /api/uncertainty", // the uncertainty jobs: not in the client yet
  "get /api/uncertainty/jobs/{id}",
  "delete /api/uncertainty/jobs/{id}",
  "get /api/uncertainty/profiles/{id}",
]);

const paths = openApiDocument.paths as Record<string, Record<string, unknown>>;
const documented = Object.entries(paths).flatMap(([p, ops]) =>
  Object.keys(ops)
    .filter((m) => ["get", "post", "put", "delete", "patch"].includes(m))
    .map((m) => `${m} ${p}`),
);

/** A route's documented paths: `{file}` stands for each of its files. */
function expand(name: keyof typeof CLIENT_ROUTES): string[] {
  const { method, path } = CLIENT_ROUTES[name];
  const files = (CLIENT_FILES as Record<string, readonly string[]>)[name];
  return files ? files.map((f) => `${method} ${path.replace("{file}", f)}`) : [`${method} ${path}`];
}

describe("the typed client and the OpenAPI document", () => {
  it("calls only documented routes, each with its documented method", () => {
    for (const name of Object.keys(CLIENT_ROUTES) as (keyof typeof CLIENT_ROUTES)[]) {
      for (const op of expand(name)) expect(documented, `${name}: ${op}`).toContain(op);
    }
  });

  it("has a method for every documented operation but those left out on purpose", () => {
    const covered = new Set(Object.keys(CLIENT_ROUTES).flatMap((n) => expand(n as keyof typeof CLIENT_ROUTES)));
    const missing = documented.filter((op) => !covered.has(op) && !LEFT_OUT.has(op));
    expect(missing).toEqual([]);
    for (const op of LEFT_OUT) expect(documented, `left out but not documented: ${op}`).toContain(op);
  });
});

interface Call {
  url: string;
  method: string;
  body?: string;
  contentType?: string;
  deletionToken?: string;
}

function stub(responses: Response[]): { fetch: typeof fetch; calls: Call[] } {
  const calls: Call[] = [];
  const f = async (url: string | URL | Request, init?: RequestInit) => {
    const h = (init?.headers ?? {}) as Record<string, string>;
    calls.push({
      url: String(url),
      method: init?.method ?? "GET",
      body: init?.body as string,
      contentType: h["content-type"],
      ...(h["x-deletion-token"] ? { deletionToken: h["x-deletion-token"] } : {}),
    });
    const r = responses.shift();
    if (!r) throw new Error("stub: no response left");
    return r;
  };
  return { fetch: f as typeof fetch, calls };
}

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });

describe("OzoneCyclesClient", () => {
  it("posts an analysis request as JSON to /api/analyses", async () => {
    const s = stub([json(201, { id: "abc", result: { engineVersion: "x" } })]);
    const c = new OzoneCyclesClient({ baseUrl: "http://localhost:3225/", fetch: s.fetch });
    const out = await c.createAnalysis({ mechanismId: "reference", condition: { altitude_km: 30 } });
    expect(out.id).toBe("abc");
    expect(s.calls).toEqual([
      {
        url: "http://localhost:3225/api/analyses",
        method: "POST",
        body: '{"mechanismId":"reference","condition":{"altitude_km":30}}',
        contentType: "application/json",
      },
    ]);
  });

  it("posts a preview to /api/analyses/preview and gets the result without an id", async () => {
    const s = stub([json(200, { result: { engineVersion: "x" } })]);
    const c = new OzoneCyclesClient({ baseUrl: "http://h", fetch: s.fetch });
    const out = await c.previewAnalysis({ mechanismId: "reference", condition: { altitude_km: 30 } });
    expect(out).toEqual({ result: { engineVersion: "x" } });
    expect(s.calls.map((x) => [x.url, x.method])).toEqual([["http://h/api/analyses/preview", "POST"]]);
  });

  it("fills in path parameters and asks for the bare table", async () => {
    const s = stub([new Response("a,b\r\n", { status: 200 })]);
    const c = new OzoneCyclesClient({ baseUrl: "http://h", fetch: s.fetch });
    expect(await c.analysisCsv("a/b", "cycles.csv", false)).toBe("a,b\r\n");
    expect(s.calls[0].url).toBe("http://h/api/analyses/a%2Fb/cycles.csv?comments=none");
  });

  it("throws an ApiError with the service's code, message and path", async () => {
    const s = stub([
      json(400, {
        error: { code: "invalid-request", message: "condition.altitude_km: too high", path: "condition.altitude_km" },
      }),
    ]);
    const c = new OzoneCyclesClient({ baseUrl: "http://h", fetch: s.fetch });
    const e = await c.createAnalysis({ mechanismId: "reference", condition: { altitude_km: 99 } }).catch((x) => x);
    expect(e).toBeInstanceOf(ApiError);
    expect([e.status, e.code, e.path]).toEqual([400, "invalid-request", "condition.altitude_km"]);
  });

  it("deletes a record with its token in the x-deletion-token header, and revokes a student link on its own route", async () => {
    const s = stub([new Response(null, { status: 204 }), new Response(null, { status: 204 })]);
    const c = new OzoneCyclesClient({ baseUrl: "http://h", fetch: s.fetch });
    await c.deleteRecord("sweep", "p1", "tok-1");
    await c.deleteRecord("studentLink", "s1", "tok-2");
    expect(s.calls).toEqual([
      {
        url: "http://h/api/profiles/p1",
        method: "DELETE",
        body: undefined,
        contentType: undefined,
        deletionToken: "tok-1",
      },
      {
        url: "http://h/api/assessments/student/s1",
        method: "DELETE",
        body: undefined,
        contentType: undefined,
        deletionToken: "tok-2",
      },
    ]);
  });

  it("polls a job until it is done", async () => {
    const status = (state: string) =>
      json(200, { id: "j", state, done: 0, total: 1, stage: "", statusUrl: "/api/jobs/j" });
    const s = stub([status("queued"), status("running"), status("done")]);
    const c = new OzoneCyclesClient({ baseUrl: "http://h", fetch: s.fetch });
    const done = await c.waitForJob("j", { pollInterval_ms: 1 });
    expect(done.state).toBe("done");
    expect(s.calls.map((x) => x.url)).toEqual(Array(3).fill("http://h/api/jobs/j"));
  });

  it("throws when a job failed", async () => {
    const s = stub([json(200, { id: "j", state: "failed", error: { code: "timeout", message: "too long" } })]);
    const c = new OzoneCyclesClient({ baseUrl: "http://h", fetch: s.fetch });
    await expect(c.waitForJob("j", { pollInterval_ms: 1 })).rejects.toThrow(/timeout: too long/);
  });

  it("throws on entry for a base address that is not http(s)", () => {
    expect(() => new OzoneCyclesClient({ baseUrl: "localhost:3000" })).toThrow(/invalid baseUrl/);
  });
});

import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";

// Uploads through the real server; fixtures in test/fixtures/mechanisms (invented documents).
const minimal = readFileSync("test/fixtures/mechanisms/chapman-minimal.yaml", "utf8");
const minimalJson = readFileSync("test/fixtures/mechanisms/chapman-minimal.json", "utf8");
const expected = JSON.parse(readFileSync("test/fixtures/mechanisms/expected.json", "utf8")) as Record<string, string[]>;

test.describe("mechanism uploads", () => {
  test("a valid document is stored under a random id; the same content again gets another id", async ({ request }) => {
    const first = await request.post("/api/mechanisms", { data: { text: minimal } });
    expect(first.status()).toBe(201);
    const a = await first.json();
    expect(a.id).toMatch(/^u-[A-Za-z0-9_-]{16}$/);
    expect(a.deletionToken).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(a.summary.species).toBeGreaterThan(2);
    // Ids are not derived from the content: holding the document tells nothing about its upload.
    const again = await request.post("/api/mechanisms", { data: { text: minimalJson, format: "json" } });
    expect(again.status()).toBe(201);
    expect((await again.json()).id).not.toBe(a.id);

    const detail = await (await request.get(`/api/mechanisms/${a.id}`)).json();
    expect(detail.text).toBe(minimal);
    expect(detail.reactions.map((r: { equation: string }) => r.equation)).toContain("O + O3 -> 2 O2");
    const list = await (await request.get("/api/mechanisms")).json();
    // the request fixture keeps the owner cookie the upload set: the uploader sees its own upload
    expect(list.mechanisms.some((m: { id: string }) => m.id === a.id)).toBe(true);

    const analysis = await request.post("/api/analyses", {
      data: { mechanismId: a.id, condition: { altitude_km: 40, zenith_deg: 30, ozone: "solved" } },
    });
    expect(analysis.status()).toBe(201);
    expect((await analysis.json()).result.steadyState.status).toBe("converged");
  });

  test("a raw YAML body is accepted as the document itself", async ({ baseURL }) => {
    const r = await fetch(`${baseURL}/api/mechanisms`, {
      method: "POST",
      headers: { "content-type": "application/yaml" },
      body: minimal,
    });
    expect(r.status).toBe(201);
  });

  for (const file of ["malformed-yaml.txt", "unbalanced.yaml", "unknown-species.yaml", "negative-k0.yaml"]) {
    test(`the broken example ${file} is refused with its documented message and line`, async ({ request }) => {
      const text = readFileSync(`test/fixtures/mechanisms/${file}`, "utf8");
      const before = (await (await request.get("/api/mechanisms")).json()).mechanisms.length;
      const r = await request.post("/api/mechanisms", { data: { text } });
      expect(r.status()).toBe(400);
      const { error } = await r.json();
      expect(error.message).toBe(expected[file][0]);
      expect(error.line).toBeGreaterThan(0);
      expect(error.problems.length).toBe(expected[file].length);
      const after = (await (await request.get("/api/mechanisms")).json()).mechanisms.length;
      expect(after).toBe(before);
    });
  }

  test("a document over the size limit is a 413", async ({ baseURL }) => {
    const r = await fetch(`${baseURL}/api/mechanisms`, {
      method: "POST",
      headers: { "content-type": "application/yaml" },
      body: `# ${"x".repeat(5 * 1024 * 1024)}\n${minimal}`,
    });
    expect(r.status).toBe(413);
    expect((await r.json()).error.code).toBe("too-large");
  });
});

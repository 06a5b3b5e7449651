import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";

// Uploads through the real server; fixtures in test/fixtures/mechanisms (invented documents).
const minimal = readFileSync("test/fixtures/mechanisms/chapman-minimal.yaml", "utf8");
const minimalJson = readFileSync("test/fixtures/mechanisms/chapman-minimal.json", "utf8");
const expected = JSON.parse(readFileSync("test/fixtures/mechanisms/expected.json", "utf8")) as Record<string, string[]>;

test.describe("mechanism uploads", () => {
  test("a valid document is stored by content hash; the same content again gives the same id", async ({ request }) => {
    const first = await request.post("/api/mechanisms", { data: { text: minimal } });
    expect([200, 201]).toContain(first.status());
    const a = await first.json();
    expect(a.id).toMatch(/^m-[0-9a-f]{32}$/);
    expect(a.summary.species).toBeGreaterThan(2);
    // The JSON form of the same document has the same canonical form, hence the same id.
    const again = await request.post("/api/mechanisms", { data: { text: minimalJson, format: "json" } });
    expect(again.status()).toBe(200);
    expect((await again.json()).id).toBe(a.id);

    const detail = await (await request.get(`/api/mechanisms/${a.id}`)).json();
    expect(detail.text).toBe(minimal);
    expect(detail.reactions.map((r: { equation: string }) => r.equation)).toContain("O + O3 -> 2 O2");
    const list = await (await request.get("/api/mechanisms")).json();
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
    expect([200, 201]).toContain(r.status);
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
    expect((await r.json()).error.code).toBe("body-too-large");
  });
});

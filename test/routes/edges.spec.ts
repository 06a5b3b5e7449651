import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import { openNetwork } from "../../bench/generators/openNetwork";
import { renamedDocument } from "../fixtures/prototypeIds";

// Ids named like Object members, a mechanism beyond the 24-hour mode's limit, and bidi text, through the real server.
const post = (baseURL: string | undefined, path: string, body: string) =>
  fetch(`${baseURL}${path}`, { method: "POST", headers: { "content-type": "application/json" }, body });

test.describe("the engine at the edges", () => {
  test("species and a pool named __proto__, constructor, toString… analyse like any others, in every mode", async ({
    baseURL,
  }) => {
    const text = renamedDocument(["HCO", "HOBr", "HBr", "H2O2", "CH3OOH"], "__proto__");
    const up = await post(baseURL, "/api/mechanisms", JSON.stringify({ text }));
    expect([200, 201]).toContain(up.status);
    const { id } = await up.json();
    for (const condition of [
      '{"altitude_km":30}',
      '{"altitude_km":30,"ozone":"solved","poolTotals":{"__proto__":3.1e-9}}',
      '{"altitude_km":30,"mode":"diurnal"}',
    ]) {
      // the body is written out so that the key "__proto__" reaches the server as a key
      const r = await post(baseURL, "/api/analyses", `{"mechanismId":"${id}","condition":${condition}}`);
      expect(r.status, condition).toBe(201);
      const { result } = await r.json();
      expect(result.steadyState.status, condition).toBe("converged");
      for (const s of result.steadyState.species) expect(Number.isFinite(s.numberDensity_cm3), s.id).toBe(true);
    }
  });

  test("a 24-hour analysis beyond the mode's size limit is a 422 naming the limit, at once", async ({ baseURL }) => {
    const up = await post(baseURL, "/api/mechanisms", JSON.stringify({ text: openNetwork(180, 720, { ozone: true }) }));
    expect([200, 201]).toContain(up.status);
    const uploaded = await up.json();
    expect(uploaded.warnings).toContainEqual(expect.objectContaining({ code: "beyond-limit" }));
    const t0 = Date.now();
    const r = await post(
      baseURL,
      "/api/analyses",
      JSON.stringify({ mechanismId: uploaded.id, condition: { altitude_km: 30, mode: "diurnal" } }),
    );
    expect(r.status).toBe(422);
    const { error } = await r.json();
    expect(error.code).toBe("beyond-limit");
    expect(error.message).toContain("limited to 150 solved species");
    // refused before any solving, not after the 30 s job limit
    expect(Date.now() - t0).toBeLessThan(20_000);
  });

  test("a label with a right-to-left override uploads with a warning that names it", async ({ baseURL }) => {
    const text = readFileSync("test/fixtures/mechanisms/chapman-minimal.yaml", "utf8").replace(
      "{ id: O3, role: solved }",
      '{ id: O3, role: solved, label: "\u202E3O" }',
    );
    const r = await post(baseURL, "/api/mechanisms", JSON.stringify({ text }));
    expect([200, 201]).toContain(r.status);
    const { warnings } = await r.json();
    expect(warnings).toContainEqual(
      expect.objectContaining({ code: "bidi-control", path: "species[3].label", line: 10 }),
    );
  });
});

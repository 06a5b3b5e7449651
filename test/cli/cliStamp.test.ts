/**
 * The launcher's stat-only check (scripts/cli-stamp.cjs) against the bundle key of scripts/cli-bundle.mjs: a stamp
 * the bundler wrote is accepted while nothing changed, and refused after an edit in place, an added or removed
 * file, or a missing bundle, so the launcher falls back to the full check that rebuilds.
 */
import { mkdirSync, mkdtempSync, readFileSync, rmSync, utimesSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { sourceKey, writeStamp } from "../../scripts/cli-bundle.mjs";
import { CLI_RUNTIME, cliBundlePaths, STAMP_FILE, stampedCliBundles } from "../../scripts/cli-stamp.cjs";

let root: string;
const file = (rel: string, text = "x") => {
  mkdirSync(path.dirname(path.join(root, rel)), { recursive: true });
  writeFileSync(path.join(root, rel), text);
};

/** What the bundler does after a build: the key's stamp, and the bundles of that key (empty files here). */
function stampAndBundles(): string {
  const { key, stamp } = sourceKey(root);
  const dir = path.join(root, ".engine");
  mkdirSync(dir, { recursive: true });
  for (const f of Object.values(cliBundlePaths(dir, key))) writeFileSync(f, "");
  writeStamp(dir, stamp);
  return key;
}

beforeEach(() => {
  root = mkdtempSync(path.join(tmpdir(), "cli-stamp-"));
  for (const f of ["scripts/cli-bundle.mjs", "scripts/cli-stamp.cjs", "scripts/node-bundle.mjs", "package.json"])
    file(f);
  file("lib/errors.ts", "export const a = 1;");
  file("lib/solver/newton.ts", "export const b = 2;");
});
afterEach(() => rmSync(root, { recursive: true, force: true }));

describe("stampedCliBundles", () => {
  it("accepts the stamp of unchanged sources and names the bundles of its key", () => {
    const key = stampAndBundles();
    expect(stampedCliBundles(root)).toEqual({
      cli: path.join(root, ".engine", `cli-${key}.cjs`),
      worker: path.join(root, ".engine", `cli-worker-${key}.mjs`),
    });
  });

  it("refuses it after a file is edited in place with the same size", () => {
    const key = stampAndBundles();
    const p = path.join(root, "lib/solver/newton.ts");
    writeFileSync(p, "export const b = 3;");
    utimesSync(p, new Date(), new Date(Date.now() + 5000));
    expect(stampedCliBundles(root)).toBeNull();
    // the full check then finds a new key, as before the stamp existed
    expect(sourceKey(root).key).not.toBe(key);
  });

  it("refuses it after a file is added to or removed from a folder of lib/", () => {
    stampAndBundles();
    const dir = path.join(root, "lib/solver");
    file("lib/solver/added.ts");
    utimesSync(dir, new Date(), new Date(Date.now() + 5000));
    expect(stampedCliBundles(root)).toBeNull();
    stampAndBundles();
    expect(stampedCliBundles(root)).not.toBeNull();
    rmSync(path.join(root, "lib/errors.ts"));
    expect(stampedCliBundles(root)).toBeNull();
  });

  it("refuses it when a bundle is missing, and when there is no stamp", () => {
    const key = stampAndBundles();
    rmSync(cliBundlePaths(path.join(root, ".engine"), key).worker);
    expect(stampedCliBundles(root)).toBeNull();
    rmSync(path.join(root, ".engine"), { recursive: true });
    expect(stampedCliBundles(root)).toBeNull();
  });

  it("refuses a stamp of another V8 or architecture, whose stored tables and fields this one may not read", () => {
    stampAndBundles();
    const stampFile = path.join(root, ".engine", STAMP_FILE);
    const stamp = JSON.parse(readFileSync(stampFile, "utf8"));
    expect(stamp.runtime).toBe(CLI_RUNTIME);
    writeFileSync(stampFile, JSON.stringify({ ...stamp, runtime: "v8 0.0.0 none" }));
    expect(stampedCliBundles(root)).toBeNull();
    expect(CLI_RUNTIME).toBe(`v8 ${process.versions.v8} ${process.arch}`);
  });
});

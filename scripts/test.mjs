// `npm test`: the whole gate. Typecheck, lint/format, dependency rules, unit and reference tests
// (vitest), the scale-out suite (vitest, test/scale) against a local Redis and
// PostgreSQL that scripts/services.mjs starts and stops, then route and
// browser tests (Playwright) against a really started production server.
// Ends with one plain line totalling every runner.
import { spawnSync } from "node:child_process";
import { existsSync, mkdirSync, readFileSync, rmSync } from "node:fs";

const env = { ...process.env, NEXT_TELEMETRY_DISABLED: "1" };
const steps = [];
let failed = false;

function run(name, cmd, args) {
  const t0 = Date.now();
  console.log(`\n=== ${name}: ${cmd} ${args.join(" ")}`);
  const r = spawnSync(cmd, args, { stdio: "inherit", env });
  const ok = r.status === 0;
  steps.push({ name, ok, seconds: (Date.now() - t0) / 1000 });
  if (!ok) failed = true;
  return ok;
}

function ensureChromium() {
  if (existsSync("/usr/bin/chromium")) return true;
  if (process.getuid?.() === 0) {
    console.log("Chromium missing: installing Debian's chromium package…");
    spawnSync("apt-get", ["update"], { stdio: "inherit" });
    const r = spawnSync("apt-get", ["install", "-y", "chromium"], { stdio: "inherit" });
    return r.status === 0 && existsSync("/usr/bin/chromium");
  }
  console.error("Browser tests need /usr/bin/chromium: run `sudo apt-get install -y chromium` and try again.");
  return false;
}

mkdirSync("test-results", { recursive: true });
run("typecheck", "node_modules/.bin/tsc", ["--noEmit"]);
run("lint", "node_modules/.bin/biome", ["check", "."]);
// import circles and upward imports between the lib/ layers (.dependency-cruiser.cjs)
run("deps", "node_modules/.bin/depcruise", [
  "--config",
  ".dependency-cruiser.cjs",
  "--ignore-known",
  ".dependency-cruiser-known-violations.json",
  "lib",
]);
run("unit", "node_modules/.bin/vitest", [
  "run",
  "--reporter=default",
  "--reporter=json",
  "--outputFile=test-results/vitest.json",
]);
run("build", "node", ["scripts/build.mjs"]);
// services.mjs starts Redis and PostgreSQL on free loopback ports (installing Debian's packages when
// missing and root), runs the suite with REDIS_URL and DATABASE_URL, and stops both whatever happens
rmSync("test-results/scale.json", { force: true });
run("scale", "node", [
  "scripts/services.mjs",
  "run",
  "--",
  "node_modules/.bin/vitest",
  "run",
  "--config",
  "test/scale/vitest.config.ts",
  "--reporter=default",
  "--reporter=json",
  "--outputFile=test-results/scale.json",
]);
if (ensureChromium()) {
  run("browser+routes", "node_modules/.bin/playwright", ["test"]);
} else {
  steps.push({ name: "browser+routes", ok: false, seconds: 0 });
  failed = true;
}

let passed = 0;
let failedTests = 0;
let skipped = 0;
for (const [file, what] of [
  ["test-results/vitest.json", "vitest"],
  ["test-results/scale.json", "scale (vitest)"],
]) {
  try {
    const v = JSON.parse(readFileSync(file, "utf8"));
    passed += v.numPassedTests ?? 0;
    failedTests += v.numFailedTests ?? 0;
    skipped += (v.numPendingTests ?? 0) + (v.numTodoTests ?? 0);
  } catch {
    console.error(`no ${what} report found`);
  }
}
try {
  const p = JSON.parse(readFileSync("test-results/playwright.json", "utf8"));
  passed += p.stats?.expected ?? 0;
  failedTests += (p.stats?.unexpected ?? 0) + (p.stats?.flaky ?? 0);
  skipped += p.stats?.skipped ?? 0;
} catch {
  console.error("no playwright report found");
}
console.log("\n=== summary");
for (const s of steps) console.log(`${s.ok ? "ok  " : "FAIL"} ${s.name} (${s.seconds.toFixed(1)} s)`);
if (failed && failedTests === 0) failedTests = steps.filter((s) => !s.ok).length;
console.log(`tests: ${passed} passed, ${failedTests} failed${skipped ? `, ${skipped} skipped` : ""}`);
process.exit(failed ? 1 : 0);

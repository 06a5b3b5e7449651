// `npm run bench`: times every case in bench/cases/*.ts (no pass/fail), prints
// a table of medians and writes bench/results/latest.json. Figures from a
// shared 2-core machine are noisy: compare medians and ratios, not single runs.
import { existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { build } from "esbuild";

const only = process.argv[2];
const files = readdirSync("bench/cases")
  .filter((f) => f.endsWith(".ts"))
  .filter((f) => !only || f.startsWith(only))
  .sort();
mkdirSync(".engine/bench", { recursive: true });
const results = [];

function quantile(sorted, q) {
  const i = (sorted.length - 1) * q;
  const lo = Math.floor(i);
  return sorted[lo] + (sorted[Math.min(lo + 1, sorted.length - 1)] - sorted[lo]) * (i - lo);
}

for (const file of files) {
  const out = path.resolve(".engine/bench", file.replace(/\.ts$/, ".mjs"));
  await build({
    entryPoints: [path.join("bench/cases", file)],
    outfile: out,
    bundle: true,
    platform: "node",
    format: "esm",
    target: "node20",
    logLevel: "warning",
    banner: { js: "import { createRequire as __cr } from 'node:module'; const require = __cr(import.meta.url);" },
  });
  const mod = await import(pathToFileURL(out).href);
  const cases = mod.setup ? ((await mod.setup()) ?? mod.cases) : mod.cases;
  for (const c of cases) {
    let sink;
    const t0 = performance.now();
    sink = await c.run(); // warm-up, also the first-call cost
    const first = performance.now() - t0;
    // a long case (minutes) may skip the separate warm-up: its first run is then also its first timed run
    const times = c.warmup === false ? [first] : [];
    const budgetEnd = performance.now() + 1000;
    const n = c.iterations ?? Number.POSITIVE_INFINITY;
    const more = () =>
      c.iterations !== undefined ? times.length < n : times.length < 5 || performance.now() < budgetEnd;
    while (more()) {
      const s = performance.now();
      sink = await c.run();
      times.push(performance.now() - s);
      if (times.length >= 200) break;
    }
    void sink;
    times.sort((a, b) => a - b);
    const row = {
      suite: file.replace(/\.ts$/, ""),
      name: c.name,
      runs: times.length,
      first_ms: first,
      median_ms: quantile(times, 0.5),
      p95_ms: quantile(times, 0.95),
      min_ms: times[0],
      note: c.note ?? "",
    };
    results.push(row);
    console.log(
      `${row.suite.padEnd(12)} ${row.name.padEnd(58)} median ${row.median_ms.toFixed(3).padStart(10)} ms  p95 ${row.p95_ms.toFixed(3).padStart(10)} ms  runs ${String(row.runs).padStart(4)}  ${row.note}`,
    );
  }
  if (mod.teardown) await mod.teardown();
}

mkdirSync("bench/results", { recursive: true });
// A partial run (a suite prefix given) replaces only its own suites' rows.
const latest = "bench/results/latest.json";
if (only && existsSync(latest)) {
  const suites = new Set(results.map((r) => r.suite));
  const old = JSON.parse(readFileSync(latest, "utf8")).results ?? [];
  results.unshift(...old.filter((r) => !suites.has(r.suite)));
}
writeFileSync(
  latest,
  JSON.stringify(
    {
      date: new Date().toISOString(),
      node: process.version,
      cpus: os.cpus().length,
      cpuModel: os.cpus()[0]?.model,
      results,
    },
    null,
    2,
  ),
);
console.log(`\n${results.length} cases; figures written to bench/results/latest.json`);

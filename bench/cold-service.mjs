// `npm run bench:cold-service`: the 51-level sweep of the reference mechanism
// as jobs of a production server that has just started, set beside the
// command line's cold sweep (`npm run bench cli`). For each of
// BENCH_SERVERS (default 3) fresh servers (bench/server.mjs, a temporary
// store): the first sweep after /api/health answers, then BENCH_AFTER
// (default 2) more on the same server, each timed from the POST to the job's
// done state (polled every 20 ms). Prints the medians of the first and of
// the later sweeps and writes bench/results/cold-service.json. No pass/fail:
// figures from a shared 2-core machine are noisy. Needs `npm run build`; the servers listen on
// BENCH_COLD_SERVICE_PORT (default 3295).
import { existsSync, mkdirSync, writeFileSync } from "node:fs";
import os from "node:os";
import { startBenchServer, sweepAsJob } from "./server.mjs";

const PORT = Number(process.env.BENCH_COLD_SERVICE_PORT ?? 3295);
const servers = Number(process.env.BENCH_SERVERS ?? 3);
const after = Number(process.env.BENCH_AFTER ?? 2);
const base = `http://127.0.0.1:${PORT}`;

if (!existsSync(".next/BUILD_ID") || !existsSync(".engine/worker.mjs")) {
  console.error("bench:cold-service: no build found (run npm run build first)");
  process.exit(1);
}

/** ms from the POST of the sweep to its job's done state. */
async function timedSweep() {
  const t0 = performance.now();
  await sweepAsJob(base);
  return performance.now() - t0;
}

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};
const round = (x) => Math.round(x);

const firsts = [];
const later = [];
for (let i = 0; i < servers; i++) {
  const server = await startBenchServer(PORT);
  try {
    firsts.push(await timedSweep());
    for (let j = 0; j < after; j++) later.push(await timedSweep());
  } finally {
    server.stop();
  }
}
const loadAverage = os.loadavg().map((v) => Math.round(v * 10) / 10);
console.log(
  `first sweep after start: median ${round(median(firsts))} ms (${firsts.map(round).join(", ")}) · later sweeps: median ${round(median(later))} ms (${later.map(round).join(", ")}) · load average ${loadAverage.join(", ")}`,
);
mkdirSync("bench/results", { recursive: true });
writeFileSync(
  "bench/results/cold-service.json",
  `${JSON.stringify({ at: new Date().toISOString(), loadAverage, firstSweep_ms: firsts, laterSweeps_ms: later }, null, 2)}\n`,
);

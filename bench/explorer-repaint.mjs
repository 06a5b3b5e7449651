// `npm run bench:repaint`: the explorer in real Chromium, from an altitude key
// step to the repainted numbers and graph. Prints medians and p95 for steps to
// conditions not seen before (server round trip) and back to ones seen
// (client cache); writes bench/results/repaint.json. No pass/fail: figures
// from a shared 2-core machine are noisy.
//
// The explorer asks for the altitudes one slider step away once a result has
// painted (components/explorer/useAnalysis.ts), so a "new condition" step is
// served from that answer when it arrived within the pause between steps
// (BENCH_PAUSE_MS, default 150 ms), and waits for it, or for its own request,
// otherwise: the figures are what a reader stepping at that pace sees.
//
// A third phase releases the slider far from where it was (BENCH_JUMPS, default
// 12, altitudes no earlier step or neighbour request has touched): the value
// is set and the input and change events fire as on a pointer release, so
// each is a server round trip with nothing asked ahead.
//
// BENCH_CPU=1 also records a Chromium trace of each phase and prints the
// renderer main thread's CPU time per step (the trace's thread durations of
// its top-level tasks, the pauses included): unlike the times above, it
// hardly moves with the machine's load, so it compares builds on a busy
// machine. Tracing slows the page a little, so the times of such a run are
// not comparable with a run without it.
//
// Needs a started server: `npm run build && PORT=3226 npm start`, then
// `BENCH_URL=http://127.0.0.1:3226 npm run bench:repaint` (default port 3000).
import { mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import { chromium } from "@playwright/test";

const base = process.env.BENCH_URL ?? "http://127.0.0.1:3000";
const steps = Number(process.env.BENCH_STEPS ?? 24);
const start_km = 30;
const pause_ms = Number(process.env.BENCH_PAUSE_MS ?? 150);
const jumps = Number(process.env.BENCH_JUMPS ?? 12);
const traceCpu = process.env.BENCH_CPU === "1";
/** Far from 30–42.5 km (the key steps and their neighbours) and more than one step from each other. */
const JUMP_KM = [15, 50, 20, 55, 12.5, 47.5, 22.5, 57.5, 17.5, 52.5, 25, 45, 10, 60, 27, 44];

const quantile = (xs, q) => {
  const s = [...xs].sort((a, b) => a - b);
  const i = (s.length - 1) * q;
  const lo = Math.floor(i);
  return s[lo] + (s[Math.min(lo + 1, s.length - 1)] - s[lo]) * (i - lo);
};

const browser = await chromium.launch({
  executablePath: "/usr/bin/chromium",
  args: ["--headless", "--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking"],
});
const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
await page.goto(`${base}/explore?m=reference&z=${start_km}`);
await page.waitForSelector('[data-testid="network"][data-ready="true"]', { timeout: 60_000 });
await page.waitForFunction(
  () => document.querySelector('[data-testid="status"]')?.textContent?.includes("converged"),
  null,
  {
    timeout: 60_000,
  },
);
await page.getByLabel("Altitude").focus();

/** One real key press: time from its keydown event to the frame after the status shows the new altitude. */
async function step(key, km) {
  await page.evaluate((km) => {
    window.__repaint = new Promise((resolve) => {
      let t0 = null;
      const input = document.activeElement;
      input.addEventListener("keydown", (e) => (t0 = e.timeStamp), { once: true, capture: true });
      const status = document.querySelector('[data-testid="status"]');
      const obs = new MutationObserver(() => {
        const text = status?.textContent ?? "";
        if (t0 === null || !text.startsWith(`${km} km`) || document.querySelector('[data-testid="computing"]')) return;
        obs.disconnect();
        // two frames: React's commit and cytoscape's redraw of the new data
        requestAnimationFrame(() => requestAnimationFrame(() => resolve(performance.now() - t0)));
      });
      obs.observe(document.body, { subtree: true, childList: true, characterData: true });
    });
  }, km);
  await page.keyboard.press(key);
  return page.evaluate(() => window.__repaint);
}

/** A pointer release at `km`: time from the input event to the frame after the status shows it. */
async function release(km) {
  return page.evaluate(
    (km) =>
      new Promise((resolve) => {
        const input = document.activeElement;
        const status = document.querySelector('[data-testid="status"]');
        let t0 = null;
        const obs = new MutationObserver(() => {
          const text = status?.textContent ?? "";
          if (t0 === null || !text.startsWith(`${km} km`) || document.querySelector('[data-testid="computing"]'))
            return;
          obs.disconnect();
          requestAnimationFrame(() => requestAnimationFrame(() => resolve(performance.now() - t0)));
        });
        obs.observe(document.body, { subtree: true, childList: true, characterData: true });
        const setValue = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, "value").set;
        setValue.call(input, String(km));
        t0 = performance.now();
        input.dispatchEvent(new Event("input", { bubbles: true }));
        input.dispatchEvent(new Event("change", { bubbles: true }));
      }),
    km,
  );
}

/** The renderer main thread's CPU time in `run`, ms (null unless BENCH_CPU=1). */
async function cpuOf(run) {
  if (!traceCpu) {
    await run();
    return null;
  }
  const path = "bench/results/.repaint-trace.json";
  await browser.startTracing(page, { path, categories: ["toplevel", "devtools.timeline"] });
  await run();
  await browser.stopTracing();
  const events = JSON.parse(readFileSync(path, "utf8")).traceEvents;
  rmSync(path);
  const main = events.find((e) => e.name === "thread_name" && e.args?.name === "CrRendererMain");
  const us = events
    .filter(
      (e) => e.pid === main?.pid && e.tid === main?.tid && e.ph === "X" && e.name === "ThreadControllerImpl::RunTask",
    )
    .reduce((a, e) => a + (e.tdur ?? 0), 0);
  return us / 1000;
}

mkdirSync("bench/results", { recursive: true });
const fresh = [];
const cached = [];
const far = [];
let km = start_km;
const cpu_ms = {
  newCondition: await cpuOf(async () => {
    for (let i = 0; i < steps; i++) {
      km += 0.5;
      fresh.push(await step("ArrowRight", km));
      await page.waitForTimeout(pause_ms);
    }
  }),
  revisited: await cpuOf(async () => {
    for (let i = 0; i < steps; i++) {
      km -= 0.5;
      cached.push(await step("ArrowLeft", km));
      await page.waitForTimeout(pause_ms);
    }
  }),
  releasedFar: await cpuOf(async () => {
    for (const z of JUMP_KM.slice(0, jumps)) {
      far.push(await release(z));
      await page.waitForTimeout(pause_ms);
    }
  }),
};
await browser.close();

const summary = (xs) => ({
  n: xs.length,
  median_ms: Math.round(quantile(xs, 0.5)),
  p95_ms: Math.round(quantile(xs, 0.95)),
  max_ms: Math.round(Math.max(...xs)),
});
const out = {
  at: new Date().toISOString(),
  loadAverage: os.loadavg().map((v) => Math.round(v * 10) / 10),
  pause_ms,
  newCondition: summary(fresh),
  revisited: summary(cached),
  releasedFar: summary(far),
  ...(traceCpu
    ? {
        mainThreadCpuPerStep_ms: {
          newCondition: Math.round(cpu_ms.newCondition / fresh.length),
          revisited: Math.round(cpu_ms.revisited / cached.length),
          releasedFar: Math.round(cpu_ms.releasedFar / far.length),
        },
      }
    : {}),
  raw_ms: { newCondition: fresh.map(Math.round), revisited: cached.map(Math.round), releasedFar: far.map(Math.round) },
};
console.log(
  `key step → repaint, reference mechanism from ${start_km} km in 0.5 km steps (load ${out.loadAverage.join(", ")})`,
);
console.log(
  `  new condition  median ${out.newCondition.median_ms} ms  p95 ${out.newCondition.p95_ms} ms  max ${out.newCondition.max_ms} ms  (n ${steps})`,
);
console.log(
  `  revisited      median ${out.revisited.median_ms} ms  p95 ${out.revisited.p95_ms} ms  max ${out.revisited.max_ms} ms  (n ${steps})`,
);
console.log(
  `  released far   median ${out.releasedFar.median_ms} ms  p95 ${out.releasedFar.p95_ms} ms  max ${out.releasedFar.max_ms} ms  (n ${far.length})`,
);
if (out.mainThreadCpuPerStep_ms) {
  const c = out.mainThreadCpuPerStep_ms;
  console.log(
    `  main-thread CPU per step (pauses included): new ${c.newCondition} ms, revisited ${c.revisited} ms, released far ${c.releasedFar} ms`,
  );
}
writeFileSync("bench/results/repaint.json", `${JSON.stringify(out, null, 2)}\n`);

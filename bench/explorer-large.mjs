// `npm run bench:large`: the explorer in real Chromium opening generated
// (invented) open networks of 500, 1,000 and 2,000 solved species
// (bench/generators/openNetwork.ts, with the Chapman reactions so that the
// cycle analysis has odd oxygen to follow). For each size: the upload, then
// /explore on it, recording every long task (PerformanceObserver 'longtask',
// buffered from navigation start) until the analysed graph is painted and
// the page has answered a key press; the built-in reference mechanism first,
// for comparison. Prints the time to the graph's first
// paint and to the analysed graph, the longest task, the count of tasks over
// 50 ms and over 200 ms; writes bench/results/explorer-large.json. No
// pass/fail: figures from a shared 2-core machine are noisy.
//
// Needs a started server: `npm run build && PORT=3250 npm start`, then
// `BENCH_URL=http://127.0.0.1:3250 npm run bench:large` (default port 3000).
// BENCH_SIZES=reference,500,2000 and BENCH_REPEATS=3 change what is run.
import { mkdirSync, writeFileSync } from "node:fs";
import os from "node:os";
import { chromium } from "@playwright/test";
import { loadOpenNetwork } from "./loadOpenNetwork.mjs";

const base = process.env.BENCH_URL ?? "http://127.0.0.1:3000";
const sizes = (process.env.BENCH_SIZES ?? "reference,500,1000,2000")
  .split(",")
  .map((s) => (s === "reference" ? s : Number(s)));
const repeats = Number(process.env.BENCH_REPEATS ?? 1);

const openNetwork = await loadOpenNetwork();

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};

const browser = await chromium.launch({
  executablePath: "/usr/bin/chromium",
  args: ["--headless", "--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking"],
});

/** One open of the explorer on an uploaded mechanism, in a fresh context that owns it. */
async function openOnce(n) {
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  const page = await context.newPage();
  // "reference": the built-in mechanism, for comparison (what the canvas costs at any size)
  const doc = n === "reference" ? "" : openNetwork(n, 4 * n, { ozone: true });
  let id = "reference";
  if (doc) {
    const up = await page.request.post(`${base}/api/mechanisms`, {
      headers: { "content-type": "application/json" },
      data: doc,
      timeout: 120_000,
    });
    if (!up.ok()) throw new Error(`upload of ${n} species: ${up.status()} ${await up.text()}`);
    id = (await up.json()).id;
  }
  await page.addInitScript(() => {
    window.__longTasks = [];
    new PerformanceObserver((list) => {
      for (const e of list.getEntries()) window.__longTasks.push({ start: e.startTime, duration: e.duration });
    }).observe({ type: "longtask", buffered: true });
    window.__firstPaint = null;
    const watch = new MutationObserver(() => {
      const box = document.querySelector('[data-testid="network"][data-ready="true"]');
      if (!box || window.__firstPaint !== null) return;
      window.__firstPaint = -1;
      requestAnimationFrame(() => requestAnimationFrame(() => (window.__firstPaint = performance.now())));
    });
    document.addEventListener("DOMContentLoaded", () =>
      watch.observe(document.body, { subtree: true, attributes: true, childList: true }),
    );
  });
  await page.goto(`${base}/explore?m=${id}&z=30`);
  await page.waitForFunction(
    () => document.querySelector('[data-testid="status"]')?.textContent?.includes("converged"),
    null,
    { timeout: 180_000 },
  );
  const analysed = await page.evaluate(
    () => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(() => r(performance.now())))),
  );
  await page.waitForFunction(() => typeof window.__firstPaint === "number" && window.__firstPaint > 0);
  // the page answers input: time from a key press in the altitude field to its new value on screen
  const field = page.getByLabel("Altitude", { exact: false }).first();
  await field.focus();
  const t0 = Date.now();
  await page.keyboard.press("ArrowRight");
  const inputDelay = Date.now() - t0;
  await page.waitForTimeout(1500);
  const out = await page.evaluate(() => ({
    firstPaint: window.__firstPaint,
    tasks: window.__longTasks,
    drawn: window.__ozoneNetwork?.nodes().filter((x) => x.classes.includes("reaction")).length ?? null,
  }));
  await context.close();
  const durations = out.tasks.map((t) => t.duration);
  return {
    firstPaint_ms: Math.round(out.firstPaint),
    analysedPaint_ms: Math.round(analysed),
    longestTask_ms: Math.round(Math.max(0, ...durations)),
    tasksOver50: durations.length,
    tasksOver200: durations.filter((d) => d > 200).length,
    keyPress_ms: inputDelay,
    reactionsDrawn: out.drawn,
    uploadBytes: doc.length,
    tasks: out.tasks.map((t) => [Math.round(t.start), Math.round(t.duration)]),
  };
}

const results = [];
for (const n of sizes) {
  const runs = [];
  for (let k = 0; k < repeats; k++) runs.push(await openOnce(n));
  const pick = (key) => median(runs.map((r) => r[key]));
  const row = {
    species: n,
    reactions: n === "reference" ? null : 4 * n + 24,
    runs: runs.length,
    firstPaint_ms: pick("firstPaint_ms"),
    analysedPaint_ms: pick("analysedPaint_ms"),
    longestTask_ms: pick("longestTask_ms"),
    tasksOver50: pick("tasksOver50"),
    tasksOver200: pick("tasksOver200"),
    keyPress_ms: pick("keyPress_ms"),
    reactionsDrawn: runs[0].reactionsDrawn,
    raw: runs,
  };
  results.push(row);
  console.log(
    `${String(n).padStart(5)} species: first paint ${row.firstPaint_ms} ms · analysed graph ${row.analysedPaint_ms} ms · longest task ${row.longestTask_ms} ms · tasks >50 ms ${row.tasksOver50} · >200 ms ${row.tasksOver200} · key press ${row.keyPress_ms} ms · ${row.reactionsDrawn} reactions drawn (median of ${runs.length})`,
  );
}
await browser.close();
const loadAverage = os.loadavg().map((v) => Math.round(v * 10) / 10);
console.log(`load average ${loadAverage.join(", ")}`);
mkdirSync("bench/results", { recursive: true });
writeFileSync(
  "bench/results/explorer-large.json",
  `${JSON.stringify({ at: new Date().toISOString(), loadAverage, results }, null, 2)}\n`,
);

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
// Needs a started server: `npm run build && PORT=3226 npm start`, then
// `BENCH_URL=http://127.0.0.1:3226 npm run bench:repaint` (default port 3000).
import { mkdirSync, writeFileSync } from "node:fs";
import os from "node:os";
import { chromium } from "@playwright/test";

const base = process.env.BENCH_URL ?? "http://127.0.0.1:3000";
const steps = Number(process.env.BENCH_STEPS ?? 24);
const start_km = 30;
const pause_ms = Number(process.env.BENCH_PAUSE_MS ?? 150);

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

const fresh = [];
const cached = [];
let km = start_km;
for (let i = 0; i < steps; i++) {
  km += 0.5;
  fresh.push(await step("ArrowRight", km));
  await page.waitForTimeout(pause_ms);
}
for (let i = 0; i < steps; i++) {
  km -= 0.5;
  cached.push(await step("ArrowLeft", km));
  await page.waitForTimeout(pause_ms);
}
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
  raw_ms: { newCondition: fresh.map(Math.round), revisited: cached.map(Math.round) },
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
mkdirSync("bench/results", { recursive: true });
writeFileSync("bench/results/repaint.json", `${JSON.stringify(out, null, 2)}\n`);

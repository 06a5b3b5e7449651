import { chromium } from "@playwright/test";
const base = "http://127.0.0.1:3431";
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--headless", "--no-sandbox", "--disable-gpu"] });
const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
await page.goto(`${base}/explore?m=reference&z=30`);
await page.waitForSelector('[data-testid="network"][data-ready="true"]', { timeout: 60000 });
await page.waitForFunction(() => document.querySelector('[data-testid="status"]')?.textContent?.includes("converged"), null, { timeout: 60000 });
await page.getByLabel("Altitude").focus();
for (let i = 0; i < 6; i++) { await page.keyboard.press("ArrowRight"); await page.waitForTimeout(900); }
for (let i = 0; i < 6; i++) { await page.keyboard.press("ArrowLeft"); await page.waitForTimeout(400); }
await browser.startTracing(page, { categories: ["devtools.timeline", "disabled-by-default-devtools.timeline"] });
for (let i = 0; i < 6; i++) { await page.keyboard.press("ArrowRight"); await page.waitForTimeout(400); }
const buf = await browser.stopTracing();
const ev = JSON.parse(buf.toString()).traceEvents;
const main = ev.filter((e) => e.ph === "X" && e.dur);
// top-level tasks on the renderer main thread
const tid = main.find((e) => e.name === "FireAnimationFrame")?.tid;
const sum = {};
for (const e of main) if (e.tid === tid) sum[e.name] = (sum[e.name] ?? 0) + e.dur / 1000;
console.log(Object.entries(sum).sort((a, b) => b[1] - a[1]).slice(0, 25).map(([k, v]) => `${(v / 6).toFixed(1)} ms/step\t${k}`).join("\n"));

const fa = main.filter((e) => e.tid === tid && e.name === "FireAnimationFrame").map((e) => Math.round(e.dur / 1000));
console.log("animation frames", fa.length, fa.join(" "));
const fc = main.filter((e) => e.tid === tid && e.name === "EventDispatch").map((e) => `${e.args?.data?.type}:${Math.round(e.dur / 1000)}`);
console.log("events", fc.join(" "));
const cm = main.filter((e) => e.tid === tid && e.name === "Commit").map((e) => Math.round(e.dur / 1000));
console.log("commits", cm.length, cm.join(" "));
await browser.close();

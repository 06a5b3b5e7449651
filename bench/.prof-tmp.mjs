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
const mode = process.argv[2] ?? "cached";
const cdp = await page.context().newCDPSession(page);
await cdp.send("Profiler.enable");
await cdp.send("Profiler.setSamplingInterval", { interval: 200 });
await cdp.send("Profiler.start");
for (let i = 0; i < 6; i++) { await page.keyboard.press(mode === "cached" ? "ArrowRight" : "ArrowRight"); await page.waitForTimeout(mode==="cached"?400:900); }
const { profile } = await cdp.send("Profiler.stop");
const byId = new Map(profile.nodes.map((n) => [n.id, n]));
const self = new Map();
const dt = profile.timeDeltas; 
profile.samples.forEach((id, i) => { const n = byId.get(id); const cf = n.callFrame; const k = `${cf.functionName || "(anon)"} ${cf.url.split("/").pop()}:${cf.lineNumber}`; self.set(k, (self.get(k) ?? 0) + (dt[i] ?? 0) / 1000); });
const tot = [...self.entries()].filter(([k]) => !k.startsWith("(idle)") && !k.startsWith("(program)")).reduce((a, [, v]) => a + v, 0);
console.log("busy ms", tot.toFixed(0), "program", (self.get("(program) :-1")??0).toFixed(0), "gc", (self.get("(garbage collector) :-1")??0).toFixed(0));
console.log([...self.entries()].sort((a, b) => b[1] - a[1]).slice(0, 40).map(([k, v]) => `${v.toFixed(1)}\t${k}`).join("\n"));
// total (inclusive) by script file
await browser.close();

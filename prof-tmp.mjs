import { chromium } from "@playwright/test";

const b = await chromium.launch({
  executablePath: "/usr/bin/chromium",
  args: ["--headless", "--no-sandbox", "--disable-gpu"],
});
const page = await b.newPage({ viewport: { width: 1280, height: 800 } });
await page.goto("http://127.0.0.1:3226/explore?m=reference&z=30");
await page.waitForSelector('[data-testid="network"][data-ready="true"]');
await page.waitForFunction(() => document.querySelector('[data-testid="status"]')?.textContent?.includes("converged"));
await page.getByLabel("Altitude").focus();
// warm: visit 30.5..32 then back
for (let i = 0; i < 4; i++) {
  await page.keyboard.press("ArrowRight");
  await page.waitForTimeout(1500);
}
const cdp = await page.context().newCDPSession(page);
await cdp.send("Profiler.enable");
await cdp.send("Profiler.setSamplingInterval", { interval: 200 });
await cdp.send("Profiler.start");
for (let i = 0; i < 4; i++) {
  await page.keyboard.press("ArrowLeft");
  await page.waitForTimeout(600);
}
for (let i = 0; i < 4; i++) {
  await page.keyboard.press("ArrowRight");
  await page.waitForTimeout(600);
}
const { profile } = await cdp.send("Profiler.stop");
const self = new Map();
const dt = profile.timeDeltas;
const byId = new Map(profile.nodes.map((n) => [n.id, n]));
profile.samples.forEach((id, i) => {
  const n = byId.get(id);
  const k = `${n.callFrame.functionName || "(anon)"} ${n.callFrame.url.split("/").pop()}:${n.callFrame.lineNumber}:${n.callFrame.columnNumber}`;
  self.set(k, (self.get(k) ?? 0) + (dt[i] ?? 0) / 1000);
});
console.log(
  [...self]
    .sort((a, b) => b[1] - a[1])
    .slice(0, 30)
    .map(([k, v]) => `${v.toFixed(1)}ms ${k}`)
    .join("\n"),
);
await b.close();

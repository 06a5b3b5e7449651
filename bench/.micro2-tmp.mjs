import { chromium } from "@playwright/test";
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--headless", "--no-sandbox", "--disable-gpu"] });
const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
await page.goto(`http://127.0.0.1:3431/explore?m=reference&z=30`);
await page.waitForSelector('[data-testid="network"][data-ready="true"]', { timeout: 60000 });
await page.waitForTimeout(3000);
const cdp = await page.context().newCDPSession(page);
await cdp.send("Profiler.enable");
await cdp.send("Profiler.setSamplingInterval", { interval: 100 });
await cdp.send("Profiler.start");
await page.evaluate(async () => {
  const cy = document.querySelector('[data-testid="network"]')._cyreg.cy;
  const r = cy.renderer();
  for (let k = 0; k < 20; k++) {
    cy.batch(() => {
      cy.edges().forEach((e) => e.data("width", 1 + ((k + e.id().length) % 7)));
      cy.nodes(".reaction").forEach((n) => n.data("color", k % 2 ? "#336699" : "#993366"));
    });
    r.render();
  }
});
const { profile } = await cdp.send("Profiler.stop");
const byId = new Map(profile.nodes.map((n) => [n.id, n]));
const parent = new Map(); for (const n of profile.nodes) for (const c of n.children ?? []) parent.set(c, n.id);
const self = new Map(), incl = new Map();
profile.samples.forEach((id, i) => {
  const d = (profile.timeDeltas[i] ?? 0) / 1000;
  const n = byId.get(id); const k = `${n.callFrame.functionName || "(anon)"}:${n.callFrame.lineNumber}:${n.callFrame.columnNumber}`;
  self.set(k, (self.get(k) ?? 0) + d);
  const seen = new Set(); let cur = id;
  while (cur !== undefined) { const m = byId.get(cur); const kk = `${m.callFrame.functionName || "(anon)"}:${m.callFrame.lineNumber}:${m.callFrame.columnNumber}`; if (!seen.has(kk)) { incl.set(kk, (incl.get(kk) ?? 0) + d); seen.add(kk);} cur = parent.get(cur); }
});
console.log("SELF\n" + [...self].sort((a, b) => b[1] - a[1]).slice(0, 15).map(([k, v]) => `${v.toFixed(0)}\t${k}`).join("\n"));
console.log("INCL\n" + [...incl].sort((a, b) => b[1] - a[1]).slice(0, 40).map(([k, v]) => `${v.toFixed(0)}\t${k}`).join("\n"));
await browser.close();

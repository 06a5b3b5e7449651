import { chromium } from "@playwright/test";
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--headless", "--no-sandbox", "--disable-gpu"] });
const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
await page.goto(`http://127.0.0.1:3431/explore?m=reference&z=30`);
await page.waitForSelector('[data-testid="network"][data-ready="true"]', { timeout: 60000 });
await page.waitForTimeout(3000);
const res = await page.evaluate(async () => {
  const cy = document.querySelector('[data-testid="network"]')._cyreg.cy;
  const r = cy.renderer();
  const orig = r.drawLayeredElements;
  const frame = () => new Promise((res) => requestAnimationFrame(() => res()));
  const med = (xs) => xs.sort((a, b) => a - b)[xs.length >> 1];
  const out = {};
  let k = 0;
  for (const mode of ["layers", "nolayers", "layers", "nolayers"]) {
    r.drawLayeredElements = mode === "layers" ? orig : r.drawCachedElements;
    const style = [], draw = [];
    for (let i = 0; i < 15; i++) {
      await frame(); await frame();
      k++;
      const t0 = performance.now();
      cy.batch(() => {
        cy.edges().forEach((e) => e.data("width", 1 + ((k + e.id().length) % 7)));
        cy.nodes(".reaction").forEach((n) => n.data("color", k % 2 ? "#336699" : "#993366"));
      });
      const t1 = performance.now();
      r.render();
      const t2 = performance.now();
      style.push(t1 - t0); draw.push(t2 - t1);
    }
    out[`${mode}${Object.keys(out).length}`] = { batch: med(style).toFixed(1), render: med(draw).toFixed(1) };
  }
  return out;
});
console.log(res);
await browser.close();

import { chromium } from "@playwright/test";
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--headless", "--no-sandbox", "--disable-gpu"] });
const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
await page.goto(`http://127.0.0.1:3431/explore?m=reference&z=30`);
await page.waitForSelector('[data-testid="network"][data-ready="true"]', { timeout: 60000 });
await page.waitForTimeout(3000);
console.log(await page.evaluate(() => {
  const cy = document.querySelector('[data-testid="network"]')._cyreg.cy;
  const r = cy.renderer();
  return { nodes: cy.nodes().length, edges: cy.edges().length, pxRatio: r.getPixelRatio?.(), canvases: [...document.querySelectorAll('[data-testid="network"] canvas')].map(c => `${c.width}x${c.height}`), dpr: devicePixelRatio,
    kinds: Object.entries(cy.nodes().map(n => n.data("kind")).reduce((a, k) => (a[k] = (a[k] ?? 0) + 1, a), {})) };
}));
await browser.close();

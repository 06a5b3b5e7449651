import { chromium } from "@playwright/test";

const b = await chromium.launch({
  executablePath: "/usr/bin/chromium",
  args: ["--headless", "--no-sandbox", "--disable-gpu"],
});
const p = await b.newPage({ viewport: { width: 1440, height: 900 }, deviceScaleFactor: 2 });
await p.goto(process.argv[2]);
await p.waitForSelector('[data-testid="network"][data-ready="true"]', { timeout: 60000 });
await p.waitForFunction(
  () => document.querySelector('[data-testid="status"]')?.textContent?.includes("converged"),
  null,
  { timeout: 60000 },
);
await p.waitForTimeout(1000);
await p.screenshot({ path: process.argv[3], clip: { x: 560, y: 300, width: 330, height: 200 } });
await b.close();

import { chromium } from "@playwright/test";

const url = process.argv[2];
const out = process.argv[3];
const b = await chromium.launch({
  executablePath: "/usr/bin/chromium",
  args: ["--headless", "--no-sandbox", "--disable-gpu"],
});
const p = await b.newPage({ viewport: { width: 1440, height: 900 } });
await p.goto(url);
await p.waitForSelector('[data-testid="network"][data-ready="true"]', { timeout: 60000 });
await p.waitForFunction(
  () => document.querySelector('[data-testid="status"]')?.textContent?.includes("converged"),
  null,
  { timeout: 60000 },
);
await p.waitForTimeout(800);
if (process.argv[4]) await p.click(process.argv[4]);
await p.waitForTimeout(800);
await p.screenshot({ path: out });
console.log(await p.evaluate(() => document.querySelector('[data-testid="hidden-count"]')?.textContent));
await b.close();

import { chromium } from "@playwright/test";
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--headless", "--no-sandbox", "--disable-gpu"] });
const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
page.on("frameattached", (f) => console.log("frame attached", f.url()));
page.on("framenavigated", (f) => console.log("frame navigated", f === page.mainFrame() ? "main" : "sub", f.url().slice(0, 80)));
page.on("request", (r) => console.log("request", r.method(), r.url().slice(0, 90)));
await page.goto(`http://127.0.0.1:3431/explore?m=reference&z=30`);
await page.waitForSelector('[data-testid="network"][data-ready="true"]', { timeout: 60000 });
await page.waitForTimeout(3000);
console.log("---- steps");
await page.getByLabel("Altitude").focus();
for (let i = 0; i < 2; i++) { await page.keyboard.press("ArrowRight"); await page.waitForTimeout(1500); }
console.log(await page.evaluate(() => document.querySelectorAll("iframe, object, embed").length), "iframes");
await browser.close();

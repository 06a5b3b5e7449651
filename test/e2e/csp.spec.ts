import { expect, type Page, test } from "@playwright/test";

/**
 * The pages work under their Content-Security-Policy (lib/service/securityHeaders.ts): a listener for
 * securitypolicyviolation events and the console's CSP errors stay empty while the explorer draws its
 * cytoscape network, the charts render and the exports download. Screenshots go to test-results/screenshots/.
 */

declare global {
  interface Window {
    __cspViolations?: string[];
  }
}

async function watchCsp(page: Page): Promise<string[]> {
  const problems: string[] = [];
  page.on("console", (m) => {
    if (m.type() === "error" && /Content Security Policy|Refused to/i.test(m.text())) problems.push(m.text());
  });
  await page.addInitScript(() => {
    window.__cspViolations = [];
    document.addEventListener("securitypolicyviolation", (e) => {
      window.__cspViolations?.push(`${e.violatedDirective}: ${e.blockedURI} (${e.sourceFile}:${e.lineNumber})`);
    });
  });
  return problems;
}

const violations = async (page: Page, console: string[]) => [
  ...((await page.evaluate(() => window.__cspViolations ?? [])) as string[]),
  ...console,
];

test("the explorer, its network, charts and exports work under the CSP with no violation", async ({ page }) => {
  const console = await watchCsp(page);
  const response = await page.goto("/explore?m=reference&z=40&lat=45&date=2026-03-20&t=12&mode=instantaneous");
  expect(response?.headers()["content-security-policy"]).toContain("'strict-dynamic'");
  await expect(page.getByTestId("network")).toHaveAttribute("data-ready", "true", { timeout: 30_000 });
  await expect(page.getByTestId("status")).toContainText("converged", { timeout: 60_000 });
  await expect(page.getByTestId("cycle").first()).toBeVisible();
  const [png] = await Promise.all([
    page.waitForEvent("download"),
    page.getByTestId("export").getByRole("button", { name: "PNG" }).click(),
  ]);
  expect(png.suggestedFilename()).toMatch(/\.png$/);
  const [svg] = await Promise.all([
    page.waitForEvent("download"),
    page.getByTestId("export").getByRole("button", { name: "SVG" }).click(),
  ]);
  expect(svg.suggestedFilename()).toMatch(/\.svg$/);
  await page.screenshot({ path: "test-results/screenshots/csp-explorer.png" });
  expect(await violations(page, console)).toEqual([]);
});

for (const path of ["/", "/profiles", "/compare", "/assess"]) {
  test(`${path} renders and hydrates under the CSP with no violation`, async ({ page }) => {
    const console = await watchCsp(page);
    await page.goto(path);
    await page.waitForLoadState("networkidle");
    await expect(page.locator("main")).toBeVisible();
    await page.screenshot({
      path: `test-results/screenshots/csp${path === "/" ? "-home" : path.replace("/", "-")}.png`,
    });
    expect(await violations(page, console)).toEqual([]);
  });
}

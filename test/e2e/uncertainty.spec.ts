import { expect, test } from "@playwright/test";

test("the explorer runs Monte Carlo ranges and sensitivities for the shown conditions", async ({ page }) => {
  await page.goto("/explore?m=oxygen-chlorine&z=40");
  await expect(page.getByTestId("budget")).toContainText("Ox loss", { timeout: 30_000 });
  await page.getByText("Ranges (5–95 %)").click();
  await page.getByLabel("samples").fill("50");
  await page.getByRole("button", { name: "Run uncertainty" }).click();
  const runner = page.getByTestId("uncertainty-runner");
  await expect(runner).toContainText("50 samples", { timeout: 60_000 });
  await expect(runner).toContainText("total Ox loss rate");
  await expect(runner).toContainText("5–95 %");
  await expect(runner.getByRole("link", { name: "uncertainty.csv" })).toHaveAttribute(
    "href",
    /\/api\/analyses\/.+\/uncertainty\.csv$/,
  );
  await runner.scrollIntoViewIfNeeded();
  await page.screenshot({ path: "test-results/screenshots/explorer-uncertainty.png", fullPage: true });
});

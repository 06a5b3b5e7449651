import { expect, test } from "@playwright/test";

test("the landing page says what the tool is, links to the explorer and shows the cautions", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Ozone Loss Cycles");
  await expect(page.getByText("catalytic cycle", { exact: false }).first()).toBeVisible();
  await expect(page.getByTestId("caution")).toContainText("not for regulatory reporting");
  const link = page.getByRole("link", { name: "Open the explorer" });
  await expect(link).toHaveAttribute("href", "/explore");
  await page.screenshot({ path: "test-results/screenshots/home.png", fullPage: true });
});

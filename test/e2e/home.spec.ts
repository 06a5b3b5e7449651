import { expect, test } from "@playwright/test";

test("the landing page says what the tool is, links to the explorer and shows the cautions", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Ozone Loss Cycles");
  await expect(page.getByText("catalytic cycle", { exact: false }).first()).toBeVisible();
  await expect(page.getByTestId("caution")).toContainText("not for regulatory reporting");
  const link = page.getByRole("link", { name: "Open the explorer" });
  await expect(link).toHaveAttribute("href", "/explore");
  // every page of the top bar has a card, and the scripts card leads to the OpenAPI document
  for (const [name, href] of [
    ["Explorer", "/explore"],
    ["Profiles", "/profiles"],
    ["Runs over days", "/runs"],
    ["Compare", "/compare"],
    ["Assessments", "/assess"],
    ["From scripts", "/api/openapi.json"],
  ]) {
    await expect(page.getByRole("main").getByRole("link", { name, exact: true })).toHaveAttribute("href", href);
  }
  await page.screenshot({ path: "test-results/screenshots/home.png", fullPage: true });
});

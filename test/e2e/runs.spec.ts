import { expect, test } from "@playwright/test";

test("the invented cold-vortex parcel runs from the runs page, shows ozone falling and opens the explorer at an hour", async ({
  page,
}) => {
  test.setTimeout(300_000);
  await page.goto("/runs");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Runs over days");
  // the own-run form starts on the full reference chemistry, as the sweep form does
  await expect(page.getByRole("form", { name: "Run" }).getByLabel("Mechanism")).toHaveValue("reference");
  await page.getByTestId("demo-invented-vortex-parcel").click();
  await expect(page.getByRole("progressbar")).toBeVisible();
  await page.waitForURL(/\/runs\/[A-Za-z0-9_-]{16}$/, { timeout: 240_000 });
  // the run's deletion token, shown once on its page (it came in the address fragment, now removed)
  await expect(page.getByTestId("deletion-token")).toContainText("DELETE /api/runs/");
  expect(page.url()).not.toContain("deletion-token");

  await expect(page.getByRole("heading", { level: 1 })).toContainText("invented");
  await expect(page.getByTestId("run-status")).toContainText("20 days integrated");
  for (const id of ["o3-chart", "chlorine-chart", "daily-loss-chart"]) await expect(page.getByTestId(id)).toBeVisible();
  await expect(page.locator('[data-testid="o3-chart"] path[data-series="O3"]')).toHaveCount(1);
  await expect(page.locator('[data-testid="chlorine-chart"] path[data-series]')).toHaveCount(4);
  expect(await page.locator('[data-testid="daily-loss-chart"] rect[data-family]').count()).toBeGreaterThan(20);
  const rows = page.getByTestId("daily-table").locator("tbody tr");
  await expect(rows).toHaveCount(20);
  // day 2, cold and sunlit: ozone falls (the table writes the minus sign, U+2212)
  const change = (await rows.nth(1).locator("td").nth(1).textContent())?.replace("\u2212", "-");
  expect(Number(change)).toBeLessThan(-5);
  await page.screenshot({ path: "test-results/screenshots/run-vortex.png", fullPage: true });

  await page.getByLabel("hour of the run").fill("36");
  await page.getByTestId("open-hour").click();
  await page.waitForURL(/\/a\/[A-Za-z0-9_-]{16}-h36$/);
  await expect(page.getByTestId("instant-notice")).toContainText("not a steady state");
  await expect(page.getByTestId("status")).toContainText("instant");
  await expect(page.getByTestId("permalink")).toHaveValue(/\/a\/[A-Za-z0-9_-]{16}-h36$/);
  await page.screenshot({ path: "test-results/screenshots/run-vortex-hour.png", fullPage: true });
});

import { expect, test } from "@playwright/test";

test("a comparison of the two demo profiles shows both partitions, the difference and the cycles, and has a permalink", async ({
  page,
  request,
}) => {
  test.setTimeout(300_000);
  await page.goto("/compare");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Compare two profiles");
  await page.getByRole("button", { name: "the two demo profiles" }).click();
  await expect(page.getByTestId("demo-label").first()).toContainText("Invented demo data");
  await page.getByLabel("From (km)").fill("20");
  await page.getByLabel("To (km)").fill("50");
  await page.getByLabel("Step (km)").fill("5");
  await page.screenshot({ path: "test-results/screenshots/compare-form.png", fullPage: true });
  await page.getByRole("button", { name: "Compare" }).click();
  await expect(page.getByRole("progressbar")).toBeVisible();
  await page.waitForURL(/\/compare\/[A-Za-z0-9_-]{16}$/, { timeout: 240_000 });

  await expect(page.getByRole("heading", { level: 1 })).toContainText("cold (demo) vs warm (demo)");
  await expect(page.getByTestId("demo-notice")).toContainText("invented demo data");
  for (const id of ["chart-loss", "chart-difference", "chart-split-a", "chart-split-b"])
    await expect(page.getByTestId(id)).toBeVisible();
  // both sides drawn, the difference drawn, and family areas in both partitions
  await expect(page.locator('[data-testid="chart-loss"] path[data-series]')).toHaveCount(2);
  await expect(page.locator('[data-testid="chart-difference"] path[data-series="total"]')).toHaveCount(1);
  expect(await page.locator('[data-testid="chart-split-a"] path[data-family]').count()).toBeGreaterThan(2);
  expect(await page.locator('[data-testid="chart-split-b"] path[data-family]').count()).toBeGreaterThan(2);
  const rows = page.getByTestId("comparison-table").locator("tbody tr");
  await expect(rows).toHaveCount(7);
  await expect(rows.first().locator("td").last()).not.toHaveText("—");

  await page.getByLabel("symmetric log").check();
  await page.getByRole("radio", { name: "linear" }).first().check();
  await page.screenshot({ path: "test-results/screenshots/compare-result.png", fullPage: true });

  const permalink = await page.getByLabel("Permalink").inputValue();
  expect(permalink).toMatch(/\/compare\/[A-Za-z0-9_-]{16}$/);
  const csv = await request.get(
    `${new URL(permalink).pathname.replace("/compare/", "/api/comparisons/")}/comparison.csv?comments=none`,
  );
  expect((await csv.text()).split("\r\n").length).toBe(9);
  // the permalink reopens the same comparison
  await page.goto(new URL(permalink).pathname);
  await expect(page.getByTestId("chart-difference")).toBeVisible();
  await page.getByRole("link", { name: "the sweep" }).first().click();
  await expect(page.getByRole("heading", { level: 1 })).toContainText("Profile sweep: Invented cold stratosphere");
  await expect(page.getByTestId("chart-split")).toBeVisible();
  await page.screenshot({ path: "test-results/screenshots/profile-sweep.png", fullPage: true });
});

test("an uploaded CSV with a bad cell is refused with the row and column named", async ({ page }) => {
  await page.goto("/profiles");
  await page.getByRole("combobox", { name: /^Profile/ }).selectOption("csv");
  await page.getByLabel("or paste it").fill("altitude (km),T (K),p (hPa)\n20,216.65,55.29\n25,warm,25.49\n");
  await expect(page.getByTestId("csv-status")).toContainText(
    'profile.csv row 3, column "T (K)": "warm" is not a number',
  );
  await page
    .getByLabel("or paste it")
    .fill("# title: my test\naltitude (km),T (K),p (hPa)\n20,216.65,55.29\n25,221.55,25.49\n");
  await expect(page.getByTestId("csv-status")).toContainText("2 levels, 20–25 km");
  await page.screenshot({ path: "test-results/screenshots/profiles-upload.png", fullPage: true });
  // run the uploaded profile and follow the progress to its permalink
  await page.getByRole("combobox", { name: /^Mechanism/ }).selectOption("oxygen-chlorine");
  await page.getByRole("button", { name: "Run the sweep" }).click();
  await page.waitForURL(/\/profiles\/[A-Za-z0-9_-]{16}$/, { timeout: 120_000 });
  await expect(page.getByTestId("deletion-token")).toContainText("DELETE /api/profiles/");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Profile sweep: my test");
  await expect(page.getByTestId("levels-table").locator("tbody tr")).toHaveCount(6);
  await expect(page.getByTestId("chart-loss")).toBeVisible();
});

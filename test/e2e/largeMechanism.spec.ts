import { expect, test } from "@playwright/test";
import { openNetwork } from "../../bench/generators/openNetwork";
import { LARGE_MECHANISM_CAP } from "../../lib/viz/reactionDetail";

/**
 * A mechanism of 2,000 solved species (an invented generated network,
 * bench/generators/openNetwork) still opens in the explorer: the view is
 * reduced to the reactions with the largest flux and says so with its
 * counts, the canvas holds at most the cap of reactions, and the page answers
 * input while and after it loads. How long its tasks run is measured by
 * bench/explorer-large.mjs, not asserted here (timing on a shared machine).
 */

test("a 2,000-species mechanism opens reduced to its top-flux reactions and says so", async ({ page }) => {
  test.setTimeout(240_000);
  const doc = openNetwork(2000, 8000, { ozone: true });
  const up = await page.request.post("/api/mechanisms", {
    headers: { "content-type": "application/json" },
    data: doc,
    timeout: 120_000,
  });
  expect(up.status()).toBe(201);
  const { id } = (await up.json()) as { id: string };
  const total = 8000 + 24;

  await page.goto(`/explore?m=${id}&z=30`);
  const notice = page.getByTestId("large-notice");
  await expect(notice).toBeVisible({ timeout: 60_000 });
  await expect(page.getByTestId("large-total")).toHaveText(total.toLocaleString("en-US"));
  // the page answers input while the layout and the analysis run: the latitude field takes typing
  const lat = page.locator("#latitude");
  await lat.fill("");
  await lat.pressSequentially("12");
  await expect(lat).toHaveValue("12");

  await expect(page.getByTestId("network")).toHaveAttribute("data-ready", "true", { timeout: 120_000 });
  await expect(page.getByTestId("status")).toContainText("converged", { timeout: 120_000 });
  await expect(notice).toContainText("largest flux");
  const shown = Number((await page.getByTestId("large-shown").textContent())?.replace(/,/g, ""));
  expect(shown).toBeGreaterThan(0);
  expect(shown).toBeLessThanOrEqual(LARGE_MECHANISM_CAP);
  await expect(notice).toContainText(`hidden: ${(total - shown).toLocaleString("en-US")}`);

  const drawn = await page.evaluate(() => window.__ozoneNetwork?.nodes() ?? []);
  const reactions = drawn.filter((n) => n.classes.includes("reaction"));
  expect(reactions.length).toBe(shown);
  // only the species of the drawn reactions: far fewer than the mechanism's 2,000
  expect(drawn.filter((n) => n.classes.includes("species")).length).toBeLessThan(4 * LARGE_MECHANISM_CAP);

  // "every reaction with flux" still draws at most the cap
  await page.getByTestId("detail").selectOption("all");
  await expect(page.getByTestId("large-shown")).toHaveText(String(LARGE_MECHANISM_CAP));
  await expect
    .poll(
      async () =>
        (await page.evaluate(() => window.__ozoneNetwork?.nodes() ?? [])).filter((n) => n.classes.includes("reaction"))
          .length,
    )
    .toBe(LARGE_MECHANISM_CAP);
  await page.screenshot({ path: "test-results/screenshots/large-mechanism.png" });
});

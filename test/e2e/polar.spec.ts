import { expect, test } from "@playwright/test";

/**
 * The invented cold vortex parcel from the explorer's example menu, in real
 * Chromium: the conditions fill in, the cloud used is ice, and the ClO dimer
 * cycle (ClO + ClO + M, Cl2O2 + hv, ClOO + M, 2 × Cl + O3) heads the cycle list.
 * Screenshot to test-results/screenshots/.
 */
test("the invented vortex parcel puts the ClO dimer cycle at the top of the cycle list", async ({ page }) => {
  await page.goto("/explore?m=reference&z=30");
  await expect(page.getByTestId("network")).toHaveAttribute("data-ready", "true", { timeout: 30_000 });
  await expect(page.getByTestId("status")).toContainText("converged", { timeout: 60_000 });
  await page.getByLabel("Example condition").selectOption({ label: "Cold late-winter vortex parcel (invented)" });
  await expect(page).toHaveURL(/z=19/);
  await expect(page).toHaveURL(/cloud=auto/);
  await expect(page.getByTestId("status")).toContainText("19 km", { timeout: 60_000 });
  await expect(page.getByTestId("status")).toContainText("converged", { timeout: 60_000 });
  await expect(page.getByTestId("computing")).toHaveCount(0);
  await expect(page.getByTestId("cloud-state")).toContainText("Cloud used: ice");
  const first = page.getByTestId("cycle").first();
  const id = await first.getAttribute("data-cycle-id");
  for (const step of ["ClOx20", "J_Cl2O2", "ClOx27", "ClOx1"]) expect(id).toContain(step);
  await expect(first).toContainText("ClOx");
  await page.screenshot({ path: "test-results/screenshots/explorer-polar-vortex.png" });
});

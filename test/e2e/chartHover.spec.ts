import AxeBuilder from "@axe-core/playwright";
import { type APIRequestContext, expect, type Locator, type Page, test } from "@playwright/test";
import { formatNumber } from "../../lib/viz/formatNumber";

/**
 * The profile charts answer the pointer and the keyboard: the readout at a
 * level shows the value the sweep's CSV / the comparison's JSON holds there,
 * and a legend key hides its series' marks.
 */

const grid = { from_km: 30, to_km: 40, step_km: 5 };

async function finishedSweep(request: APIRequestContext, mechanismId: string): Promise<string> {
  const job = await (
    await request.post("/api/profiles", { data: { mechanismId, profile: { kind: "standard" }, grid } })
  ).json();
  return finished(request, job.id);
}

async function finished(request: APIRequestContext, jobId: string): Promise<string> {
  for (let i = 0; i < 600; i++) {
    const s = await (await request.get(`/api/jobs/${jobId}`)).json();
    if (s.state === "done") return s.resultId;
    if (["failed", "cancelled"].includes(s.state)) throw new Error(`job ${jobId} ${s.state}`);
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`job ${jobId} did not finish`);
}

/** Moves the pointer over the chart at the altitude of the tick labelled `km`, in the middle of the plot. */
async function hoverAt(page: Page, chart: Locator, km: string) {
  const svg = chart.locator("svg[role=img]").first();
  await svg.scrollIntoViewIfNeeded();
  const tick = svg.locator("text", { hasText: new RegExp(`^${km}$`) }).first();
  const s = await svg.boundingBox();
  const t = await tick.boundingBox();
  if (!s || !t) throw new Error("chart not laid out");
  await page.mouse.move(s.x + s.width / 2, t.y + t.height / 2);
}

test("the sweep's charts read out the CSV's value at the level under the pointer, by keyboard too, and hide a family", async ({
  page,
  request,
}) => {
  test.setTimeout(180_000);
  const id = await finishedSweep(request, "oxygen-chlorine");
  const csv = (await (await request.get(`/api/profiles/${id}/levels.csv?comments=none`)).text()).trim().split("\r\n");
  const head = csv[0].split(",");
  const lossCol = head.findIndex((h) => h.startsWith("Ox loss"));
  const altCol = head.findIndex((h) => h.startsWith("altitude"));
  const at35 = csv.slice(1).find((r) => Number(r.split(",")[altCol]) === 35);
  expect(at35, csv.join("\n")).toBeDefined();
  const loss35 = Number(at35?.split(",")[lossCol]);

  await page.goto(`/profiles/${id}`);
  const chart = page.getByTestId("chart-loss");
  await expect(chart).toBeVisible();
  await hoverAt(page, chart, "35");
  const readout = chart.getByTestId("chart-readout");
  await expect(readout).toHaveAttribute("data-altitude-km", "35");
  await expect(readout.locator("[data-readout-value]")).toHaveText(`${formatNumber(loss35)} molecules cm⁻³ s⁻¹`);
  await expect(chart.locator("[data-hover-layer] line")).toHaveCount(1);
  await page.screenshot({ path: "test-results/screenshots/chart-hover-sweep.png", fullPage: true });
  // axe with the readout shown
  const { violations } = await new AxeBuilder({ page })
    .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
    .analyze();
  expect(violations.filter((v) => v.impact === "serious" || v.impact === "critical").map((v) => v.id)).toEqual([]);
  // the pointer leaves: no readout
  await page.mouse.move(2, 2);
  await expect(readout).toHaveCount(0);

  // keyboard: focus, ↑ from nothing → the lowest level, ↑ again → 35 km, Esc hides it
  const slider = chart.getByRole("slider");
  await slider.focus();
  await page.keyboard.press("ArrowUp");
  await expect(readout).toHaveAttribute("data-altitude-km", "30");
  await page.keyboard.press("ArrowUp");
  await expect(readout).toHaveAttribute("data-altitude-km", "35");
  await expect(chart.locator("[aria-live]")).toHaveText(`35 km: Ox loss ${formatNumber(loss35)} molecules cm⁻³ s⁻¹`);
  await chart.screenshot({ path: "test-results/screenshots/chart-hover-keyboard.png" });
  await page.keyboard.press("Escape");
  await expect(readout).toHaveCount(0);

  // one series only: its key cannot hide it
  await expect(chart.getByRole("button", { name: "Ox loss" })).toBeDisabled();
  // the split chart: hiding a family removes its areas and its readout row
  const split = page.getByTestId("chart-split");
  const key = split.locator("[data-legend-key]").first();
  const family = (await key.getAttribute("data-legend-key")) as string;
  expect(await split.locator(`path[data-family="${family}"]`).count()).toBeGreaterThan(0);
  await expect(key).toHaveAttribute("aria-pressed", "true");
  await key.click();
  await expect(key).toHaveAttribute("aria-pressed", "false");
  await expect(split.locator(`path[data-family="${family}"]`)).toHaveCount(0);
  await hoverAt(page, split, "35");
  await expect(split.getByTestId("chart-readout").locator("tr[data-readout-key]").first()).toBeVisible();
  await expect(split.locator(`tr[data-readout-key="${family}"]`)).toHaveCount(0);
  await page.screenshot({ path: "test-results/screenshots/chart-hover-split.png", fullPage: true });
  await key.click();
  await expect(split.locator(`path[data-family="${family}"]`).first()).toBeAttached();

  // the Monte Carlo share bands: median with its 5–95 % range, and a key hides a family's band
  await page.getByLabel("samples per level").fill("8");
  await page.getByRole("button", { name: "Kinetic uncertainty bands" }).click();
  const bands = page.getByTestId("profile-share-bands");
  await expect(bands).toBeVisible({ timeout: 120_000 });
  await hoverAt(page, bands, "35");
  await expect(bands.getByTestId("chart-readout").locator("[data-readout-value]").first()).toHaveText(
    /^(\d+(\.\d)? %|<0\.1 %) \(.+ – .+\)$/,
  );
  const bandKey = bands.locator("[data-legend-key]").first();
  const bandFamily = (await bandKey.getAttribute("data-legend-key")) as string;
  await bandKey.click();
  await expect(bands.locator(`polygon[data-family="${bandFamily}"]`)).toHaveCount(0);
  await hoverAt(page, bands, "35");
  await bands.screenshot({ path: "test-results/screenshots/chart-hover-bands.png" });
});

test("the comparison's charts read out A, B and B − A as the JSON has them, and a key hides its line", async ({
  page,
  request,
}) => {
  test.setTimeout(240_000);
  const [a, b] = [await finishedSweep(request, "oxygen"), await finishedSweep(request, "oxygen-chlorine")];
  const job = await (await request.post("/api/comparisons", { data: { a: { sweepId: a }, b: { sweepId: b } } })).json();
  const id = await finished(request, job.id);
  const rec = await (await request.get(`/api/comparisons/${id}`)).json();
  const level = rec.body.result.levels.find((l: { altitude_km: number }) => l.altitude_km === 35);

  await page.goto(`/compare/${id}`);
  const loss = page.getByTestId("chart-loss");
  await expect(loss).toBeVisible();
  await hoverAt(page, loss, "35");
  const values = loss.getByTestId("chart-readout").locator("[data-readout-value]");
  await expect(values).toHaveText([
    `${formatNumber(level.a.loss_cm3s)} molecules cm⁻³ s⁻¹`,
    `${formatNumber(level.b.loss_cm3s)} molecules cm⁻³ s⁻¹`,
  ]);

  const diff = page.getByTestId("chart-difference");
  await hoverAt(page, diff, "35");
  await expect(diff.locator('tr[data-readout-key="total"] [data-readout-value]')).toHaveText(
    `${formatNumber(level.difference.loss_cm3s)} molecules cm⁻³ s⁻¹`,
  );
  await page.screenshot({ path: "test-results/screenshots/chart-hover-compare.png", fullPage: true });
  // printed, the page shows the plain chart: no rule, no readout
  await page.emulateMedia({ media: "print" });
  await expect(diff.locator("[data-hover-layer]")).toBeHidden();
  await expect(diff.getByTestId("chart-readout")).toBeHidden();
  await page.emulateMedia({ media: "screen" });
  await expect(diff.locator("[data-hover-layer]")).toBeVisible();

  // hide B's line: one path left, B's row gone; A's key is then the last one shown and cannot hide A
  await loss.getByRole("button", { name: /^B: / }).click();
  await expect(loss.locator("path[data-series]")).toHaveCount(1);
  await expect(loss.getByRole("button", { name: /^A: / })).toBeDisabled();
  await hoverAt(page, loss, "35");
  await expect(values).toHaveCount(1);
  // hide the total of the difference
  await diff.getByRole("button", { name: "total" }).click();
  await expect(diff.locator('path[data-series="total"]')).toHaveCount(0);
  await expect(diff.getByRole("button", { name: "total" })).toHaveAttribute("aria-pressed", "false");
});

import { expect, type Page, test } from "@playwright/test";

/**
 * The explorer at a glance, in real Chromium: the default network of the
 * reference mechanism stays small, the cycle map's loops account for the
 * cycles' shares, and a loop opens its cycle in the network, also from the
 * keyboard. Screenshots go to test-results/screenshots/.
 */

const shot = (page: Page, name: string) => page.screenshot({ path: `test-results/screenshots/${name}.png` });
const nodes = (page: Page) =>
  page.evaluate(() => window.__ozoneNetwork?.nodes() ?? []) as Promise<{ id: string; classes: string[] }[]>;

async function openExplorer(page: Page, query: string) {
  await page.goto(`/explore?${query}`);
  await expect(page.getByTestId("network")).toHaveAttribute("data-ready", "true", { timeout: 30_000 });
  await expect(page.getByTestId("status")).toContainText("converged", { timeout: 60_000 });
  await expect(page.getByTestId("computing")).toHaveCount(0);
}

test("the default view of the reference mechanism at 35 km draws at most 40 reactions and says how many are hidden", async ({
  page,
}) => {
  await openExplorer(page, "m=reference&z=35");
  const reactions = (await nodes(page)).filter((n) => n.id.startsWith("r:"));
  expect(reactions.length).toBeGreaterThan(10);
  expect(reactions.length).toBeLessThanOrEqual(40);
  // every reaction of the reference mechanism is either drawn or counted as hidden
  const mech = await (await page.request.get("/api/mechanisms/reference")).json();
  const total = (mech.reactions as unknown[]).length;
  expect(total).toBeGreaterThan(100);
  // the hidden ones include those with no flux (the surface reactions on clouds, without clouds)
  await expect(page.getByTestId("hidden-count")).toHaveText(
    new RegExp(`^${reactions.length} drawn · ${total - reactions.length} hidden( \\(\\d+ with zero flux\\))?$`),
  );
  await shot(page, "glance-35km");
  await page.getByTestId("detail").selectOption("all");
  await expect.poll(async () => (await nodes(page)).filter((n) => n.id.startsWith("r:")).length).toBeGreaterThan(40);
  // the detail level is in the address, so a shared link keeps it
  await expect(page).toHaveURL(/&detail=all$/);
});

test("a shared explorer link keeps its detail level", async ({ page }) => {
  await openExplorer(page, "m=reference&z=35&detail=15");
  await expect(page.getByTestId("detail")).toHaveValue("15");
  const reactions = (await nodes(page)).filter((n) => n.id.startsWith("r:"));
  expect(reactions.length).toBeLessThanOrEqual(15);
  await page.getByTestId("detail").selectOption("40");
  await expect(page).not.toHaveURL(/detail=/);
});

test("the cycle map's loops and its folded rest add up to the cycles' shares of the analysis", async ({ page }) => {
  await openExplorer(page, "m=reference&z=35");
  const loops = page.getByTestId("cycle-loop");
  await expect(loops.first()).toBeVisible();
  const drawn = await loops.evaluateAll((els) => els.map((e) => Number(e.getAttribute("data-share"))));
  const other = Number((await page.getByTestId("cycle-map-other").getAttribute("data-share")) ?? 0);
  const res = await page.request.post("/api/analyses", {
    data: { mechanismId: "reference", condition: { altitude_km: 35 } },
  });
  const body = (await res.json()) as { result: { cycles: { cycles: { share: number }[] } } };
  const total = body.result.cycles.cycles.reduce((a, c) => a + c.share, 0);
  expect(drawn.length).toBeGreaterThan(2);
  expect(drawn.reduce((a, s) => a + s, 0) + other).toBeCloseTo(total, 9);
  await page.getByTestId("cycle-map").screenshot({ path: "test-results/screenshots/glance-cycle-map.png" });
});

/** A point on the loop's stroke, in page coordinates (the middle of its bounding box is often inside the petal). */
async function onStroke(page: Page, index: number) {
  return page
    .getByTestId("cycle-loop")
    .nth(index)
    .evaluate((g) => {
      const path = g.querySelector("path:last-of-type") as SVGPathElement;
      const p = path.getPointAtLength(path.getTotalLength() * 0.25);
      const m = path.getScreenCTM()!;
      return { x: m.a * p.x + m.c * p.y + m.e, y: m.b * p.x + m.d * p.y + m.f };
    });
}

test("pressing a loop, or Enter on it, opens that cycle in the species network", async ({ page }) => {
  await openExplorer(page, "m=reference&z=35");
  const loop = page.getByTestId("cycle-loop").first();
  const id = (await loop.getAttribute("data-cycle"))!;
  const at = await onStroke(page, 0);
  await page.mouse.click(at.x, at.y);
  await expect.poll(() => new URL(page.url()).searchParams.get("cycle")).toBe(id);
  await expect(loop).toHaveAttribute("aria-pressed", "true");
  expect((await nodes(page)).some((n) => n.classes.includes("hl"))).toBe(true);
  await page.mouse.click(at.x, at.y);
  await expect(loop).toHaveAttribute("aria-pressed", "false");
  const second = page.getByTestId("cycle-loop").nth(1);
  await second.focus();
  await page.keyboard.press("Enter");
  await expect(second).toHaveAttribute("aria-pressed", "true");
  await shot(page, "glance-cycle-from-map");
});

test("the cycle map exports as SVG and PNG", async ({ page }) => {
  await openExplorer(page, "m=oxygen-chlorine&z=40");
  const { readFileSync } = await import("node:fs");
  const [svg] = await Promise.all([
    page.waitForEvent("download"),
    page.getByRole("button", { name: "Save the cycle map as SVG" }).click(),
  ]);
  expect(svg.suggestedFilename()).toMatch(/-cycles\.svg$/);
  await svg.saveAs("test-results/downloads/cycles.svg");
  const text = readFileSync("test-results/downloads/cycles.svg", "utf8");
  expect(text.startsWith("<svg")).toBe(true);
  expect(text.match(/<path class="loop"/g)?.length).toBe(await page.getByTestId("cycle-loop").count());
  const [png] = await Promise.all([
    page.waitForEvent("download"),
    page.getByRole("button", { name: "Save the cycle map as PNG" }).click(),
  ]);
  await png.saveAs("test-results/downloads/cycles.png");
  expect(readFileSync("test-results/downloads/cycles.png").subarray(1, 4).toString()).toBe("PNG");
});

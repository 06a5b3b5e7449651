import { expect, type Page, test } from "@playwright/test";

/**
 * The explorer as a new user meets it, in real Chromium: open it, move the
 * altitude, switch the colour mode, pick a cycle, reopen the permalink, upload
 * a broken mechanism. Screenshots go to test-results/screenshots/.
 */

const shot = (page: Page, name: string) => page.screenshot({ path: `test-results/screenshots/${name}.png` });

type EdgeInfo = { id: string; color: string; width: number; classes: string[] };
const edges = (page: Page) => page.evaluate(() => window.__ozoneNetwork?.edges() ?? []) as Promise<EdgeInfo[]>;
const nodes = (page: Page) =>
  page.evaluate(() => window.__ozoneNetwork?.nodes() ?? []) as Promise<
    { id: string; classes: string[]; x: number; y: number; w: number; h: number }[]
  >;

async function openExplorer(page: Page, query: string) {
  await page.goto(`/explore?${query}`);
  await expect(page.getByTestId("network")).toHaveAttribute("data-ready", "true", { timeout: 30_000 });
  await expect(page.getByTestId("status")).toContainText("converged", { timeout: 60_000 });
  await expect(page.getByTestId("computing")).toHaveCount(0);
}

/** The numbers a reader takes away: the budget rows and the cycle rows. */
async function numbers(page: Page) {
  return {
    budget: await page.getByTestId("budget").textContent(),
    cycles: await page.getByTestId("cycles").textContent(),
  };
}

test("the explorer opens with a network, cycles and a budget at the conditions in its address", async ({ page }) => {
  await openExplorer(page, "m=reference&z=40&lat=45&date=2026-03-20&t=12&mode=instantaneous");
  await expect(page.getByRole("heading", { name: "Conditions" })).toBeVisible();
  await expect(page.getByLabel("Altitude")).toHaveValue("40");
  await expect(page.getByTestId("status")).toContainText("40 km");
  await expect(page.getByTestId("cycle").first()).toBeVisible();
  await expect(page.getByTestId("budget")).toContainText("Ox loss");
  await expect(page.getByTestId("legend")).toContainText("molecules cm⁻³ s⁻¹");
  const e = await edges(page);
  expect(e.length).toBeGreaterThan(50);
  // the address is canonical at once, so it can be shared before anything is touched
  await expect(page).toHaveURL(/m=reference&z=40&lat=45&date=2026-03-20&t=12&mode=instantaneous/);
  await shot(page, "explorer-40km");
});

test("hiding held species removes them and their edges without moving anything else", async ({ page }) => {
  await openExplorer(page, "m=reference&z=40");
  const before = await nodes(page);
  // O2 is drawn as a stub beside each reaction that makes or uses it
  const o2Stub = (n: { id: string }) => n.id.startsWith("t:") && n.id.endsWith(":O2");
  expect(before.some(o2Stub)).toBe(true);
  expect(before.some((n) => n.id === "s:CH4")).toBe(true);
  await page.getByLabel("show held species").uncheck();
  await expect(page).toHaveURL(/spectators=hide/);
  const after = await nodes(page);
  expect(after.some(o2Stub)).toBe(false);
  expect(after.some((n) => n.id === "s:CH4")).toBe(false);
  expect((await edges(page)).some((e) => e.id.endsWith(":O2"))).toBe(false);
  expect(after.length).toBeLessThan(before.length);
  const was = new Map(before.map((n) => [n.id, n]));
  for (const n of after.filter((x) => !x.id.startsWith("f:"))) {
    expect([n.x, n.y], n.id).toEqual([was.get(n.id)!.x, was.get(n.id)!.y]);
  }
  await shot(page, "explorer-held-hidden");
});

test("moving the altitude slider recomputes, changes the numbers and the address, and keeps the layout", async ({
  page,
}) => {
  await openExplorer(page, "m=reference&z=30");
  const before = await numbers(page);
  const widthsBefore = (await edges(page)).map((e) => e.width);
  const places = async () =>
    (await nodes(page)).filter((n) => !n.id.startsWith("f:")).map(({ id, x, y }) => ({ id, x, y }));
  const placesBefore = await places();
  const boxes = async () =>
    Promise.all(["network", "budget", "legend"].map(async (id) => page.getByTestId(id).boundingBox()));
  const boxesBefore = await boxes();
  const slider = page.getByLabel("Altitude");
  await slider.focus();
  for (let i = 0; i < 20; i++) await page.keyboard.press("ArrowRight");
  await expect(page.getByTestId("altitude-value")).toHaveText("40");
  await expect(page.getByTestId("status")).toContainText("40 km", { timeout: 60_000 });
  await expect(page.getByTestId("computing")).toHaveCount(0);
  const after = await numbers(page);
  expect(after.budget).not.toBe(before.budget);
  expect((await edges(page)).map((e) => e.width)).not.toEqual(widthsBefore);
  // the detail may draw other reactions at 40 km; every node drawn at both altitudes stays where it was
  const was = new Map(placesBefore.map((p) => [p.id, p]));
  const kept = (await places()).filter((p) => was.has(p.id));
  expect(kept.length).toBeGreaterThan(placesBefore.length / 2);
  for (const p of kept) expect(p, p.id).toEqual(was.get(p.id));
  // new numbers, same page geometry: nothing jumped
  expect(await boxes()).toEqual(boxesBefore);
  expect(await page.evaluate(() => window.scrollY)).toBe(0);
  await expect(page).toHaveURL(/[?&]z=40(&|$)/);
  await shot(page, "explorer-after-slider");
});

test("once a result has painted, the next key step's altitudes are asked for ahead, and a step to one asks nothing more", async ({
  page,
}) => {
  const asked: number[] = [];
  let answered = 0;
  const isPreview = (url: string) => url.endsWith("/api/analyses/preview");
  page.on("request", (r) => {
    if (r.method() === "POST" && isPreview(r.url()))
      asked.push((r.postDataJSON() as { condition: { altitude_km: number } }).condition.altitude_km);
  });
  page.on("requestfinished", (r) => {
    if (isPreview(r.url())) answered++;
  });
  await openExplorer(page, "m=reference&z=30");
  // the condition in the address, then its neighbours one slider step away
  await expect.poll(() => [...asked].sort((a, b) => a - b), { timeout: 30_000 }).toEqual([29.5, 30, 30.5]);
  expect(asked[0]).toBe(30);
  await expect.poll(() => answered, { timeout: 30_000 }).toBe(asked.length);
  const before = asked.length;
  await page.getByLabel("Altitude").focus();
  await page.keyboard.press("ArrowRight");
  await expect(page.getByTestId("status")).toContainText("30.5 km");
  // the step itself painted from the cache: the only requests after it are for 30.5 km's own new neighbour
  await expect.poll(() => asked.slice(before), { timeout: 30_000 }).toEqual([31]);
});

test("switching the colour mode recolours the edges and the legend", async ({ page }) => {
  await openExplorer(page, "m=reference&z=35");
  const flux = await edges(page);
  await page.getByText("ozone destroyed", { exact: true }).click();
  await expect(page.getByTestId("legend")).toContainText("Ox produced");
  await expect(page).toHaveURL(/color=ox/);
  const ox = await edges(page);
  // the detail ranks by Ox destroyed in this mode, so the drawn set may change; compare the edges drawn in both
  const before = new Map(flux.map((e) => [e.id, e.color]));
  const common = ox.filter((e) => before.has(e.id));
  expect(common.length).toBeGreaterThan(10);
  const changed = common.filter((e) => e.color !== before.get(e.id)).length;
  expect(changed).toBeGreaterThan(common.length / 4);
  await shot(page, "explorer-ox-mode");
});

test("selecting a cycle lights its steps in the graph and dims the rest", async ({ page }) => {
  await openExplorer(page, "m=reference&z=40");
  const first = page.getByTestId("cycle").first();
  const button = first.getByRole("button").first();
  await button.click();
  await expect(button).toHaveAttribute("aria-pressed", "true");
  await expect(page).toHaveURL(/cycle=/);
  const steps = await first.locator("table tbody tr").count();
  expect(steps).toBeGreaterThan(0);
  const n = await nodes(page);
  const lit = n.filter((x) => x.classes.includes("hl") && x.id.startsWith("r:"));
  const dim = n.filter((x) => x.classes.includes("dim"));
  expect(lit.length).toBe(steps);
  expect(dim.length).toBeGreaterThan(n.length / 2);
  await shot(page, "explorer-cycle-selected");
  // the same button turns it off again
  await button.click();
  await expect(button).toHaveAttribute("aria-pressed", "false");
  expect((await nodes(page)).some((x) => x.classes.includes("dim"))).toBe(false);
});

test("a cycle given in the address is brought into view once the canvas is ready", async ({ page }) => {
  await openExplorer(page, "m=reference&z=40");
  await page.getByTestId("cycle").first().getByRole("button").first().click();
  await expect(page).toHaveURL(/cycle=/);
  const withCycle = page.url();
  const lit = (await nodes(page)).filter((x) => x.classes.includes("hl") && x.id.startsWith("r:")).map((x) => x.id);
  expect(lit.length).toBeGreaterThan(1);
  /** the on-screen width and height of the box around the cycle's reactions, px */
  const spread = () =>
    page.evaluate((ids) => {
      const at = ids.map((id) => window.__ozoneNetwork?.rendered(id)).filter((p) => p !== null && p !== undefined);
      const xs = at.map((p) => p.x);
      const ys = at.map((p) => p.y);
      return Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys));
    }, lit);
  await openExplorer(page, "m=reference&z=40");
  await page.waitForTimeout(500);
  const whole = await spread();
  await page.goto(withCycle);
  await expect(page.getByTestId("network")).toHaveAttribute("data-ready", "true", { timeout: 30_000 });
  // the view zooms to the cycle (an animation of 350 ms) instead of showing the whole network
  await expect.poll(spread, { timeout: 5_000 }).toBeGreaterThan(whole * 1.3);
});

test("pointing at a reaction shows its equation and rate", async ({ page }) => {
  await openExplorer(page, "m=oxygen&z=30");
  const box = (await page.getByTestId("network").boundingBox())!;
  const at = (await page.evaluate(() => window.__ozoneNetwork?.rendered("r:Ox2") ?? null))!;
  expect(at).not.toBeNull();
  await page.mouse.move(box.x + at.x, box.y + at.y);
  const tip = page.getByRole("tooltip");
  await expect(tip).toContainText("O + O3 -> 2 O2");
  await expect(tip).toContainText("cm⁻³ s⁻¹");
  await shot(page, "explorer-hover");
});

test("a chip dragged out of its frame takes the frame along, and the next step keeps it there", async ({ page }) => {
  await openExplorer(page, "m=reference&z=30");
  const frameOf = async () => (await nodes(page)).find((n) => n.id === "f:ClOx")!;
  const before = await frameOf();
  const box = (await page.getByTestId("network").boundingBox())!;
  const at = (await page.evaluate(() => window.__ozoneNetwork?.rendered("s:ClO") ?? null))!;
  await page.mouse.move(box.x + at.x, box.y + at.y);
  await page.mouse.down();
  await page.mouse.move(box.x + at.x, box.y + at.y + 120, { steps: 8 });
  await page.mouse.up();
  const chip = (await nodes(page)).find((n) => n.id === "s:ClO")!;
  const after = await frameOf();
  expect(after.y + after.h / 2).toBeGreaterThan(before.y + before.h / 2);
  // the chip sits inside its frame, with room to spare (the frame's padding)
  expect(chip.y + chip.h / 2).toBeLessThan(after.y + after.h / 2);
  // a recompute repaints colours and widths; the frame stays around the dragged chip
  await page.getByLabel("Altitude").focus();
  await page.keyboard.press("ArrowRight");
  await expect(page.getByTestId("status")).toContainText("30.5 km");
  await expect.poll(async () => (await frameOf()).h).toBe(after.h);
});

test("a species and a reaction can be inspected", async ({ page }) => {
  await openExplorer(page, "m=reference&z=40&sel=s%3AClO");
  const insp = page.getByTestId("inspector");
  await expect(insp).toContainText("number density");
  await expect(insp).toContainText("Lost by");
  await insp.getByRole("button").filter({ hasText: "->" }).first().click();
  await expect(insp).toContainText("k at these conditions");
  await expect(insp).toContainText("source");
  await shot(page, "explorer-inspector");
});

test("the permalink copies and opens in a fresh page with the same numbers", async ({ page, browser }) => {
  await openExplorer(page, "m=reference&z=42&lat=30&date=2026-06-21&t=10");
  // a recompute stores nothing: the permalink appears when it is asked for
  await expect(page.getByTestId("permalink")).toHaveValue("");
  await page.context().grantPermissions(["clipboard-read", "clipboard-write"]);
  await page.getByRole("button", { name: "Copy" }).click();
  await expect(page.getByRole("button", { name: "Copied ✓" })).toBeVisible();
  const link = await page.getByTestId("permalink").inputValue();
  expect(link).toMatch(/\/a\/[\w-]+$/);
  expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(link);
  const original = await numbers(page);
  const fresh = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  const other = await fresh.newPage();
  await other.goto(link);
  await expect(other.getByTestId("stored-banner")).toBeVisible();
  await expect(other.getByTestId("network")).toHaveAttribute("data-ready", "true", { timeout: 30_000 });
  expect(await numbers(other)).toEqual(original);
  await expect(other.getByLabel("Altitude")).toHaveValue("42");
  await shot(other, "permalink");
  await fresh.close();
});

test("the graph exports as PNG and SVG and the tables as CSV and JSON", async ({ page }) => {
  await openExplorer(page, "m=oxygen-chlorine&z=40");
  const [png] = await Promise.all([
    page.waitForEvent("download"),
    page.getByRole("button", { name: "PNG", exact: true }).click(),
  ]);
  expect(png.suggestedFilename()).toMatch(/\.png$/);
  const pngPath = "test-results/downloads/graph.png";
  await png.saveAs(pngPath);
  const { readFileSync } = await import("node:fs");
  expect(readFileSync(pngPath).subarray(1, 4).toString()).toBe("PNG");
  const [svg] = await Promise.all([
    page.waitForEvent("download"),
    page.getByRole("button", { name: "SVG", exact: true }).click(),
  ]);
  const svgPath = "test-results/downloads/graph.svg";
  await svg.saveAs(svgPath);
  const text = readFileSync(svgPath, "utf8");
  expect(text.startsWith("<svg")).toBe(true);
  expect(text).toContain("ClO");
  // the first table asked for stores the analysis, then downloads
  const [csv] = await Promise.all([
    page.waitForEvent("download"),
    page.getByRole("button", { name: "rates.csv", exact: true }).click(),
  ]);
  expect(csv.suggestedFilename()).toMatch(/rates\.csv$/);
  await expect(page.getByTestId("permalink")).toHaveValue(/\/a\/[\w-]+$/);
  for (const name of ["rates.csv", "species.csv", "cycles.csv", "JSON"]) {
    const href = await page.getByRole("link", { name, exact: true }).getAttribute("href");
    const res = await page.request.get(href!);
    expect(res.status(), name).toBe(200);
    expect((await res.text()).length, name).toBeGreaterThan(20);
  }
});

test("everything in the conditions and the inspector can be reached from the keyboard", async ({ page }) => {
  await openExplorer(page, "m=oxygen-chlorine&z=30");
  await page.getByLabel("Mechanism", { exact: true }).focus();
  await page.keyboard.press("Tab");
  await expect(page.getByRole("button", { name: "Upload…" })).toBeFocused();
  await page.keyboard.press("Tab");
  await expect(page.getByLabel("Altitude")).toBeFocused();
  await page.keyboard.press("Tab");
  await expect(page.getByLabel("Temperature")).toBeFocused();
  await page.getByRole("combobox", { name: "Inspect a species or reaction" }).selectOption("s:ClO");
  await expect(page.getByTestId("inspector")).toContainText("mixing ratio");
  await expect(page).toHaveURL(/sel=s%3AClO/);
});

test("an unknown permalink says so", async ({ page }) => {
  const res = await page.goto("/a/does-not-exist-0000");
  expect(res?.status()).toBe(404);
  await expect(page.getByRole("heading", { level: 1 })).toContainText("No stored analysis");
});

test("a broken mechanism upload shows the problem at its line", async ({ page }) => {
  await openExplorer(page, "m=oxygen&z=30");
  const doc = [
    "title: Broken test document (invented)",
    'version: "0.1"',
    "description: an upload with an unknown species",
    "species:",
    "  - { id: O2, role: held, group: bath, mixingRatio: 0.2095 }",
    "  - { id: M, role: third-body }",
    "  - { id: O, role: solved, group: Ox }",
    "  - { id: O3, role: solved, group: Ox }",
    "reactions:",
    "  - id: J1",
    "    equation: O2 + hv -> 2 O",
    "    rate: { law: photolysis, channel: O2 }",
    "  - id: K1",
    "    equation: O + O2 + M -> O3 + M",
    "    rate: { law: termolecular, k0: 6.0e-34, n: 2.4 }",
    "  - id: K2",
    "    equation: O + Xq3 -> 2 O2",
    "    rate: { law: arrhenius, A: 8.0e-12, E/R: 2060 }",
  ].join("\n");
  const badLine = 17;
  await page.getByRole("button", { name: "Upload…" }).click();
  await page.getByLabel("Mechanism document (YAML or JSON)").fill(doc);
  await page.getByRole("button", { name: "Check and use" }).click();
  const problems = page.getByTestId("upload-problems");
  await expect(problems).toBeVisible();
  await expect(problems).toContainText("did not accept");
  const marked = problems.locator(`[data-line="${badLine}"][data-problem]`);
  await expect(marked).toBeVisible();
  await expect(marked).toContainText("Xq3");
  await shot(page, "upload-error");
});

test("a valid mechanism upload is checked, chosen and analysed", async ({ page }) => {
  await openExplorer(page, "m=oxygen&z=30");
  const doc = [
    "title: Invented three-reaction upload",
    'version: "0.1"',
    "description: invented test document",
    "species:",
    "  - { id: O2, role: held, group: bath, mixingRatio: 0.2095 }",
    "  - { id: M, role: third-body }",
    "  - { id: O, role: solved, group: Ox }",
    "  - { id: O3, role: solved, group: Ox }",
    "reactions:",
    "  - id: J1",
    "    equation: O2 + hv -> 2 O",
    "    rate: { law: photolysis, channel: O2 }",
    "  - id: K1",
    "    equation: O + O2 + M -> O3 + M",
    "    rate: { law: termolecular, k0: 6.0e-34, n: 2.4 }",
    "  - id: K2",
    "    equation: O + O3 -> 2 O2",
    "    rate: { law: arrhenius, A: 8.0e-12, E/R: 2060 }",
  ].join("\n");
  await page.getByRole("button", { name: "Upload…" }).click();
  await page.getByLabel("Mechanism document (YAML or JSON)").fill(doc);
  await page.getByRole("button", { name: "Check and use" }).click();
  await expect(page.getByRole("dialog")).toBeHidden();
  await expect(page.locator("#mechanism option:checked")).toHaveText("Invented three-reaction upload");
  await expect(page.getByTestId("status")).toContainText("converged", { timeout: 60_000 });
  await expect(page.getByTestId("cycle").first()).toContainText("O + O3 -> 2 O2");
  await expect(page).not.toHaveURL(/m=oxygen(&|$)/);
});

test("a bad condition is reported beside its field", async ({ page }) => {
  await openExplorer(page, "m=oxygen&z=30");
  await page.getByLabel("Temperature").fill("900");
  const field = page.locator("#temperature-error");
  await expect(field).toBeVisible({ timeout: 30_000 });
  await expect(field).toContainText("temperature");
  await shot(page, "condition-error");
});

test("the page stays usable on a narrow screen", async ({ page }) => {
  await page.setViewportSize({ width: 420, height: 900 });
  await openExplorer(page, "m=oxygen-chlorine&z=40");
  await expect(page.getByLabel("Altitude")).toBeVisible();
  await page.getByTestId("cycles").scrollIntoViewIfNeeded();
  await expect(page.getByTestId("cycle").first()).toBeVisible();
  await page.screenshot({ path: "test-results/screenshots/narrow.png", fullPage: true });
});

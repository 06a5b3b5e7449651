import AxeBuilder from "@axe-core/playwright";
import { expect, type Page, test } from "@playwright/test";

/**
 * Accessibility in real Chromium: axe-core (through @axe-core/playwright)
 * finds no serious or critical violation of WCAG 2.x A/AA on the explorer, a
 * shared analysis, a profile sweep's page and the assessment builder; and the
 * explorer's controls are reached with Tab and show where the focus is.
 */

async function seriousViolations(page: Page) {
  const { violations } = await new AxeBuilder({ page })
    .withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"])
    .analyze();
  return violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .map((v) => `${v.id} (${v.impact}): ${v.help} — ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`);
}

async function openExplorer(page: Page, path: string) {
  await page.goto(path);
  await expect(page.getByTestId("network")).toHaveAttribute("data-ready", "true", { timeout: 30_000 });
  await expect(page.getByTestId("status")).toContainText("converged", { timeout: 60_000 });
}

test("the explorer has no serious or critical axe violation", async ({ page }) => {
  await openExplorer(page, "/explore?m=reference&z=35");
  expect(await seriousViolations(page)).toEqual([]);
});

test("a shared analysis has no serious or critical axe violation", async ({ page }) => {
  const res = await page.request.post("/api/analyses", {
    data: { mechanismId: "oxygen-chlorine", condition: { altitude_km: 38 } },
  });
  const { id } = await res.json();
  await openExplorer(page, `/a/${id}`);
  await expect(page.getByTestId("stored-banner")).toBeVisible();
  expect(await seriousViolations(page)).toEqual([]);
});

test("a profile sweep's page has no serious or critical axe violation", async ({ page }) => {
  const job = await (
    await page.request.post("/api/profiles", {
      data: {
        mechanismId: "oxygen-chlorine",
        profile: { kind: "standard" },
        grid: { from_km: 30, to_km: 40, step_km: 5 },
      },
    })
  ).json();
  let status: { state: string; resultUrl?: string } = { state: "queued" };
  for (let i = 0; i < 300 && !["done", "failed", "cancelled"].includes(status.state); i++) {
    await page.waitForTimeout(200);
    status = await (await page.request.get(`/api/jobs/${job.id}`)).json();
  }
  expect(status.state).toBe("done");
  await page.goto(status.resultUrl!);
  await expect(page.getByTestId("chart-loss")).toBeVisible();
  expect(await seriousViolations(page)).toEqual([]);
});

test("the assessment builder has no serious or critical axe violation", async ({ page }) => {
  await page.goto("/assess");
  await expect(page.getByRole("heading", { level: 1, name: "Build an assessment" })).toBeVisible();
  await page.getByLabel("Mechanism", { exact: true }).selectOption("oxygen-chlorine");
  await page.getByRole("button", { name: "Find the cycles and species at these conditions" }).click();
  await expect(page.getByText(/\d+ cycles, \d+ solved species/)).toBeVisible({ timeout: 30_000 });
  expect(await seriousViolations(page)).toEqual([]);
});

test("every control of the explorer is reached with Tab and shows a visible focus", async ({ page }) => {
  await openExplorer(page, "/explore?m=oxygen-chlorine&z=35");
  await page.locator("body").focus();
  const seen: string[] = [];
  const unmarked: string[] = [];
  for (let i = 0; i < 300; i++) {
    await page.keyboard.press("Tab");
    const info = await page.evaluate(() => {
      const el = document.activeElement as HTMLElement | null;
      if (!el || el === document.body) return null;
      // a date input keeps the focus across its parts; the walk ends when it comes back to the first control
      const first = el.dataset.a11yIndex === "0";
      if (el.dataset.a11yIndex) return { name: "", ring: true, again: true, first };
      el.dataset.a11yIndex = String(document.querySelectorAll("[data-a11y-index]").length);
      const name = `${el.tagName.toLowerCase()}:${el.getAttribute("aria-label") ?? el.id ?? ""}:${(el.textContent ?? "").trim().slice(0, 24)}`;
      // visible focus: an outline or a box shadow on the control, or on its frame (a field drawn by its wrapper),
      // or the ring an SVG control draws around itself (the cycle map's loops)
      const drawn = (e: Element | null) => {
        if (!e) return false;
        const s = getComputedStyle(e);
        return (s.outlineStyle !== "none" && Number.parseFloat(s.outlineWidth) > 0) || s.boxShadow !== "none";
      };
      const ring = drawn(el) || drawn(el.parentElement) || !!el.querySelector("[data-focus-ring]");
      return { name, ring, again: false, first: false };
    });
    if (!info) continue;
    if (info.first) break;
    if (info.again) continue;
    seen.push(info.name);
    if (!info.ring) unmarked.push(info.name);
  }
  // the conditions, the toolbar, the exports and the cycle list are all on the way
  for (const part of ["input:altitude", "select:network-detail", "button::PNG", "button::Copy", "g:"])
    expect(seen.join("\n").toLowerCase()).toContain(part.toLowerCase());
  expect(unmarked).toEqual([]);
});

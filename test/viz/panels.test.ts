import { describe, expect, it } from "vitest";
import { budgetSeries, niceMax } from "@/lib/viz/budgetSeries";
import { explorerQueryString, parseExplorerQuery } from "@/lib/viz/explorerQuery";
import { formatLifetime, formatMixingRatio, formatNumber, formatPercent } from "@/lib/viz/formatNumber";
import { graphSvg } from "@/lib/viz/graphSvg";
import { networkElements } from "@/lib/viz/networkElements";
import { networkLayout } from "@/lib/viz/networkLayout";
import { speciesBudget } from "@/lib/viz/speciesBudget";
import { expectClose } from "../helpers/close";
import { fixtureMechanism, fixtureResult } from "./fixture";

describe("speciesBudget", () => {
  const clo = speciesBudget("ClO", fixtureResult.steadyState.reactions);

  it("counts production and loss by reaction with the stoichiometric coefficient", () => {
    expect(clo.production.map((t) => [t.reactionId, t.rate_cm3s])).toEqual([["C1", 9.0e5]]);
    // C3 consumes two ClO per event: 2 × 5e4
    expect(clo.loss.map((t) => [t.reactionId, t.rate_cm3s])).toEqual([
      ["C2", 8.0e5],
      ["C3", 1.0e5],
    ]);
  });

  it("gives shares that sum to 1 and totals that equal the sum of the terms (identity)", () => {
    expectClose(
      clo.loss.reduce((s, t) => s + t.share, 0),
      1,
      { abs: 1e-12 },
    );
    expectClose(clo.totalLoss_cm3s, 9.0e5, { rel: 1e-12 });
  });

  it("ignores a species that appears on both sides unchanged", () => {
    const n2 = speciesBudget("N2", fixtureResult.steadyState.reactions);
    expect(n2.production).toEqual([]);
    expect(n2.loss).toEqual([]);
  });
});

describe("budgetSeries", () => {
  const s = budgetSeries(fixtureResult.cycles.budget, { width_px: 200 });

  it("lists production, loss, the families largest first and the unassigned rest", () => {
    expect(s.bars.map((b) => b.key)).toEqual(["production", "loss", "family:ClOx", "family:Ox", "unassigned"]);
  });

  it("draws bar lengths proportional to the rates on one axis", () => {
    const loss = s.bars.find((b) => b.key === "loss")!;
    const cl = s.bars.find((b) => b.key === "family:ClOx")!;
    expectClose(cl.width / loss.width, 1.7e6 / 2.92e6, { rel: 1e-3 });
    expect(s.max).toBeGreaterThanOrEqual(2.92e6);
  });

  it("sums the smallest families into one row and keeps the total (identity)", () => {
    const many = {
      ...fixtureResult.cycles.budget,
      byFamily: ["Ox", "HOx", "NOx", "ClOx", "BrOx", "ClOx-BrOx", "NOx-HOx"].map((family, i) => ({
        family,
        oxLoss_cm3s: 10 ** (6 - i * 0.3),
        fraction: 0.1,
      })),
    };
    const t = budgetSeries(many, { maxFamilies: 3 });
    const fam = t.bars.filter((b) => b.kind === "family");
    expect(fam.map((b) => b.key)).toEqual(["family:Ox", "family:HOx", "family:NOx", "family:other"]);
    expect(fam.at(-1)!.label).toBe("4 other families");
    expectClose(
      fam.reduce((a, b) => a + b.value, 0),
      many.byFamily.reduce((a, f) => a + f.oxLoss_cm3s, 0),
      { rel: 1e-12 },
    );
  });

  it("shows an 'unassigned' family reported by the engine once, as the below-threshold row", () => {
    const withUn = {
      ...fixtureResult.cycles.budget,
      byFamily: [...fixtureResult.cycles.budget.byFamily, { family: "unassigned", oxLoss_cm3s: 5e4, fraction: 0.017 }],
    };
    const keys = budgetSeries(withUn).bars.map((b) => b.key);
    expect(keys.filter((k) => k.includes("unassigned"))).toEqual(["unassigned"]);
    expect(budgetSeries(withUn).bars.find((b) => b.key === "unassigned")!.value).toBe(5e4);
  });

  it("rounds the axis up to 1, 2, 2.5 or 5 times a power of ten", () => {
    expect(niceMax(2.92e6)).toBe(5e6);
    expect(niceMax(1.1e3)).toBe(2e3);
    expect(niceMax(1e5)).toBe(1e5);
    expect(niceMax(0)).toBe(1);
  });
});

describe("graphSvg", () => {
  const layout = networkLayout(fixtureMechanism);
  const els = networkElements(fixtureMechanism, layout, fixtureResult);

  it("draws one hexagon per reaction and one chip per species", () => {
    const svg = graphSvg(els);
    expect(svg.startsWith("<svg")).toBe(true);
    expect(svg.trim().endsWith("</svg>")).toBe(true);
    expect(svg.match(/class="reaction"/g)!.length).toBe(fixtureMechanism.reactions.length);
    expect(svg.match(/class="species"/g)!.length).toBe(els.filter((e) => e.data.kind === "species").length);
  });

  it("escapes text", () => {
    expect(graphSvg(els, { title: "O & O3 <test>" })).toContain("O &amp; O3 &lt;test&gt;");
  });

  it("draws dimmed elements faint", () => {
    const svg = graphSvg(els, { dimmed: new Set(["r:K3"]) });
    expect(svg).toMatch(
      /class="reaction" opacity="0.18" points="[^"]+" fill="[^"]+" stroke="[^"]+" stroke-width="1.5" stroke-linejoin="round"><title>O \+ O3 -&gt; 2 O2/,
    );
  });

  it("matches the stored snapshot", () => {
    expect(graphSvg(els, { title: "fixture" })).toMatchSnapshot();
  });
});

describe("explorer query", () => {
  it("round-trips a full state through the URL", () => {
    const q = {
      mechanismId: "oxygen-chlorine",
      condition: {
        altitude_km: 42.5,
        T_K: 251,
        p_hPa: 2.1,
        latitude_deg: -30,
        date: "2026-06-21",
        localSolarTime_h: 9.5,
        mode: "diurnal" as const,
        ozone: "solved" as const,
        aerosolSurface_um2cm3: 4.5,
        poolTotals: { Cly: 3.3e-9, Bry: 2e-11 },
        held: { H2O: 5e-6 },
      },
      view: { colorMode: "ox" as const, showHeld: false, cycle: "C1+C2", select: "s:ClO", detail: 15 },
    };
    const back = parseExplorerQuery(new URLSearchParams(explorerQueryString(q)));
    expect(back.warnings).toEqual([]);
    expect({ mechanismId: back.mechanismId, condition: back.condition, view: back.view }).toEqual(q);
  });

  it("writes equal states as equal strings, with the mechanism and altitude first", () => {
    const a = parseExplorerQuery({ z: "40", m: "reference", "total.Cly": "3e-9", "total.Bry": "2e-11" });
    const s = explorerQueryString(a);
    expect(s.startsWith("m=reference&z=40&")).toBe(true);
    expect(s).toBe(explorerQueryString(parseExplorerQuery(new URLSearchParams(s))));
    expect(s.indexOf("total.Bry")).toBeLessThan(s.indexOf("total.Cly"));
  });

  it("fills defaults for missing parameters", () => {
    const q = parseExplorerQuery({});
    expect(q.mechanismId).toBe("reference");
    expect(q.condition).toEqual({
      altitude_km: 30,
      latitude_deg: 45,
      date: "2026-03-20",
      localSolarTime_h: 12,
      mode: "instantaneous",
    });
    expect(q.view).toEqual({ colorMode: "flux", showHeld: true, cycle: null, select: null, detail: 40 });
  });

  it("keeps the detail level, 'all' for every reaction with flux, and leaves the default out", () => {
    const all = parseExplorerQuery({ detail: "all" });
    expect(all.view.detail).toBe(Infinity);
    expect(explorerQueryString(all)).toMatch(/&detail=all$/);
    expect(parseExplorerQuery({ detail: "80" }).view.detail).toBe(80);
    expect(explorerQueryString(parseExplorerQuery({ detail: "40" }))).not.toContain("detail");
    const bad = parseExplorerQuery({ detail: "33" });
    expect(bad.view.detail).toBe(40);
    expect(bad.warnings).toEqual(["detail=33 ignored: expected one of 15, 25, 40, 80, all"]);
  });

  it("ignores bad values and says which", () => {
    const q = parseExplorerQuery({ z: "high", lat: "95", date: "March", "total.Cly": "-1", m: "../etc" });
    expect(q.condition.altitude_km).toBe(30);
    expect(q.condition.latitude_deg).toBe(45);
    expect(q.condition.poolTotals).toBeUndefined();
    expect(q.mechanismId).toBe("reference");
    expect(q.warnings.join("\n")).toMatch(/z=high ignored/);
    expect(q.warnings.join("\n")).toMatch(/lat=95 ignored/);
    expect(q.warnings.join("\n")).toMatch(/date=March ignored/);
  });
});

describe("number formatting", () => {
  it("writes scientific notation with superscript exponents", () => {
    expect(formatNumber(3.2e6)).toBe("3.2 × 10⁶");
    // the mantissa's sign is U+2212 (the minus sign), the exponent's the superscript minus
    expect(formatNumber(-4.56e-12, 2)).toBe("\u22124.6 × 10⁻¹²");
    expect(formatNumber(-0.5)).toBe("\u22120.5");
    expect(formatPercent(-0.25)).toBe("\u221225 %");
    expect(formatPercent(-0.052)).toBe("\u22125.2 %");
    expect(formatNumber(12.345)).toBe("12.3");
    expect(formatNumber(9.996e5, 3)).toBe("1 × 10⁶");
    expect(formatNumber(null)).toBe("—");
    expect(formatNumber(Number.NaN)).toBe("—");
  });

  it("chooses readable units for mixing ratios, lifetimes and shares", () => {
    expect(formatMixingRatio(3.3e-9)).toBe("3.3 ppbv");
    expect(formatMixingRatio(5e-6)).toBe("5 ppmv");
    expect(formatMixingRatio(2e-11)).toBe("20 pptv");
    expect(formatLifetime(30)).toBe("30 s");
    expect(formatLifetime(3 * 86400)).toBe("3 d");
    expect(formatPercent(0.5523)).toBe("55 %");
    expect(formatPercent(0.034)).toBe("3.4 %");
    expect(formatPercent(0.0001)).toBe("<0.1 %");
  });
});

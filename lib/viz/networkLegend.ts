/**
 * The legend of the active colour mode: ramp stops, ticks at whole decades
 * with their values, the unit, and example edge widths. Built from the same
 * scales as the elements, so the numbers printed are those drawn.
 */
import type { AnalysisResult } from "../engine/types";
import { divergingColor } from "./divergingColor";
import { logScale } from "./logScale";
import { ELEMENTS_DEFAULTS } from "./networkElements";
import { reactionOxValue } from "./reactionOxValue";
import { sequentialColor } from "./sequentialColor";
import { signedLogScale } from "./signedLogScale";
import type { ColorMode, Legend } from "./types";

export const RATE_UNIT = "molecules cm⁻³ s⁻¹";

export function networkLegend(result: AnalysisResult | null, colorMode: ColorMode): Legend {
  const rates = result?.steadyState.reactions.map((r) => r.rate_cm3s) ?? [];
  const flux = logScale(rates, { decades: ELEMENTS_DEFAULTS.decades });
  const fluxTicks = flux.ticks(5);
  const widths = [fluxTicks[0], fluxTicks[Math.floor(fluxTicks.length / 2)], fluxTicks[fluxTicks.length - 1]]
    .filter((t, i, a) => t && a.indexOf(t) === i)
    .map((t) => ({
      width:
        Math.round(
          (ELEMENTS_DEFAULTS.minWidth_px + (ELEMENTS_DEFAULTS.maxWidth_px - ELEMENTS_DEFAULTS.minWidth_px) * t.offset) *
            10,
        ) / 10,
      label: t.label,
    }));
  const n = 9;
  if (colorMode === "flux") {
    return {
      title: "Reaction rate",
      unit: RATE_UNIT,
      stops: Array.from({ length: n }, (_, i) => ({ offset: i / (n - 1), color: sequentialColor(i / (n - 1)) })),
      ticks: fluxTicks.map(({ offset, label }) => ({ offset, label })),
      lowLabel: "slower",
      highLabel: "faster",
      widths,
    };
  }
  const ox = signedLogScale(result?.cycles.perReaction.map(reactionOxValue) ?? []);
  return {
    title: "Odd oxygen (Ox) per reaction",
    unit: RATE_UNIT,
    stops: Array.from({ length: 2 * n - 1 }, (_, i) => {
      const t = -1 + i / (n - 1);
      return { offset: (t + 1) / 2, color: divergingColor(t) };
    }),
    ticks: ox.ticks().map(({ offset, label }) => ({ offset, label })),
    lowLabel: "Ox produced",
    highLabel: "Ox destroyed by its cycles",
    widths,
  };
}

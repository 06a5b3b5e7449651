/**
 * The explorer's altitude slider, and the conditions one key step away from
 * the one on screen: the explorer asks for those ahead of time once a result
 * has painted, so that the next key step repaints from the client's cache.
 */
import type { AnalysisRequest } from "@/lib/engine/types";

/** The altitude slider's range and key step, km. */
export const ALTITUDE_SLIDER = { min_km: 0, max_km: 60, step_km: 0.5 } as const;

/**
 * The requests one slider step below and above `request`'s altitude, nearest
 * first, inside the slider's range; an altitude off the slider's grid (typed,
 * or from a link) steps to the grid points on either side, as the slider does.
 */
export function altitudeNeighbours(
  request: AnalysisRequest,
  slider: { min_km: number; max_km: number; step_km: number } = ALTITUDE_SLIDER,
): AnalysisRequest[] {
  const z = request.condition.altitude_km;
  if (!Number.isFinite(z)) return [];
  const { min_km, max_km, step_km } = slider;
  const i = (z - min_km) / step_km;
  const onGrid = Math.abs(i - Math.round(i)) < 1e-9;
  const below = min_km + (onGrid ? Math.round(i) - 1 : Math.floor(i)) * step_km;
  const above = min_km + (onGrid ? Math.round(i) + 1 : Math.ceil(i)) * step_km;
  return [below, above]
    .filter((a) => a >= min_km - 1e-9 && a <= max_km + 1e-9)
    .map((a) => ({ ...request, condition: { ...request.condition, altitude_km: Number(a.toFixed(6)) } }));
}

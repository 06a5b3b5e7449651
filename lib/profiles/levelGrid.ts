/**
 * The altitudes of a sweep: from `from_km` to `to_km` inclusive in steps of
 * `step_km`, rounded to 1e-6 km so that 10 + 0.1·k lands on decimal values.
 */
import { InputError } from "../errors";
import type { SweepGrid } from "./types";

export const GRID_DEFAULTS = {
  /** km */
  from_km: 10,
  /** km */
  to_km: 60,
  /** km */
  step_km: 1,
  /** most levels in one sweep */
  maxLevels: 200,
};

export function levelGrid(grid: Required<SweepGrid>, path = "grid"): number[] {
  const { from_km, to_km, step_km } = grid;
  if (!(Number.isFinite(from_km) && from_km >= 0 && from_km <= 86))
    throw new InputError(`${path}.from_km`, `expected an altitude between 0 and 86 km, got ${from_km}`);
  if (!(Number.isFinite(to_km) && to_km >= from_km && to_km <= 86))
    throw new InputError(`${path}.to_km`, `expected an altitude between from_km (${from_km}) and 86 km, got ${to_km}`);
  if (!(Number.isFinite(step_km) && step_km > 0))
    throw new InputError(`${path}.step_km`, `expected a step above 0 km, got ${step_km}`);
  const n = Math.floor((to_km - from_km) / step_km + 1e-9) + 1;
  if (n > GRID_DEFAULTS.maxLevels) {
    throw new InputError(
      `${path}.step_km`,
      `${n} levels is more than the ${GRID_DEFAULTS.maxLevels} allowed; use a larger step or a shorter range`,
    );
  }
  return Array.from({ length: n }, (_, i) => Math.round((from_km + i * step_km) * 1e6) / 1e6);
}

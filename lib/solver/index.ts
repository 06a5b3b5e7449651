export { luFactor, luSolve, luSolveTransposed } from "./denseLu";
export { STEADY_STATE_DEFAULTS, solveSteadyState } from "./solveSteadyState";
export type * from "./types";

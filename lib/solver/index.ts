export { luFactor, luSolve, luSolveMatrix, luSolveTransposed } from "./denseLu";
export { INTEGRATE_DEFAULTS, type IntegrateInput, integrate } from "./integrate";
export {
  type IntegrateOdeHooks,
  integrateOde,
  type OdeSystem,
  propagateTangent,
  ROSENBROCK_DEFAULTS,
} from "./rosenbrock";
export { DIURNAL_DEFAULTS, type DiurnalInput, solveDiurnal } from "./solveDiurnal";
export { STEADY_STATE_DEFAULTS, solveSteadyState } from "./solveSteadyState";
export { type SensitivityResult, steadyStateSensitivities } from "./steadyStateSensitivities";
export type * from "./types";

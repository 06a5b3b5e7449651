export { analyseLevel, type LevelRun, type LevelRunOptions } from "./analyseLevel";
export { builtinProfiles, resolveProfileSpec } from "./builtinProfiles";
export { COMPARE_DEFAULTS, type CompareOptions, compareSweeps, explainDifference } from "./compareSweeps";
export { comparisonCsv, sweepCyclesCsv, sweepLevelsCsv } from "./csvTables";
export { fromDemoProfile } from "./fromDemoProfile";
export { interpolateProfile } from "./interpolateProfile";
export { GRID_DEFAULTS, levelGrid } from "./levelGrid";
export { profileOzoneColumns } from "./ozoneColumns";
export { KNOWN_POOLS, parseColumnHeader } from "./parseColumnHeader";
export { PARSE_PROFILE_DEFAULTS, type ParseProfileOptions, parseProfileCsv } from "./parseProfileCsv";
export { type MechanismShape, planSweep, type SweepPlan } from "./planSweep";
export { profileToCsv } from "./profileToCsv";
export {
  comparisonRequestSchema,
  MAX_PROFILE_CSV,
  parseComparisonRequest,
  parseSweepRequest,
  profileSpecSchema,
  sweepRequestSchema,
} from "./requestSchema";
export { type LevelBatch, type LevelBatchResult, type LevelTask, runLevelBatch } from "./runLevelBatch";
export {
  inlineExecutor,
  type RunSweepOptions,
  runSweep,
  SWEEP_DEFAULTS,
  type SweepExecutor,
  type SweepMeta,
  type SweepProgress,
  useParallel,
} from "./runSweep";
export { splitChunks } from "./splitChunks";
export { STANDARD_PROFILE_ID, standardProfile } from "./standardProfile";
export { failedLevel, summariseLevel } from "./summariseLevel";
export type * from "./types";
export * from "./units";

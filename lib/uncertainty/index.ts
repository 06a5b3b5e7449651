export { type AnalysisUncertaintyOptions, analysisUncertainty } from "./analysisUncertainty";
export { bandPolygons } from "./bandPolygons";
export { type ProfileBand, profileShareBands, type ShareBand, shareBands } from "./bandSeries";
export { defineOutputs, OUTPUT_DEFAULTS, type OutputOptions } from "./defineOutputs";
export { evaluateOutputs } from "./evaluateOutputs";
export { inLanes } from "./inLanes";
export { finishMonteCarlo, MONTE_CARLO_DEFAULTS, type MonteCarloPlan, monteCarlo, planMonteCarlo } from "./monteCarlo";
export { normalDraws } from "./normalDraws";
export { quantile } from "./quantile";
export { RANK_DEFAULTS, type RankOptions, rankAgainstAltitude, rankSensitivities } from "./rankSensitivities";
export { runSampleBatch, type SampleBatch } from "./runSampleBatch";
export {
  runSampleBatches,
  SAMPLE_SCHEDULE_DEFAULTS,
  type SampleExecutor,
  type SampleScheduleOptions,
} from "./runSampleBatches";
export { logFactors, SAMPLE_DEFAULTS, type SampleOptions, sampleMultipliers } from "./sampleMultipliers";
export { SENSITIVITY_DEFAULTS, type SensitivityOptions, sensitivities, sensitivityParameters } from "./sensitivities";
export { SUMMARY_DEFAULTS, summariseSamples } from "./summariseSamples";
export type * from "./types";
export { monteCarloCsv, monteCarloNotes, sensitivityCsv, sensitivityNotes } from "./uncertaintyCsv";

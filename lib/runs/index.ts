export { assembleRun, type RunMeta } from "./assembleRun";
export { DAY_BUDGET_DEFAULTS, dayBudget, poolTotalsOf } from "./dayBudget";
export { DEMO_RUNS, type DemoRun, inventedVortexTrajectoryCsv } from "./demoRuns";
export { hourSnapshot } from "./hourSnapshot";
export { type DaySpan, INTEGRATE_DAYS_DEFAULTS, integrateDays } from "./integrateDays";
export { PARSE_TRAJECTORY_DEFAULTS, type ParsedTrajectory, parseTrajectoryCsv } from "./parseTrajectoryCsv";
export { type PlannedRun, planRun, RUN_DEFAULTS } from "./planRun";
export { pressureAltitude_km } from "./pressureAltitude";
export { parseRunRequest, RUN_LIMITS, runRequestSchema, runStartSchema } from "./requestSchema";
export { dateAfter, RUN_CONDITION_DEFAULTS, rowInput, runConditions } from "./runConditions";
export { compactRun, runDailyCsv, runFamilies, runHoursCsv, runRatesCsv } from "./runCsv";
export { RUN_IN_THREAD_DEFAULTS, runInThread } from "./runInThread";
export { type RunChartSeries, type RunLine, runChartSeries } from "./runSeries";
export { type RunDaysTask, type RunStartTask, runDaysTask, runStartTask, type StartSpec } from "./runTasks";
export { periodicStart, START_DEFAULTS, type StartState } from "./startState";
export {
  type DailyLossChart,
  dailyLossChart,
  type StackedBar,
  TIME_CHART_DEFAULTS,
  type TimeLine,
  type TimeLineChart,
  timeLineChart,
} from "./timeCharts";
export type * from "./types";

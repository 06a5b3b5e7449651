/**
 * The routes the typed client calls, by method name: HTTP method and the
 * path as the OpenAPI document writes it (`{id}` for a path parameter). One
 * table, so a test can hold it against /api/openapi.json and fail when the
 * two drift.
 */
export const CLIENT_ROUTES = {
  health: { method: "get", path: "/api/health" },
  atmosphere: { method: "get", path: "/api/atmosphere" },
  listMechanisms: { method: "get", path: "/api/mechanisms" },
  uploadMechanism: { method: "post", path: "/api/mechanisms" },
  getMechanism: { method: "get", path: "/api/mechanisms/{id}" },
  createAnalysis: { method: "post", path: "/api/analyses" },
  previewAnalysis: { method: "post", path: "/api/analyses/preview" },
  getAnalysis: { method: "get", path: "/api/analyses/{id}" },
  analysisCsv: { method: "get", path: "/api/analyses/{id}/{file}" },
  listProfiles: { method: "get", path: "/api/profiles" },
  startSweep: { method: "post", path: "/api/profiles" },
  getSweep: { method: "get", path: "/api/profiles/{id}" },
  sweepCsv: { method: "get", path: "/api/profiles/{id}/{file}" },
  startComparison: { method: "post", path: "/api/comparisons" },
  getComparison: { method: "get", path: "/api/comparisons/{id}" },
  comparisonCsv: { method: "get", path: "/api/comparisons/{id}/comparison.csv" },
  listRunDemos: { method: "get", path: "/api/runs" },
  startRun: { method: "post", path: "/api/runs" },
  getRun: { method: "get", path: "/api/runs/{id}" },
  runCsv: { method: "get", path: "/api/runs/{id}/{file}" },
  deleteMechanism: { method: "delete", path: "/api/mechanisms/{id}" },
  deleteAnalysis: { method: "delete", path: "/api/analyses/{id}" },
  pinAnalysis: { method: "post", path: "/api/analyses/{id}/pin" },
  deleteSweep: { method: "delete", path: "/api/profiles/{id}" },
  deleteComparison: { method: "delete", path: "/api/comparisons/{id}" },
  deleteRun: { method: "delete", path: "/api/runs/{id}" },
  deleteAssessment: { method: "delete", path: "/api/assessments/{id}" },
  revokeStudentLink: { method: "delete", path: "/api/assessments/student/{id}" },
  getJob: { method: "get", path: "/api/jobs/{id}" },
  cancelJob: { method: "delete", path: "/api/jobs/{id}" },
  createAssessment: { method: "post", path: "/api/assessments" },
  getAssessment: { method: "get", path: "/api/assessments/{id}" },
  assessmentQti: { method: "get", path: "/api/assessments/{id}/qti.zip" },
  getStudentSheets: { method: "get", path: "/api/assessments/student/{id}" },
} as const;

export type ClientMethod = keyof typeof CLIENT_ROUTES;

/** The DELETE route of each kind of record. */
export const DELETE_METHOD = {
  mechanism: "deleteMechanism",
  analysis: "deleteAnalysis",
  sweep: "deleteSweep",
  comparison: "deleteComparison",
  run: "deleteRun",
  assessment: "deleteAssessment",
  studentLink: "revokeStudentLink",
} as const satisfies Record<string, ClientMethod>;

/** The files a `{file}` path segment stands for, by route. */
export const CLIENT_FILES = {
  analysisCsv: ["rates.csv", "species.csv", "cycles.csv", "uncertainty.csv", "sensitivities.csv"],
  sweepCsv: ["levels.csv", "cycles.csv", "profile.csv"],
  runCsv: ["hours.csv", "rates.csv", "daily.csv"],
} as const;

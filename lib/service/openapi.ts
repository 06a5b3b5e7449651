/**
 * The OpenAPI 3.1 description of the service's routes. The request bodies' schemas are generated from the
 * zod schemas the routes parse with (jsonSchemaOf); summaries, descriptions, examples, defaults and the
 * responses are written here.
 */
import { z } from "zod";
import packageJson from "../../package.json";
import { assessmentPreviewSchema, assessmentSpecSchema } from "../assessment/specSchema";
import { CONDITION_DEFAULTS as D } from "../atmosphere/condition";
import { uploadSchema } from "../engine/checkUpload";
import { analysisRequestSchema, conditionSchema } from "../engine/requestSchema";
import { comparisonRequestSchema, storedSideSchema, sweepRequestSchema } from "../profiles/requestSchema";
import { runRequestSchema } from "../runs/requestSchema";
import { type JsonSchema, jsonSchemaOf, type Prose } from "./jsonSchemaOf";
import { uncertaintyJobSchema } from "./uncertaintyJobSchema";

const error = {
  type: "object",
  required: ["error"],
  properties: {
    error: {
      type: "object",
      required: ["code", "message"],
      properties: {
        code: {
          type: "string",
          examples: ["invalid-request", "not-found", "gone", "too-large", "too-deep", "rate-limited", "timeout"],
        },
        message: { type: "string" },
        path: { type: "string", description: "path of the offending input, e.g. condition.altitude_km" },
        line: { type: "integer", description: "1-based line in an uploaded document" },
        column: { type: "integer" },
        problems: { type: "array", items: { $ref: "#/components/schemas/Diagnostic" } },
      },
    },
  },
};

const errors = (...codes: number[]) =>
  Object.fromEntries(
    codes.map((c) => [
      String(c),
      {
        description:
          {
            400: "invalid input (also: nested deeper than 64 levels, code too-deep; a malformed deletion token, code invalid-token)",
            403: "the deletion token does not belong to this record (code forbidden)",
            404: "unknown id",
            410: "the record was deleted with its token or has expired (code gone)",
            413: "body or document over its size limit (code too-large, for every such refusal)",
            422: "computation over its time limit",
            429: "more requests from this client address than the rate limit allows (code rate-limited; Retry-After gives the seconds to wait)",
            507: "the storage budget is spent on kept records (code storage-full)",
          }[c] ?? "error",
        content: { "application/json": { schema: { $ref: "#/components/schemas/Error" } } },
      },
    ]),
  );

/** Every CSV export starts with `# key: value` provenance lines (docs/csv-exports.md); this drops them. */
const comments = {
  name: "comments",
  in: "query",
  required: false,
  schema: { enum: ["none"] },
  description: "none: the bare table, without the leading # lines of provenance (docs/csv-exports.md)",
};

const csv = (what: string) => ({
  get: {
    summary: `${what} of a stored analysis as CSV, units in the header`,
    parameters: [{ $ref: "#/components/parameters/id" }, comments],
    responses: { 200: { description: "CSV", content: { "text/csv": { schema: { type: "string" } } } }, ...errors(404) },
  },
});

// Profile sweeps, comparisons and jobs (issue 9).
const job202 = {
  202: {
    description:
      "queued: the job's status ({ id, state, done, total, stage, statusUrl }, and for sweeps and comparisons the deletionToken of the record it will store, shown once); poll GET /api/jobs/{id} (or stream /api/jobs/{id}/events) until state is done, then open resultUrl",
    content: { "application/json": { schema: { $ref: "#/components/schemas/JobStatus" } } },
  },
};

const profileCsv = (what: string, kind: string) => ({
  get: {
    summary: `${what} of a stored ${kind} as CSV, units in the header`,
    parameters: [{ $ref: "#/components/parameters/id" }, comments],
    responses: { 200: { description: "CSV", content: { "text/csv": { schema: { type: "string" } } } }, ...errors(404) },
  },
});

/** DELETE with the deletion token handed out at creation: 204, then the record's links answer 410. */
const deletion = (what: string) => ({
  delete: {
    summary: `Delete ${what} with its deletion token; afterwards its links answer 410 Gone (a second DELETE too)`,
    parameters: [
      { $ref: "#/components/parameters/id" },
      {
        name: "x-deletion-token",
        in: "header",
        required: true,
        schema: { type: "string", pattern: "^[A-Za-z0-9_-]{43}$" },
        description: "the deletionToken of the creating response, shown once",
      },
    ],
    responses: { 204: { description: "deleted" }, ...errors(400, 403, 404, 410) },
  },
});

const jobId = { name: "id", in: "path", required: true, schema: { type: "string", pattern: "^[A-Za-z0-9_-]{16}$" } };

/** POST that queues a job with a JSON body of `schema`: 202 with the job to poll. */
const jobPost = (summary: string, schema: string) => ({
  summary,
  requestBody: {
    required: true,
    content: { "application/json": { schema: { $ref: `#/components/schemas/${schema}` } } },
  },
  responses: { ...job202, ...errors(400, 404, 413, 429) },
});

/**
 * GET {base}/{id} (the record) and GET {base}/{id}.json (its download); with `deletable`, the DELETE
 * with the record's deletion token too.
 */
const recordPaths = (base: string, record: string, what: string, deletable?: string) => ({
  [`${base}/{id}`]: {
    get: {
      summary: record,
      parameters: [{ $ref: "#/components/parameters/id" }],
      responses: { 200: { description: "record" }, ...errors(404, 410) },
    },
    ...(deletable ? deletion(deletable) : {}),
  },
  [`${base}/{id}.json`]: {
    get: {
      summary: `The full stored ${what} as a JSON download`,
      parameters: [{ $ref: "#/components/parameters/id" }],
      responses: { 200: { description: "record" }, ...errors(404) },
    },
  },
});

const profilePaths = {
  "/api/profiles": {
    get: {
      summary:
        "The profiles offered without an upload: the default (standard atmosphere, default climatology) and the invented demo profiles, each with its CSV",
      responses: { 200: { description: "{ profiles: [{ id, title, source, demo, note, levels, range_km, csv }] }" } },
    },
    post: jobPost(
      "Start a profile sweep: steady state and cycle analysis at every level, warm-started from the neighbour",
      "SweepRequest",
    ),
  },
  ...recordPaths(
    "/api/profiles",
    "A stored sweep: { id, createdAt, engineVersion, body: { request, profile, result } }; failed levels carry status and message",
    "sweep",
    "a stored sweep (the token of the 202 that started it)",
  ),
  "/api/profiles/{id}/levels.csv": profileCsv(
    "Condition, status, Ox production and loss, and loss and fraction by family at every level",
    "sweep",
  ),
  "/api/profiles/{id}/cycles.csv": profileCsv("Every cycle at every level", "sweep"),
  "/api/profiles/{id}/profile.csv": profileCsv("The input profile in the upload format", "sweep"),
  "/api/comparisons": {
    post: jobPost(
      "Start a comparison of two sweeps (stored ones by id, or sweeps to run): Ox loss and its family split for A and B, B − A, and the cycles explaining it",
      "ComparisonRequest",
    ),
  },
  ...recordPaths(
    "/api/comparisons",
    "A stored comparison: { id, createdAt, engineVersion, body: { request, result } }",
    "comparison",
    "a stored comparison (the token of the 202 that started it; the sweeps it computed take it too)",
  ),
  "/api/comparisons/{id}/comparison.csv": profileCsv(
    "A, B and B − A at every altitude, by family, with the cycles explaining B − A",
    "comparison",
  ),
  "/api/jobs/{id}": {
    get: {
      summary:
        "A job's status: state (queued, running, done, failed, cancelled), done/total, and when done resultId and resultUrl",
      parameters: [jobId],
      responses: {
        200: {
          description: "status",
          content: { "application/json": { schema: { $ref: "#/components/schemas/JobStatus" } } },
        },
        ...errors(404),
      },
    },
    delete: {
      summary: "Cancel a queued or running job (a finished job is returned unchanged)",
      parameters: [jobId],
      responses: { 200: { description: "status" }, ...errors(404) },
    },
  },
  "/api/jobs/{id}/events": {
    get: {
      summary: "Server-sent events: one `status` event (a JobStatus) per change until the job ends",
      parameters: [jobId],
      responses: {
        200: { description: "text/event-stream", content: { "text/event-stream": { schema: { type: "string" } } } },
      },
    },
  },
};

// Runs over days (issue 17).
const runCsv = (what: string) => profileCsv(what, "run");
const runPaths = {
  "/api/runs": {
    get: {
      summary: "The invented demo runs offered on the runs page, each with its request",
      responses: { 200: { description: "{ demos: [{ id, title, note, request }] }" } },
    },
    post: jobPost(
      "Start a run: the mechanism integrated over 1–60 days at a fixed place or along a trajectory, with hourly output and each day's Ox loss by family and cycle",
      "RunRequest",
    ),
  },
  ...recordPaths(
    "/api/runs",
    "A stored run: { id, createdAt, engineVersion, body: { request, result } }; a failed integration has status failed, failedAt_h and the hours up to then",
    "run",
    "a stored run (the analyses opened at its hours stay)",
  ),
  "/api/runs/{id}/hours.csv": runCsv("The hourly state (T, [M], zenith angle, O3 in ppbv, every number density)"),
  "/api/runs/{id}/rates.csv": runCsv("The hourly rate of every reaction"),
  "/api/runs/{id}/daily.csv": runCsv("Each day's O3 change, Ox budget and closure, loss by family and pool totals"),
};

// Request bodies: generated from the routes' zod schemas (jsonSchemaOf); only the words below are by hand.
const CONDITION_PROSE: Prose = {
  T_K: { description: "default: U.S. Standard Atmosphere 1976" },
  p_hPa: { description: "default: U.S. Standard Atmosphere 1976" },
  latitude_deg: { default: D.latitude_deg },
  date: { default: D.date, description: "YYYY-MM-DD" },
  localSolarTime_h: { default: D.localSolarTime_h },
  zenith_deg: { description: "overrides latitude/date/time for the sun" },
  mode: { default: D.mode },
  held: { description: "mixing ratios by species" },
  poolTotals: { description: "mixing ratios of atoms by pool (Cly, Bry, NOy)" },
  J: { description: "fixed photolysis frequencies, s-1, by channel" },
  jScale: { default: D.jScale },
  ozone: { default: D.ozone },
  o3ColumnAbove_DU: {
    description: "overhead ozone column for the light, Dobson units; default from the climatology",
  },
  aerosolSurface_um2cm3: {
    description: "sulfate aerosol surface area density for uptake reactions, um2 cm-3; default: background profile",
  },
  cloud: {
    default: D.cloud,
    description:
      "polar stratospheric cloud: none, NAT, ice, or auto (ice below the frost point, Marti and Mauersberger 1993; NAT below the NAT existence temperature, Hanson and Mauersberger 1988, at the local H2O and NOy as HNO3)",
  },
  cloudSurface_um2cm3: {
    description: "surface area density of the cloud present, um2 cm-3 (NAT at most 100); default NAT 1, ice 200",
  },
  albedo: {
    default: D.albedo,
    description: "Lambertian ground albedo for the scattered light (two-stream radiative transfer)",
  },
  aerosolOpticalDepth: {
    default: D.aerosolOpticalDepth,
    description: "column aerosol optical depth at 550 nm for the light, spread like the background sulfate profile",
  },
};

/** The sweep's request-wide condition: the condition without the fields the profile gives. */
const SWEEP_CONDITION_PROSE: Prose = Object.fromEntries(
  Object.entries(CONDITION_PROSE)
    .filter(([k]) => !["T_K", "p_hPa"].includes(k))
    .map(([k, v]) => [`condition.${k}`, v]),
);

const FMIN_PROSE = {
  default: 1e-4,
  description: "pathway threshold, fraction of the gross Ox destruction (extended weights)",
};

const REQUEST_PROSE: Record<string, Prose> = {
  Condition: CONDITION_PROSE,
  AnalysisRequest: {
    mechanismId: { examples: ["reference", "oxygen", "oxygen-chlorine"] },
    "options.fminRelative": FMIN_PROSE,
    "options.oxDefinition": { default: "standard" },
    "options.uncertaintySamples": {
      default: 0,
      description: "Monte Carlo samples over the JPL rate-constant uncertainties (docs/uncertainty.md)",
    },
    "options.uncertaintySeed": { default: 1 },
    "options.sensitivity": {
      default: false,
      description: "normalised sensitivity coefficients d ln(output)/d ln(k) of the key outputs",
    },
  },
  SweepRequest: {
    mechanismId: { examples: ["reference", "oxygen-chlorine"] },
    "profile.csv": { description: "profile CSV, see docs/profile-format.md; at most 512 KiB" },
    "profile.name": { description: "file name used in error paths" },
    "grid.from_km": { default: 10, description: "default 10 km, or the profile's lowest level" },
    "grid.to_km": { default: 60, description: "default 60 km, or the profile's highest level" },
    "grid.step_km": { default: 1 },
    condition: {
      description:
        "the AnalysisRequest condition without altitude_km, T_K and p_hPa (they come from the profile); held and poolTotals here win over the profile's columns",
    },
    ...SWEEP_CONDITION_PROSE,
    "options.fminRelative": FMIN_PROSE,
    "options.oxDefinition": { default: "standard" },
    "options.parallel": {
      default: "auto",
      description:
        "parallel: one warm-started chain per engine worker; sequential: one chain from the top down; auto: parallel for the 24-hour mode only",
    },
    "options.maxColumnPasses": { default: 3, description: "with O3 solved: passes of the overhead-column iteration" },
    "options.columnTolerance": { default: 0.01 },
  },
  ComparisonRequest: {
    a: { description: "sweep A: a stored sweep by id, or a sweep to run" },
    b: { description: "sweep B: a stored sweep by id, or a sweep to run" },
    topCycles: { default: 5 },
  },
  RunRequest: {
    mechanismId: { examples: ["reference"] },
    condition: {
      description:
        "the condition of the place (or the base of every trajectory row: date, held, poolTotals, …); the run starts at local midnight of its date, O3 solved unless ozone is held",
    },
    start: {
      description: "default periodic: the 24-hour periodic solution at the first condition, at local midnight",
    },
    "trajectory.csv": {
      description:
        "time_h,T_K,p_hPa,latitude_deg[,altitude_km][,aerosolSurface_um2cm3][,other condition fields]; at most 10,000 rows and 1 MiB; see docs/runs.md",
    },
    "options.fminRelative": FMIN_PROSE,
    "options.oxDefinition": { default: "standard" },
    "options.sunFollowsDate": { default: true },
  },
  AssessmentSpec: {
    seed: { description: "default: random, recorded with the key" },
    base: { description: "the condition every variant starts from" },
    ranges: {
      description: "{ min, max, step? } of each field drawn per variant; pool totals as mixing ratios",
    },
    "questions[].points": { default: 1 },
  },
};

/** Where a schema appears inside another, it is a $ref to its component. */
const COMPONENT_REFS = new Map<z.core.$ZodType, string>([
  [conditionSchema, "Condition"],
  [analysisRequestSchema, "AnalysisRequest"],
  [sweepRequestSchema, "SweepRequest"],
]);

/** Each side of a comparison, as parseComparisonRequest reads it: a stored sweep, or a whole sweep request. */
const comparisonSide = z.union([storedSideSchema, sweepRequestSchema]);

/** The component schemas generated from zod, by the schema each comes from. */
export const GENERATED_SCHEMAS = {
  Condition: conditionSchema,
  AnalysisRequest: analysisRequestSchema,
  SweepRequest: sweepRequestSchema,
  ComparisonRequest: comparisonRequestSchema.extend({ a: comparisonSide, b: comparisonSide }),
  RunRequest: runRequestSchema,
  AssessmentSpec: assessmentSpecSchema,
  AssessmentPreview: assessmentPreviewSchema,
  MechanismUpload: uploadSchema,
  UncertaintyJob: uncertaintyJobSchema,
} satisfies Record<string, z.ZodType>;

const requestSchemas = Object.fromEntries(
  Object.entries(GENERATED_SCHEMAS).map(([name, schema]) => [
    name,
    jsonSchemaOf(schema, { prose: REQUEST_PROSE[name], refs: COMPONENT_REFS }),
  ]),
) as Record<keyof typeof GENERATED_SCHEMAS, JsonSchema>;

const profileSchemas = {
  JobStatus: {
    type: "object",
    required: ["id", "kind", "state", "done", "total"],
    properties: {
      id: { type: "string" },
      kind: { enum: ["profile-sweep", "comparison"] },
      state: { enum: ["queued", "running", "done", "failed", "cancelled"] },
      done: { type: "integer" },
      total: { type: "integer", description: "may grow while running (another pass over the levels)" },
      stage: { type: "string" },
      resultId: { type: "string" },
      resultKind: { enum: ["profile", "comparison"] },
      resultUrl: { type: "string", description: "permalink page of the result" },
      resultApiUrl: { type: "string" },
      statusUrl: { type: "string" },
      error: {
        type: "object",
        properties: { code: { type: "string" }, message: { type: "string" }, path: { type: "string" } },
      },
    },
  },
};

export const openApiDocument = {
  openapi: "3.1.0",
  info: {
    title: "Ozone Loss Cycles",
    version: packageJson.version,
    description:
      "Photochemical steady state, odd-oxygen budget and catalytic ozone-loss cycles for a chemical mechanism at stratospheric conditions. A research and teaching tool, not for regulatory, health or operational decisions.",
  },
  paths: {
    "/api/health": {
      get: { summary: "Versions and built-in mechanisms", responses: { 200: { description: "ok" } } },
    },
    "/api/atmosphere": {
      get: {
        summary: "U.S. Standard Atmosphere 1976 at an altitude",
        parameters: [
          { name: "altitude_km", in: "query", required: true, schema: { type: "number", minimum: 0, maximum: 86 } },
        ],
        responses: { 200: { description: "T_K, p_hPa, M_cm3" }, ...errors(400) },
      },
    },
    "/api/mechanisms": {
      get: {
        summary:
          "The built-in mechanisms, and this client's own uploads (those made with its owner cookie, ozone-owner); nobody else's",
        responses: { 200: { description: "list" } },
      },
      post: {
        summary:
          "Upload a mechanism document (YAML or JSON); parsed and validated in a worker, stored under a new random id (u-…), listed only to its uploader (owner cookie, set on the first upload)",
        requestBody: {
          required: true,
          content: {
            "application/json": {
              schema: {
                oneOf: [
                  { $ref: "#/components/schemas/MechanismUpload" },
                  { type: "object", description: "the JSON form of a mechanism document" },
                ],
              },
            },
            "application/yaml": { schema: { type: "string" } },
            "text/plain": { schema: { type: "string" } },
          },
        },
        responses: {
          201: {
            description:
              "stored: id, deletionToken (shown once), summary (species, reactions, conserved pools), warnings. A document with no solved species or no reactions is a 400 (code empty-mechanism)",
          },
          ...errors(400, 413, 429),
        },
      },
    },
    "/api/mechanisms/{id}": {
      get: {
        summary: "A mechanism: document text, species, reactions, pools, warnings",
        parameters: [{ $ref: "#/components/parameters/id" }],
        responses: { 200: { description: "mechanism" }, ...errors(404, 410) },
      },
      ...deletion("an uploaded mechanism"),
    },
    "/api/analyses": {
      post: {
        summary:
          "Compute and store an analysis (the explorer stores one this way when its permalink or a table is asked for). With ?draft=1 it is a draft, which expires after OZONE_DRAFT_TTL_DAYS unless its permalink is opened, copied (POST …/pin) or exported",
        parameters: [{ name: "draft", in: "query", required: false, schema: { enum: ["1"] } }],
        requestBody: {
          required: true,
          content: { "application/json": { schema: { $ref: "#/components/schemas/AnalysisRequest" } } },
        },
        responses: {
          201: {
            description:
              "{ id, result, deletionToken, deletionNote }: steady state, rates, budget, cycles, per-reaction ozone destroyed, diagnostics. A steady state that failed is still 201 with its status.",
          },
          ...errors(400, 404, 410, 413, 422, 429, 507),
        },
      },
    },
    "/api/analyses/preview": {
      post: {
        summary:
          "Compute an analysis and store nothing (the explorer's recompute on every slider step); POST /api/analyses with the same request stores the same result for a permalink",
        requestBody: {
          required: true,
          content: { "application/json": { schema: { $ref: "#/components/schemas/AnalysisRequest" } } },
        },
        responses: {
          200: { description: "{ result }: the result POST /api/analyses would store, without id or deletion token" },
          ...errors(400, 404, 410, 413, 422, 429),
        },
      },
    },
    "/api/analyses/{id}": {
      get: {
        summary: "A stored analysis with its request and engine version",
        parameters: [{ $ref: "#/components/parameters/id" }],
        responses: { 200: { description: "record" }, ...errors(404, 410) },
      },
      ...deletion("an analysis"),
    },
    "/api/analyses/{id}/pin": {
      post: {
        summary: "Keep a draft analysis for good (its permalink was copied); idempotent",
        parameters: [{ $ref: "#/components/parameters/id" }],
        responses: { 200: { description: "{ id, pinned: true }" }, ...errors(404, 410) },
      },
    },
    "/api/analyses/{id}.json": {
      get: {
        summary: "The full stored analysis as a JSON download",
        parameters: [{ $ref: "#/components/parameters/id" }],
        responses: { 200: { description: "record" }, ...errors(404) },
      },
    },
    "/api/analyses/{id}/rates.csv": csv("Every reaction's rate constant, rate and ozone destroyed"),
    "/api/analyses/{id}/species.csv": csv("Every species' number density, mixing ratio, production, loss and lifetime"),
    "/api/analyses/{id}/cycles.csv": csv("The catalytic cycles"),
    "/api/assessments": {
      post: {
        summary:
          "Build an assessment: variants drawn from ranges by a seeded generator, questions from templates, answers computed by the engine",
        requestBody: {
          required: true,
          content: { "application/json": { schema: { $ref: "#/components/schemas/AssessmentSpec" } } },
        },
        responses: {
          201: {
            description:
              "{ instructorId, studentId, instructorUrl, studentUrl, assessment, deletionToken, deletionNote }: the instructor record with the key, and the token (shown once) that deletes both links or revokes the student link",
          },
          ...errors(400, 404, 413, 422, 429, 507),
        },
      },
    },
    "/api/assessments/preview": {
      post: {
        summary:
          "The cycles, families and solved species at a base condition, for choosing questions; nothing is stored",
        requestBody: {
          required: true,
          content: {
            "application/json": {
              schema: { $ref: "#/components/schemas/AssessmentPreview" },
            },
          },
        },
        responses: {
          200: { description: "{ mechanism, status, conditions, families, cycles, solvedSpecies, pools }" },
          ...errors(400, 404, 422),
        },
      },
    },
    "/api/assessments/{id}": {
      get: {
        summary: "The instructor record of an assessment, answer key included (instructor id only)",
        parameters: [{ $ref: "#/components/parameters/id" }],
        responses: { 200: { description: "instructor record" }, ...errors(404, 410) },
      },
      ...deletion("an assessment, both its links (instructor id)"),
    },
    "/api/assessments/{id}/key.csv": {
      get: {
        summary: "The answer key as CSV: variant, seed, question, answer, unit, tolerance",
        parameters: [{ $ref: "#/components/parameters/id" }, comments],
        responses: {
          200: { description: "CSV", content: { "text/csv": { schema: { type: "string" } } } },
          ...errors(404),
        },
      },
    },
    "/api/assessments/{id}/key.json": {
      get: {
        summary: "The answer key as JSON, grouped by variant, with the seed and conditions",
        parameters: [{ $ref: "#/components/parameters/id" }],
        responses: { 200: { description: "key" }, ...errors(404) },
      },
    },
    "/api/assessments/{id}/answers-template.csv": {
      get: {
        summary: "A blank answer file for the class: student, variant, q1 … qN",
        parameters: [{ $ref: "#/components/parameters/id" }, comments],
        responses: {
          200: { description: "CSV", content: { "text/csv": { schema: { type: "string" } } } },
          ...errors(404),
        },
      },
    },
    "/api/assessments/{id}/qti.zip": {
      get: {
        summary:
          "The assessment as an IMS QTI 2.1 content package (instructor id only): one item per question and variant, numeric answers with the marking tolerance, choice answers for family and step questions",
        parameters: [{ $ref: "#/components/parameters/id" }],
        responses: {
          200: { description: "zip", content: { "application/zip": { schema: { type: "string", format: "binary" } } } },
          ...errors(404),
        },
      },
    },
    "/api/assessments/{id}/marks": {
      post: {
        summary:
          "Mark a class's answers (CSV body, or JSON { csv }) with the stored tolerances; ?format=csv for the marks as CSV",
        parameters: [
          { $ref: "#/components/parameters/id" },
          { name: "format", in: "query", required: false, schema: { enum: ["json", "csv"], default: "json" } },
          comments,
        ],
        requestBody: { required: true, content: { "text/csv": { schema: { type: "string" } } } },
        responses: {
          200: { description: "{ students, questions, warnings, csv }, or the CSV" },
          ...errors(400, 404, 413),
        },
      },
    },
    "/api/assessments/student/{id}": {
      get: {
        summary: "The student sheets of an assessment (student id): questions and conditions, never an answer",
        parameters: [{ $ref: "#/components/parameters/id" }],
        responses: { 200: { description: "student record" }, ...errors(404, 410) },
      },
      ...deletion(
        "the student link of an assessment alone (a leaked link; the assessment's token), the instructor link stays",
      ),
    },
    ...profilePaths,
    ...runPaths,
    "/api/analyses/{id}/uncertainty.csv": csv("Monte Carlo central value, median and 5–95 % range of each output"),
    "/api/analyses/{id}/sensitivities.csv": csv("Sensitivity coefficients, one row per output and rate constant"),
    "/api/uncertainty": {
      post: {
        summary:
          "Start Monte Carlo ranges (and sensitivities) as a job: { analysis: AnalysisRequest } stores an analysis with result.uncertainty; { profileId, samples, seed?, sensitivity? } runs every level of a stored sweep",
        requestBody: {
          required: true,
          content: { "application/json": { schema: { $ref: "#/components/schemas/UncertaintyJob" } } },
        },
        responses: { 202: { description: "job status with statusUrl" }, ...errors(400, 404, 413) },
      },
    },
    "/api/uncertainty/jobs/{id}": {
      get: {
        summary: "Status and progress of an uncertainty job; resultApiUrl when done",
        parameters: [jobId],
        responses: { 200: { description: "job status" }, ...errors(404) },
      },
      delete: {
        summary: "Cancel an uncertainty job (nothing is stored)",
        parameters: [jobId],
        responses: { 200: { description: "job status" }, ...errors(404) },
      },
    },
    "/api/uncertainty/profiles/{id}": {
      get: {
        summary:
          "A stored profile uncertainty record: per-level Monte Carlo results and family-share bands against altitude",
        parameters: [{ $ref: "#/components/parameters/id" }],
        responses: { 200: { description: "record" }, ...errors(404) },
      },
    },
  },
  components: {
    parameters: {
      id: { name: "id", in: "path", required: true, schema: { type: "string", pattern: "^[A-Za-z0-9_-]{1,80}$" } },
    },
    schemas: {
      ...requestSchemas,
      ...profileSchemas,
      Error: error,
      Diagnostic: {
        type: "object",
        properties: {
          severity: { enum: ["error", "warning"] },
          code: { type: "string" },
          message: { type: "string" },
          path: { type: "string" },
          line: { type: "integer" },
          column: { type: "integer" },
        },
      },
    },
  },
} as const;

/**
 * A typed client of the service's JSON routes, for scripts and notebooks in
 * TypeScript: one method per route of CLIENT_ROUTES, the request and result
 * types of the library, errors as ApiError with the service's code, message
 * and path. Uses the global fetch (Node 18+, browsers); nothing else.
 */
import type { AssessmentSpec, InstructorAssessment, StudentAssessment } from "../assessment/types";
import type { AnalysisRequest, AnalysisResult } from "../engine/types";
import type { ComparisonRequest, SweepRequest } from "../profiles/types";
import type { RunRequest } from "../runs/types";
import type { Health } from "../runtime/health";
import type { AnalysisRecord } from "../service/analyses";
import type { JobView } from "../service/jobs";
import type { StoredComparisonRecord, StoredProfileRecord } from "../service/profiles";
import type { StoredRunRecord } from "../service/runs";
import { type CLIENT_FILES, CLIENT_ROUTES, type ClientMethod, DELETE_METHOD } from "./routes";

export const CLIENT_DEFAULTS = {
  /** ms between two polls of a job in waitForJob; default 500 */
  pollInterval_ms: 500,
  /** ms waitForJob waits before it gives up; default 10 minutes */
  timeout_ms: 600_000,
};

export interface ClientOptions {
  /** the service's origin, e.g. "http://localhost:3000" */
  baseUrl: string;
  /** fetch to use; default the global one */
  fetch?: typeof fetch;
}

/** A response of the service other than 2xx: its status and the body's { error: { code, message, path } }. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly path?: string;
  constructor(status: number, code: string, message: string, path?: string) {
    super(`${status} ${code}: ${message}`);
    this.name = "ApiError";
    this.status = status;
    this.code = code;
    this.path = path;
  }
}

type Params = Record<string, string>;

export class OzoneCyclesClient {
  private readonly base: string;
  private readonly fetchFn: typeof fetch;

  constructor(options: ClientOptions) {
    if (!/^https?:\/\//.test(options.baseUrl)) {
      throw new TypeError(`OzoneCyclesClient: invalid baseUrl: ${options.baseUrl} (expected http:// or https://)`);
    }
    this.base = options.baseUrl.replace(/\/+$/, "");
    this.fetchFn = options.fetch ?? fetch;
  }

  /** The address of a route with its path parameters filled in. */
  url(method: ClientMethod, params: Params = {}, query: Record<string, string | number> = {}): string {
    const path = CLIENT_ROUTES[method].path.replace(/\{(\w+)\}/g, (_, k: string) => {
      const v = params[k];
      if (v === undefined) throw new TypeError(`OzoneCyclesClient.${method}: missing ${k}`);
      return encodeURIComponent(v);
    });
    const q = new URLSearchParams(Object.entries(query).map(([k, v]) => [k, String(v)])).toString();
    return `${this.base}${path}${q ? `?${q}` : ""}`;
  }

  private async call(
    method: ClientMethod,
    init: {
      params?: Params;
      query?: Record<string, string | number>;
      body?: unknown;
      text?: string;
      contentType?: string;
      /** the deletion token handed out when the record was created */
      deletionToken?: string;
    } = {},
  ): Promise<Response> {
    const headers: Record<string, string> = {};
    if (init.deletionToken !== undefined) headers["x-deletion-token"] = init.deletionToken;
    let body: string | undefined;
    if (init.body !== undefined) {
      headers["content-type"] = "application/json";
      body = JSON.stringify(init.body);
    } else if (init.text !== undefined) {
      headers["content-type"] = init.contentType ?? "text/plain";
      body = init.text;
    }
    const res = await this.fetchFn(this.url(method, init.params, init.query), {
      method: CLIENT_ROUTES[method].method.toUpperCase(),
      headers,
      body,
    });
    if (!res.ok) {
      let e: { code?: string; message?: string; path?: string } = {};
      try {
        e = ((await res.json()) as { error?: typeof e }).error ?? {};
      } catch {
        // a body that is not the service's JSON error
      }
      throw new ApiError(res.status, e.code ?? "http-error", e.message ?? res.statusText, e.path);
    }
    return res;
  }

  private async json<T>(method: ClientMethod, init?: Parameters<OzoneCyclesClient["call"]>[1]): Promise<T> {
    return (await (await this.call(method, init)).json()) as T;
  }

  health() {
    return this.json<Health>("health");
  }
  /** U.S. Standard Atmosphere 1976 at an altitude, km */
  atmosphere(altitude_km: number) {
    return this.json<{ T_K: number; p_hPa: number; M_cm3: number }>("atmosphere", { query: { altitude_km } });
  }
  listMechanisms() {
    return this.json<{ mechanisms: { id: string; title: string; builtin: boolean }[] }>("listMechanisms");
  }
  /** Uploads a mechanism document (YAML or JSON text); resolves to its content id and summary. */
  uploadMechanism(text: string, format?: "yaml" | "json") {
    return this.json<{ id: string; title: string; created: boolean } & Record<string, unknown>>("uploadMechanism", {
      body: { text, ...(format ? { format } : {}) },
    });
  }
  getMechanism(id: string) {
    return this.json<Record<string, unknown>>("getMechanism", { params: { id } });
  }
  createAnalysis(request: AnalysisRequest) {
    return this.json<{ id: string; result: AnalysisResult }>("createAnalysis", { body: request });
  }
  /** The analysis computed and not stored; createAnalysis with the same request stores the same result. */
  previewAnalysis(request: AnalysisRequest) {
    return this.json<{ result: AnalysisResult }>("previewAnalysis", { body: request });
  }
  getAnalysis(id: string) {
    return this.json<AnalysisRecord>("getAnalysis", { params: { id } });
  }
  /** A CSV table of a stored analysis; `comments: false` for the table without its # lines. */
  async analysisCsv(id: string, file: (typeof CLIENT_FILES.analysisCsv)[number], comments = true) {
    return (
      await this.call("analysisCsv", { params: { id, file }, query: comments ? {} : { comments: "none" } })
    ).text();
  }
  listProfiles() {
    return this.json<{ profiles: { id: string; title: string; demo: boolean; csv: string }[] }>("listProfiles");
  }
  /** Starts a sweep as a job; follow it with waitForJob. */
  startSweep(request: SweepRequest) {
    return this.json<JobView>("startSweep", { body: request });
  }
  getSweep(id: string) {
    return this.json<StoredProfileRecord>("getSweep", { params: { id } });
  }
  async sweepCsv(id: string, file: (typeof CLIENT_FILES.sweepCsv)[number], comments = true) {
    return (await this.call("sweepCsv", { params: { id, file }, query: comments ? {} : { comments: "none" } })).text();
  }
  startComparison(request: ComparisonRequest) {
    return this.json<JobView>("startComparison", { body: request });
  }
  getComparison(id: string) {
    return this.json<StoredComparisonRecord>("getComparison", { params: { id } });
  }
  async comparisonCsv(id: string, comments = true) {
    return (await this.call("comparisonCsv", { params: { id }, query: comments ? {} : { comments: "none" } })).text();
  }
  /** The invented demo runs, each with the request that starts it. */
  listRunDemos() {
    return this.json<{ demos: { id: string; title: string; note: string; request: RunRequest }[] }>("listRunDemos");
  }
  /** Starts a run over days as a job; follow it with waitForJob. */
  startRun(request: RunRequest) {
    return this.json<JobView>("startRun", { body: request });
  }
  getRun(id: string) {
    return this.json<StoredRunRecord>("getRun", { params: { id } });
  }
  async runCsv(id: string, file: (typeof CLIENT_FILES.runCsv)[number], comments = true) {
    return (await this.call("runCsv", { params: { id, file }, query: comments ? {} : { comments: "none" } })).text();
  }
  /**
   * Deletes a stored record with the deletion token its creation returned (shown once); its links
   * then answer 410. For an assessment, the instructor id deletes both links and the student id
   * revokes the student link alone.
   */
  async deleteRecord(
    kind: "mechanism" | "analysis" | "sweep" | "comparison" | "assessment" | "studentLink",
    id: string,
    deletionToken: string,
  ): Promise<void> {
    const method = DELETE_METHOD[kind];
    await this.call(method, { params: { id }, deletionToken });
  }
  /** Makes an explorer draft analysis permanent (drafts expire). */
  async pinAnalysis(id: string): Promise<void> {
    await this.call("pinAnalysis", { params: { id } });
  }
  getJob(id: string) {
    return this.json<JobView>("getJob", { params: { id } });
  }
  cancelJob(id: string) {
    return this.json<JobView>("cancelJob", { params: { id } });
  }
  /** Polls a job until it is done (resolves to its status) or failed or cancelled (throws ApiError). */
  async waitForJob(id: string, options: Partial<typeof CLIENT_DEFAULTS> = {}): Promise<JobView> {
    const o = { ...CLIENT_DEFAULTS, ...options };
    const end = Date.now() + o.timeout_ms;
    for (;;) {
      const s = await this.getJob(id);
      if (s.state === "done") return s;
      if (s.state === "failed" || s.state === "cancelled") {
        throw new ApiError(200, s.error?.code ?? s.state, s.error?.message ?? `job ${id} ${s.state}`);
      }
      if (Date.now() > end) throw new ApiError(0, "timeout", `job ${id} not done after ${o.timeout_ms} ms`);
      await new Promise((r) => setTimeout(r, o.pollInterval_ms));
    }
  }
  createAssessment(spec: AssessmentSpec) {
    return this.json<{ instructorId: string; studentId: string; instructorUrl: string; studentUrl: string }>(
      "createAssessment",
      { body: spec },
    );
  }
  getAssessment(instructorId: string) {
    return this.json<InstructorAssessment>("getAssessment", { params: { id: instructorId } });
  }
  /** The QTI 2.1 content package of an assessment, as zip bytes. */
  async assessmentQti(instructorId: string): Promise<Uint8Array> {
    return new Uint8Array(await (await this.call("assessmentQti", { params: { id: instructorId } })).arrayBuffer());
  }
  getStudentSheets(studentId: string) {
    return this.json<StudentAssessment>("getStudentSheets", { params: { id: studentId } });
  }
}

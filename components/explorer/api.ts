/**
 * Browser-side calls to the service routes. Every failure becomes an ApiError
 * carrying the route's { code, message, path, line, column, problems }.
 */
import type { AnalysisRequest, AnalysisResult } from "@/lib/engine/types";
import type { MechanismSummary, MechanismView } from "@/lib/viz/types";

export interface Problem {
  severity: "error" | "warning";
  code: string;
  message: string;
  path?: string;
  line?: number;
  column?: number;
}

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly path?: string,
    readonly problems: Problem[] = [],
    readonly line?: number,
    readonly column?: number,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

async function call<T>(url: string, init?: RequestInit): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, init);
  } catch (e) {
    if ((e as Error).name === "AbortError") throw e;
    throw new ApiError(0, "network", "The server could not be reached. Check that it is running and try again.");
  }
  const text = await res.text();
  let body: unknown = null;
  try {
    body = text ? JSON.parse(text) : null;
  } catch {
    body = null;
  }
  if (!res.ok) {
    const err = (body as { error?: Record<string, unknown> } | null)?.error ?? {};
    throw new ApiError(
      res.status,
      String(err.code ?? `http-${res.status}`),
      String(err.message ?? `The server answered ${res.status} ${res.statusText}.`),
      typeof err.path === "string" ? err.path : undefined,
      Array.isArray(err.problems) ? (err.problems as Problem[]) : [],
      typeof err.line === "number" ? err.line : undefined,
      typeof err.column === "number" ? err.column : undefined,
    );
  }
  return body as T;
}

export const fetchMechanisms = () => call<{ mechanisms: MechanismSummary[] }>("/api/mechanisms");

export const fetchMechanism = (id: string, signal?: AbortSignal) =>
  call<MechanismView>(`/api/mechanisms/${encodeURIComponent(id)}`, { signal });

export const uploadMechanism = (text: string) =>
  call<{ id: string; title: string; warnings: Problem[]; deletionToken: string }>("/api/mechanisms", {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify({ text, format: /^\s*[{[]/.test(text) ? "json" : "yaml" }),
  });

const jsonPost = (request: AnalysisRequest, signal?: AbortSignal): RequestInit => ({
  method: "POST",
  headers: { "content-type": "application/json" },
  body: JSON.stringify(request),
  signal,
});

/** An explorer recompute: computed, not stored. */
export const previewAnalysis = (request: AnalysisRequest, signal?: AbortSignal) =>
  call<{ result: AnalysisResult }>("/api/analyses/preview", jsonPost(request, signal));

/** Stores the analysis on screen for good (its permalink or an export was asked for): the same request, the same numbers. */
export const storeAnalysis = (request: AnalysisRequest) =>
  call<{ id: string; result: AnalysisResult }>("/api/analyses", jsonPost(request));

/** Keeps an analysis for good (its permalink was copied). */
export const pinAnalysis = (id: string) =>
  call<{ id: string; pinned: boolean }>(`/api/analyses/${encodeURIComponent(id)}/pin`, { method: "POST" });

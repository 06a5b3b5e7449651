/**
 * The browser's one way to call the service's JSON routes. Every failure
 * becomes an ApiError carrying the route's { code, message, path, line,
 * column, problems }; an unreachable server is code "network"; an abort is
 * passed through unchanged, so a caller can tell it apart.
 */

/** One finding of a mechanism check, as the routes report it. */
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
    /** HTTP status; 0 when no answer came */
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

/** Any request; the parsed JSON body of a 2xx answer (null when empty), else an ApiError. */
export async function requestJson<T>(url: string, init?: RequestInit): Promise<T> {
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

/** GET, never from the browser's cache (status polls). */
export const getJson = <T>(url: string, signal?: AbortSignal) => requestJson<T>(url, { cache: "no-store", signal });

/** POST of a JSON body. */
export const postJson = <T>(url: string, body: unknown, signal?: AbortSignal) =>
  requestJson<T>(url, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
    signal,
  });

/** POST of a text body (e.g. a CSV) with its content type. */
export const postText = <T>(url: string, text: string, contentType: string) =>
  requestJson<T>(url, { method: "POST", headers: { "content-type": contentType }, body: text });

/** POSTs a job-starting request and returns the job's id. */
export async function submitJob(url: string, body: unknown): Promise<SubmittedJob> {
  const out = await postJson<{ id?: unknown; deletionToken?: unknown } | null>(url, body);
  if (typeof out?.id !== "string") throw new ApiError(0, "no-job", `${url} answered without a job id`);
  return { id: out.id, deletionToken: typeof out.deletionToken === "string" ? out.deletionToken : undefined };
}

/** A started job, and the deletion token of the record it will store (shown once, on the record's page). */
export interface SubmittedJob {
  id: string;
  deletionToken?: string;
}

/**
 * The one place where errors become HTTP responses, and request bodies are
 * read under a size limit. Every error body is { error: { code, message, path } }.
 */
import { EngineError, MechanismError } from "../errors";

export class HttpError extends EngineError {
  constructor(
    readonly status: number,
    code: string,
    message: string,
    path?: string,
  ) {
    super(code, message, { path });
    this.name = "HttpError";
  }
}

const STATUS_BY_CODE: Record<string, number> = {
  "invalid-request": 400,
  "invalid-input": 400,
  "invalid-json": 400,
  "body-too-large": 413,
  "not-found": 404,
  "unknown-mechanism": 404,
  timeout: 422,
  "beyond-limit": 422,
  busy: 503,
  cancelled: 409,
  "engine-failure": 500,
};

export function errorResponse(e: unknown): Response {
  if (e instanceof HttpError) return Response.json({ error: e.toJSON() }, { status: e.status });
  if (e instanceof MechanismError || (e instanceof EngineError && e.name === "MechanismError")) {
    const problems = (e as MechanismError).problems;
    const tooBig = problems?.some((p) => p.code.startsWith("limit"));
    return Response.json({ error: { ...e.toJSON(), problems } }, { status: tooBig ? 413 : 400 });
  }
  if (e instanceof EngineError) {
    return Response.json({ error: e.toJSON() }, { status: STATUS_BY_CODE[e.code] ?? 400 });
  }
  console.error(e);
  return Response.json(
    { error: { code: "internal", message: "internal error; the request was not stored", path: "" } },
    { status: 500 },
  );
}

/** Runs a handler body and maps whatever it throws. */
export async function respond(fn: () => Promise<Response> | Response): Promise<Response> {
  try {
    return await fn();
  } catch (e) {
    return errorResponse(e);
  }
}

/** Reads the body as text, refusing more than maxBytes without reading it all. */
export async function readBodyText(req: Request, maxBytes: number): Promise<string> {
  const declared = Number(req.headers.get("content-length") ?? "NaN");
  if (declared > maxBytes) throw tooLarge(maxBytes);
  if (!req.body) return "";
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel();
      throw tooLarge(maxBytes);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks).toString("utf8");
}

export async function readJsonBody(req: Request, maxBytes: number): Promise<unknown> {
  const text = await readBodyText(req, maxBytes);
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new HttpError(400, "invalid-json", `the body is not valid JSON: ${(e as Error).message}`, "(body)");
  }
}

function tooLarge(maxBytes: number): HttpError {
  return new HttpError(413, "body-too-large", `the body is larger than the limit of ${maxBytes} bytes`, "(body)");
}

export function notFound(what: string, id: string): HttpError {
  return new HttpError(404, "not-found", `no ${what} with id ${id}`, "id");
}

export function csvResponse(csv: string, filename: string): Response {
  return new Response(csv, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${filename}"`,
    },
  });
}

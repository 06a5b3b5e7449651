/**
 * The one place where errors become HTTP responses, and request bodies are
 * read under a size limit. Every error body is { error: { code, message, path } }.
 */
import { EngineError, jsonParseMessage, MechanismError, safeExcerpt } from "../errors";
import { JsonDepthScanner, NESTING_DEFAULTS, type TooDeep } from "../mechanism/nestingDepth";

export class HttpError extends EngineError {
  constructor(
    readonly status: number,
    code: string,
    message: string,
    path?: string,
    /** extra response headers, e.g. Retry-After of a 429 */
    readonly headers: Record<string, string> = {},
  ) {
    super(code, message, { path });
    this.name = "HttpError";
  }
}

const STATUS_BY_CODE: Record<string, number> = {
  "invalid-request": 400,
  "invalid-input": 400,
  "invalid-json": 400,
  "too-large": 413,
  "too-deep": 400,
  "invalid-token": 400,
  forbidden: 403,
  gone: 410,
  "rate-limited": 429,
  "storage-full": 507,
  "not-found": 404,
  "unknown-mechanism": 404,
  timeout: 422,
  "beyond-limit": 422,
  busy: 503,
  cancelled: 409,
  "engine-failure": 500,
};

export function errorResponse(e: unknown): Response {
  if (e instanceof HttpError) return Response.json({ error: e.toJSON() }, { status: e.status, headers: e.headers });
  if (e instanceof MechanismError || (e instanceof EngineError && e.name === "MechanismError")) {
    const problems = (e as MechanismError).problems;
    // every document over a limit is one refusal: 413 "too-large", as the OpenAPI document says
    if (problems?.some((p) => p.code === "too-large")) {
      return Response.json({ error: { ...e.toJSON(), code: "too-large", problems } }, { status: 413 });
    }
    return Response.json({ error: { ...e.toJSON(), problems } }, { status: 400 });
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
  return Buffer.from(await readBodyBytes(req, maxBytes)).toString("utf8");
}

/**
 * Reads the body into one buffer of its own (never a slice of Node's shared
 * pool, so that it can be transferred to a worker), refusing more than
 * maxBytes without reading it all.
 */
export async function readBodyBytes(
  req: Request,
  maxBytes: number,
  /** sees each chunk as it arrives and may throw to refuse the body: the rest is then read and dropped */
  inspect?: (chunk: Uint8Array) => void,
): Promise<Uint8Array> {
  const declared = Number(req.headers.get("content-length") ?? "NaN");
  if (declared > maxBytes) throw tooLarge(maxBytes);
  if (!req.body) return new Uint8Array(0);
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let refused: unknown = null;
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel();
      throw tooLarge(maxBytes);
    }
    if (refused) continue;
    try {
      inspect?.(value);
    } catch (e) {
      // the rest is read and dropped, not kept: cutting the connection would reset it under the client,
      // which then never sees the refusal
      refused = e;
      chunks.length = 0;
      continue;
    }
    chunks.push(value);
  }
  if (refused) throw refused;
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}

/** Reads and parses a JSON body; nesting beyond the limit is refused while the body arrives. */
export async function readJsonBody(req: Request, maxBytes: number): Promise<unknown> {
  const bytes = await readBodyBytes(req, maxBytes, jsonDepthGuard());
  return parseScannedJson(Buffer.from(bytes).toString("utf8"));
}

/** JSON.parse of a body already scanned for depth; errors quote only a short, escaped excerpt. */
function parseScannedJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new HttpError(
      400,
      "invalid-json",
      `the body is not valid JSON: ${jsonParseMessage(e)} (it starts ${safeExcerpt(text.trimStart())})`,
      "(body)",
    );
  }
}

/** A chunk inspector for readBodyBytes that refuses a JSON body as soon as it nests too deeply. */
export function jsonDepthGuard(): (chunk: Uint8Array) => void {
  const scanner = new JsonDepthScanner(NESTING_DEFAULTS.maxDepth);
  return (chunk) => {
    const deep = scanner.feed(chunk);
    if (deep) throw tooDeepBody(deep);
  };
}

function tooDeepBody(deep: TooDeep): EngineError {
  return new EngineError(
    "too-deep",
    `the body is nested too deeply: more than ${NESTING_DEFAULTS.maxDepth} levels of brackets (line ${deep.line}, column ${deep.column})`,
    { path: "(body)", line: deep.line, column: deep.column },
  );
}

function tooLarge(maxBytes: number): HttpError {
  return new HttpError(413, "too-large", `the body is larger than the limit of ${maxBytes} bytes`, "(body)");
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

/**
 * A JSON response from text already written (a worker's result bytes between
 * literal pieces), as Response.json would send it, without parsing and
 * writing it again.
 */
export function jsonBytesResponse(parts: (string | Uint8Array)[], status = 200): Response {
  const body = Buffer.concat(parts.map((p) => (typeof p === "string" ? Buffer.from(p, "utf8") : p)));
  return new Response(body, { status, headers: { "content-type": "application/json" } });
}

/** A JSON file to download: indented for people unless `indent` is 0 (large records). */
export function jsonDownload(value: unknown, filename: string, indent = 2): Response {
  return new Response(JSON.stringify(value, null, indent), {
    headers: {
      "content-type": "application/json",
      "content-disposition": `attachment; filename="${filename}"`,
    },
  });
}

import { jsonDepthGuard, readBodyBytes, respond } from "@/lib/service/http";
import { listMechanisms, MAX_MECHANISM_BODY, uploadMechanism } from "@/lib/service/mechanisms";
import { ownerFromCookieHeader, ownerOf } from "@/lib/service/owner";
import { limitRequest } from "@/lib/service/rateLimit";

export const dynamic = "force-dynamic";

/** The built-ins, and this client's own uploads (owner cookie). */
export function GET(req: Request) {
  return respond(async () => Response.json(await listMechanisms(ownerFromCookieHeader(req.headers.get("cookie")))));
}

export function POST(req: Request) {
  return respond(async () => {
    await limitRequest(req);
    const type = req.headers.get("content-type") ?? "";
    // a JSON body too deep is refused on its first chunks; everything else is checked in a worker
    const body = await readBodyBytes(req, MAX_MECHANISM_BODY, type.includes("json") ? jsonDepthGuard() : undefined);
    const { owner, setCookie } = ownerOf(req);
    const out = await uploadMechanism(body, type, owner);
    const headers: HeadersInit = setCookie ? { "set-cookie": setCookie } : {};
    return Response.json(out, { status: 201, headers });
  });
}

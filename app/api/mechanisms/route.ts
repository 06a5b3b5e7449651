import { readBodyText, respond } from "@/lib/service/http";
import { listMechanisms, MAX_MECHANISM_BODY, uploadMechanism } from "@/lib/service/mechanisms";

export const dynamic = "force-dynamic";

export function GET() {
  return respond(async () => Response.json(await listMechanisms()));
}

export function POST(req: Request) {
  return respond(async () => {
    const text = await readBodyText(req, MAX_MECHANISM_BODY);
    const out = await uploadMechanism(text, req.headers.get("content-type") ?? "");
    return Response.json(out, { status: out.created ? 201 : 200 });
  });
}

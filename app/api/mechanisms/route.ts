import { readBodyText, respond } from "@/lib/service/http";
import { listMechanisms, MAX_MECHANISM_BODY, uploadMechanism } from "@/lib/service/mechanisms";

export const dynamic = "force-dynamic";

export function GET() {
  return respond(() => Response.json(listMechanisms()));
}

export function POST(req: Request) {
  return respond(async () => {
    const text = await readBodyText(req, MAX_MECHANISM_BODY);
    const out = uploadMechanism(text, req.headers.get("content-type") ?? "");
    return Response.json(out, { status: out.created ? 201 : 200 });
  });
}

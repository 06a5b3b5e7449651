import { createAnalysis, MAX_ANALYSIS_BODY } from "@/lib/service/analyses";
import { readJsonBody, respond } from "@/lib/service/http";

export const dynamic = "force-dynamic";

export function POST(req: Request) {
  return respond(async () => {
    const out = await createAnalysis(await readJsonBody(req, MAX_ANALYSIS_BODY));
    return Response.json(out, { status: 201 });
  });
}

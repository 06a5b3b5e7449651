import { createAnalysis, createdAnalysisBody, MAX_ANALYSIS_BODY } from "@/lib/service/analyses";
import { jsonBytesResponse, readJsonBody, respond } from "@/lib/service/http";
import { limitRequest } from "@/lib/service/rateLimit";

export const dynamic = "force-dynamic";

/** `?draft=1`: an explorer recompute, which expires unless its permalink is asked for. */
export function POST(req: Request) {
  return respond(async () => {
    await limitRequest(req);
    const draft = new URL(req.url).searchParams.get("draft") === "1";
    const out = await createAnalysis(await readJsonBody(req, MAX_ANALYSIS_BODY), { draft });
    return jsonBytesResponse(createdAnalysisBody(out), 201);
  });
}

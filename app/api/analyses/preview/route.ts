import { MAX_ANALYSIS_BODY, previewAnalysisJson } from "@/lib/service/analyses";
import { jsonBytesResponse, readJsonBody, respond } from "@/lib/service/http";
import { limitRequest } from "@/lib/service/rateLimit";

export const dynamic = "force-dynamic";

/** The explorer's recompute: the analysis, not stored (POST /api/analyses stores the same request for a permalink). */
export function POST(req: Request) {
  return respond(async () => {
    await limitRequest(req);
    const result = await previewAnalysisJson(await readJsonBody(req, MAX_ANALYSIS_BODY));
    return jsonBytesResponse(['{"result":', result, "}"]);
  });
}

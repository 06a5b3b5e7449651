import { MAX_ASSESSMENT_BODY, previewAssessment } from "@/lib/service/assessments";
import { readJsonBody, respond } from "@/lib/service/http";
import { limitRequest } from "@/lib/service/rateLimit";

export const dynamic = "force-dynamic";

export function POST(req: Request) {
  return respond(async () => {
    await limitRequest(req);
    return Response.json(await previewAssessment(await readJsonBody(req, MAX_ASSESSMENT_BODY)));
  });
}

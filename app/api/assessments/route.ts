import { createAssessment, MAX_ASSESSMENT_BODY } from "@/lib/service/assessments";
import { readJsonBody, respond } from "@/lib/service/http";
import { limitRequest } from "@/lib/service/rateLimit";

export const dynamic = "force-dynamic";

export function POST(req: Request) {
  return respond(async () => {
    await limitRequest(req);
    const out = await createAssessment(await readJsonBody(req, MAX_ASSESSMENT_BODY));
    return Response.json(out, { status: 201 });
  });
}

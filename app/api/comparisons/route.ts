import { readJsonBody, respond } from "@/lib/service/http";
import { startComparison } from "@/lib/service/jobs";
import { MAX_PROFILE_BODY } from "@/lib/service/profiles";
import { clientOf, limitRequest } from "@/lib/service/rateLimit";

export const dynamic = "force-dynamic";

/** Starts a comparison: 202 with the job to poll. */
export function POST(req: Request) {
  return respond(async () => {
    await limitRequest(req);
    const job = await startComparison(await readJsonBody(req, MAX_PROFILE_BODY), clientOf(req));
    return Response.json(job, { status: 202, headers: { location: job.statusUrl } });
  });
}

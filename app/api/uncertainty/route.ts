import { readJsonBody, respond } from "@/lib/service/http";
import { clientOf, limitRequest } from "@/lib/service/rateLimit";
import { MAX_UNCERTAINTY_BODY } from "@/lib/service/uncertainty";
import { startUncertaintyJob } from "@/lib/service/uncertaintyJobs";

export const dynamic = "force-dynamic";

/** Queues Monte Carlo ranges of one analysis ({ analysis }) or of a stored profile sweep ({ profileId, samples }). */
export function POST(req: Request) {
  return respond(async () => {
    await limitRequest(req);
    const job = await startUncertaintyJob(await readJsonBody(req, MAX_UNCERTAINTY_BODY), clientOf(req));
    return Response.json(job, { status: 202 });
  });
}

import { readJsonBody, respond } from "@/lib/service/http";
import { MAX_UNCERTAINTY_BODY } from "@/lib/service/uncertainty";
import { startUncertaintyJob } from "@/lib/service/uncertaintyJobs";

export const dynamic = "force-dynamic";

/** Queues Monte Carlo ranges of one analysis ({ analysis }) or of a stored profile sweep ({ profileId, samples }). */
export function POST(req: Request) {
  return respond(async () => {
    const job = await startUncertaintyJob(await readJsonBody(req, MAX_UNCERTAINTY_BODY));
    return Response.json(job, { status: 202 });
  });
}

import { readJsonBody, respond } from "@/lib/service/http";
import { startRun } from "@/lib/service/jobs";
import { clientOf, limitRequest } from "@/lib/service/rateLimit";
import { MAX_RUN_BODY, runCatalogue } from "@/lib/service/runs";

export const dynamic = "force-dynamic";

export function GET() {
  return respond(() => Response.json(runCatalogue()));
}

/** Starts a run: 202 with the job to poll. */
export function POST(req: Request) {
  return respond(async () => {
    await limitRequest(req);
    const job = await startRun(await readJsonBody(req, MAX_RUN_BODY), clientOf(req));
    return Response.json(job, { status: 202, headers: { location: job.statusUrl } });
  });
}

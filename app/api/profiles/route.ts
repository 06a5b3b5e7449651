import { readJsonBody, respond } from "@/lib/service/http";
import { startSweep } from "@/lib/service/jobs";
import { MAX_PROFILE_BODY, profileCatalogue } from "@/lib/service/profiles";
import { clientOf, limitRequest } from "@/lib/service/rateLimit";

export const dynamic = "force-dynamic";

export function GET() {
  return respond(() => Response.json(profileCatalogue()));
}

/** Starts a sweep: 202 with the job to poll. */
export function POST(req: Request) {
  return respond(async () => {
    await limitRequest(req);
    const job = await startSweep(await readJsonBody(req, MAX_PROFILE_BODY), clientOf(req));
    return Response.json(job, { status: 202, headers: { location: job.statusUrl } });
  });
}

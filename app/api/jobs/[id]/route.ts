import { respond } from "@/lib/service/http";
import { cancelJob, getJob } from "@/lib/service/jobs";

export const dynamic = "force-dynamic";

export async function GET(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => Response.json(await getJob(id), { headers: { "cache-control": "no-store" } }));
}

/** Cancels a queued or running job. */
export async function DELETE(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => Response.json(await cancelJob(id)));
}

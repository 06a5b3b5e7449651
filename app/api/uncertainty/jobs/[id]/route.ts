import { respond } from "@/lib/service/http";
import { cancelUncertaintyJob, getUncertaintyJob } from "@/lib/service/uncertaintyJobs";

export const dynamic = "force-dynamic";

export async function GET(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => Response.json(await getUncertaintyJob(id)));
}

export async function DELETE(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => Response.json(await cancelUncertaintyJob(id)));
}

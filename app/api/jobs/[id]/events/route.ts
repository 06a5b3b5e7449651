import { respond } from "@/lib/service/http";
import { jobEvents } from "@/lib/service/jobs";

export const dynamic = "force-dynamic";

/** Server-sent events: one "status" event per change until the job ends. */
export async function GET(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(() => jobEvents(id, req.signal));
}

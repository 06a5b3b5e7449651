import { pinAnalysis } from "@/lib/service/analyses";
import { respond } from "@/lib/service/http";

export const dynamic = "force-dynamic";

/** Keeps a draft for good: its permalink was copied. Idempotent. */
export async function POST(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => {
    await pinAnalysis(id);
    return Response.json({ id, pinned: true });
  });
}

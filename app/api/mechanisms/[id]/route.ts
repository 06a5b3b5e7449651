import { respond } from "@/lib/service/http";
import { deletionTokenOf } from "@/lib/service/lifecycle";
import { deleteMechanism, mechanismDetail } from "@/lib/service/mechanisms";

export const dynamic = "force-dynamic";

export async function GET(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => Response.json(await mechanismDetail(id)));
}

/** Deletes an upload with its deletion token (header x-deletion-token): 204, then its links answer 410. */
export async function DELETE(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => {
    await deleteMechanism(id, deletionTokenOf(req));
    return new Response(null, { status: 204 });
  });
}
